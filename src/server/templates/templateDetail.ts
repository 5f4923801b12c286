// The one template read used by the API and the pages: visibility checked, latest (or a chosen) version,
// the version list, and the share link for those who may edit.
import type { Kysely } from 'kysely';
import type { Database } from '@db/schema.ts';
import type { TemplateDetail } from '@shared/templates/templateAnswers.ts';
import type { SessionUser } from '../auth/session.ts';
import { isUuid } from '../classes/classAccess.ts';
import { findTemplate, findTemplateByLink, findTemplateCard, findVersion, listVersionNumbers, type TemplateRow } from './template.repository.ts';
import { canEditTemplate, canSeeTemplate } from './templateAccess.ts';
import { templateLinkPath, toTemplateCardJson, toVersionJson } from './templateJson.ts';

export type TemplateRef = { by: 'id'; id: string | undefined } | { by: 'link'; token: string | undefined };

/** Null when the template does not exist or the user may not see it (both answer 404). */
export async function readTemplateDetail(db: Kysely<Database>, user: SessionUser | null, ref: TemplateRef, versionNo?: number): Promise<TemplateDetail | null> {
  const found = await findRef(db, ref);
  if (!found) return null;
  if (!(await canSeeTemplate(db, user, found, ref.by === 'link'))) return null;
  const card = await findTemplateCard(db, found.id);
  const version = await findVersion(db, found.id, versionNo ?? found.latest_version);
  if (!card || !version) return null;
  const versions = await listVersionNumbers(db, found.id);
  const canEdit = canEditTemplate(user, found);
  return {
    template: toTemplateCardJson(card),
    version: toVersionJson(version),
    versions: versions.map((v) => ({ id: v.id, version: v.version, title: v.title, publishedAt: v.published_at.toISOString() })),
    canEdit,
    ...(canEdit && { linkPath: templateLinkPath(found) }),
  };
}

async function findRef(db: Kysely<Database>, ref: TemplateRef): Promise<TemplateRow | undefined> {
  if (ref.by === 'id') return isUuid(ref.id) ? findTemplate(db, ref.id) : undefined;
  return ref.token && /^[a-z2-7]{20,64}$/.test(ref.token) ? findTemplateByLink(db, ref.token) : undefined;
}
