// How templates appear in API responses. The link token is shown only to those who may edit the template.
import type { TemplateCardJson, TemplateVersionJson } from '@shared/templates/templateAnswers.ts';
import type { TemplateCardRow, TemplateRow, TemplateVersionRow } from './template.repository.ts';

export function toTemplateCardJson(r: TemplateCardRow): TemplateCardJson {
  return {
    id: r.id,
    visibility: r.visibility,
    latestVersion: r.latest_version,
    versionId: r.version_id,
    owner: { id: r.owner_id, displayName: r.owner_name },
    title: r.title,
    description: r.description,
    difficulty: r.difficulty,
    motifs: r.motifs,
    size: { units: r.units, width: r.width, height: r.height },
    figures: r.figures,
    publishedAt: r.published_at.toISOString(),
  };
}

export function toVersionJson(v: TemplateVersionRow): TemplateVersionJson {
  return {
    id: v.id,
    templateId: v.template_id,
    version: v.version,
    title: v.title,
    description: v.description,
    difficulty: v.difficulty,
    motifs: v.motifs,
    size: { units: v.units, width: v.width, height: v.height },
    design: v.design,
    route: v.route,
    figures: v.figures,
    publishedAt: v.published_at.toISOString(),
  };
}

/** The share link of an unlisted template (path only; pages prefix the origin). */
export const templateLinkPath = (t: TemplateRow): string => `/templates/link/${t.link_token}`;
