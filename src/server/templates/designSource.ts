// The bridge to the workbench's tables (design, design_version, design_route): reading a teacher's design with
// its saved route to publish it, and writing a copy of a template version into a quilter's designs.
import type { Kysely } from 'kysely';
import type { Database } from '@db/schema.ts';
import { designSchema, type Design } from '@shared/design/design.schema.ts';
import { buildDesignThumbnailSvg } from '@shared/export/designSvg.ts';
import { err, ok, type Result } from '@shared/result.ts';
import { findOwnedDesignWithRoute } from '../designs/design.repository.ts';
import { writeNewDesign } from '../designs/designWriter.ts';
import type { TemplateVersionRow } from './template.repository.ts';
import { savedRouteSummarySchema, type SavedRouteSummary } from '@shared/contract/figures.ts';
import { strokePathsSchema, type StrokePath } from '@shared/contract/strokes.ts';
import { copiedDesignSummary, copiedRoute } from './copiedFigures.ts';

export interface PublishableDesign {
  design: Design;
  route: readonly StrokePath[];
  figures: SavedRouteSummary;
}
export type DesignSourceError = { kind: 'not-found' } | { kind: 'no-route' } | { kind: 'stale-route'; designVersion: number; routeVersion: number };

/** The owner's design and its saved route; the route must belong to the design's current version. */
export async function loadPublishableDesign(db: Kysely<Database>, ownerId: string, designId: string): Promise<Result<PublishableDesign, DesignSourceError>> {
  const row = await findOwnedDesignWithRoute(db, ownerId, designId);
  if (!row) return err({ kind: 'not-found' });
  if (row.route_version === null || row.strokes === null) return err({ kind: 'no-route' });
  if (row.route_version !== row.version) return err({ kind: 'stale-route', designVersion: row.version, routeVersion: row.route_version });
  // jsonb written by another feature: parse it like any outside input (a broken row is a bug, so parse throws).
  return ok({ design: designSchema.parse(row.data), route: strokePathsSchema.parse(row.strokes), figures: savedRouteSummarySchema.parse(row.summary) });
}

/**
 * A new design owned by `ownerId` holding the version's drawing and route, marked with the version it came from
 * (design.copied_from_template_version_id). The table figures are the planner's (copiedFigures.ts).
 */
/** The copy, and whether its table figures are still to be computed (the caller asks the engine: designDerive.ts). */
export interface DesignCopy {
  readonly id: string;
  readonly version: number;
  readonly figuresPending: boolean;
}

export async function copyVersionIntoDesigns(db: Kysely<Database>, ownerId: string, v: TemplateVersionRow): Promise<DesignCopy> {
  const design = designSchema.parse(v.design);
  const route = copiedRoute(v.route, v.figures);
  const summary = copiedDesignSummary(v.figures);
  const title = `${v.title} (template v${v.version})`.slice(0, 200);
  const notes = `Copied from the template "${v.title}", version ${v.version}.`;
  const created = await writeNewDesign(db, {
    ownerId,
    title,
    notes,
    dataJson: JSON.stringify(design),
    thumbnailSvg: buildDesignThumbnailSvg(design),
    // A planned route's figures are the new version's figures; otherwise they follow from the engine.
    summary,
    summaryCurrent: summary !== null,
    copiedFromTemplateVersionId: v.id,
    route,
  });
  return { id: created.id, version: created.version, figuresPending: summary === null };
}
