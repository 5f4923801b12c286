// Stores the demo guild's designs the way the app does (writeNewDesign: design + design_version 1 + planned
// design_route), with the summary and route computed by the real planner. Idempotent: a design with the same
// owner and title is left alone.
import type { Kysely } from 'kysely';
import type { Database } from '@db/schema.ts';
import { loadHighsSolver } from '@shared/route/exact/highsSolver.ts';
import type { LpSolver } from '@shared/route/exact/lpSolver.ts';
import { planDesign } from '@shared/route/planDesign.ts';
import { buildDesignThumbnailSvg } from '@shared/export/designSvg.ts';
import { findLiveDesignIdByTitle } from '@server/designs/design.repository.ts';
import { writeNewDesign } from '@server/designs/designWriter.ts';
import { strokePathOf, summaryOf } from '@shared/route/routeAnswers.ts';
import type { GuildDrawing } from './guildDrawings.ts';

/** The exact search's solver, loaded once per seed run (as each engine worker loads its own). */
let solver: Promise<LpSolver> | undefined;

/** The design's id and whether this run created it. */
export async function seedDesign(db: Kysely<Database>, ownerId: string, d: GuildDrawing): Promise<{ id: string; added: boolean }> {
  const existing = await findLiveDesignIdByTitle(db, ownerId, d.title);
  if (existing) return { id: existing, added: false };
  solver ??= loadHighsSolver();
  const planned = planDesign(d.design, { solver: await solver, clock: () => performance.now() });
  if (!planned.ok) throw new Error(`scripts/seed/guildDesigns: "${d.title}" cannot be planned: ${JSON.stringify(planned.error)}`);
  const plan = planned.value;
  const summary = summaryOf(plan);
  const strokes = plan.route.map(strokePathOf);
  const row = await writeNewDesign(db, {
    ownerId,
    title: d.title,
    notes: d.notes,
    dataJson: JSON.stringify(d.design),
    thumbnailSvg: buildDesignThumbnailSvg(d.design),
    summary,
    summaryCurrent: true,
    copiedFromTemplateVersionId: null,
    route: { kind: 'planned', strokes, summary },
  });
  return { id: row.id, added: true };
}
