// Publishing templates. The first publish creates the template and version 1; every edit publishes version n+1
// and leaves older versions untouched (lessons and copies keep pointing at the version they used).
import { encodeBase32LowerCaseNoPadding } from '@oslojs/encoding';
import type { Kysely } from 'kysely';
import type { Database } from '@db/schema.ts';
import { err, ok, type Result } from '@shared/result.ts';
import { loadPublishableDesign, type DesignSourceError } from './designSource.ts';
import { inTransaction } from '../transaction.repository.ts';
import { insertTemplate, insertVersion, lockTemplate, findVersion, setLatestVersion, type TemplateRow, type TemplateVersionRow, type VersionContent } from './template.repository.ts';
import type { newVersionSchema, publishTemplateSchema } from './template.schema.ts';
import type { z } from 'zod';

export type PublishError = DesignSourceError | { kind: 'template-not-found' };

/** 24 random bytes → 39 base32 characters: the secret part of an unlisted template's link. */
export function generateLinkToken(): string {
  return encodeBase32LowerCaseNoPadding(crypto.getRandomValues(new Uint8Array(24)));
}

export async function publishTemplate(
  db: Kysely<Database>,
  ownerId: string,
  input: z.output<typeof publishTemplateSchema>,
): Promise<Result<{ template: TemplateRow; version: TemplateVersionRow }, PublishError>> {
  const source = await loadPublishableDesign(db, ownerId, input.designId);
  if (!source.ok) return source;
  const { design, route, figures } = source.value;
  const content: VersionContent = {
    title: input.title,
    description: input.description,
    difficulty: input.difficulty,
    motifs: [...new Set(input.motifs)],
    units: design.units,
    width: design.width,
    height: design.height,
    design,
    route,
    figures,
    sourceDesignId: input.designId,
  };
  return inTransaction(db, async (trx) => {
    const template = await insertTemplate(trx, ownerId, input.visibility, generateLinkToken());
    const version = await insertVersion(trx, template.id, 1, content);
    return ok({ template, version });
  });
}

/** Publishes version n+1 of a template the caller may edit (checked by the caller). */
export async function publishNewVersion(
  db: Kysely<Database>,
  editorId: string,
  templateId: string,
  input: z.output<typeof newVersionSchema>,
): Promise<Result<{ template: TemplateRow; version: TemplateVersionRow }, PublishError>> {
  const source = input.designId === undefined ? null : await loadPublishableDesign(db, editorId, input.designId);
  if (source && !source.ok) return source;
  return inTransaction(db, async (trx) => {
    const template = await lockTemplate(trx, templateId);
    if (!template) return err({ kind: 'template-not-found' as const });
    const latest = await findVersion(trx, templateId, template.latest_version);
    if (!latest) throw new Error(`templates/template.service: template ${templateId} has no version ${template.latest_version}`);
    const drawing = source?.value;
    const content: VersionContent = {
      title: input.title ?? latest.title,
      description: input.description ?? latest.description,
      difficulty: input.difficulty ?? latest.difficulty,
      motifs: input.motifs ? [...new Set(input.motifs)] : latest.motifs,
      units: drawing?.design.units ?? latest.units,
      width: drawing?.design.width ?? latest.width,
      height: drawing?.design.height ?? latest.height,
      design: drawing?.design ?? latest.design,
      route: drawing?.route ?? latest.route,
      figures: drawing?.figures ?? latest.figures,
      sourceDesignId: input.designId ?? latest.source_design_id,
    };
    const next = template.latest_version + 1;
    const version = await insertVersion(trx, templateId, next, content);
    const updated = await setLatestVersion(trx, templateId, next, input.visibility ?? template.visibility);
    return ok({ template: updated, version });
  });
}
