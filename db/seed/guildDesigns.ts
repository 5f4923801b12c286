// Stores the demo guild's designs the way the app does (design + design_version 1 + planned design_route), with
// the summary and route computed by the real planner. Idempotent: a design with the same owner and title is left alone.
import type { Kysely } from 'kysely';
import type { Database } from '../schema.ts';
import { loadHighsSolver } from '@shared/route/exact/highsSolver.ts';
import type { MipSolver } from '@shared/route/exact/mipSolver.ts';
import { planDesign } from '@shared/route/planDesign.ts';
import { buildDesignThumbnailSvg } from '@shared/export/designSvg.ts';
import { insertDesign, insertDesignVersion, upsertDesignRoute } from '@server/designs/design.repository.ts';
import { strokePathOf, summaryOf } from '@shared/route/routeAnswers.ts';
import type { GuildDrawing } from './guildDrawings.ts';

/** The exact search's solver, loaded once per seed run (as each engine worker loads its own). */
let solver: Promise<MipSolver> | undefined;

/** The design's id and whether this run created it. */
export async function seedDesign(db: Kysely<Database>, ownerId: string, d: GuildDrawing): Promise<{ id: string; added: boolean }> {
  const existing = await db
    .selectFrom('design')
    .select('id')
    .where('owner_id', '=', ownerId)
    .where('title', '=', d.title)
    .where('deleted_at', 'is', null)
    .executeTakeFirst();
  if (existing) return { id: existing.id, added: false };
  solver ??= loadHighsSolver();
  const planned = planDesign(d.design, { solver: await solver, clock: () => performance.now() });
  if (!planned.ok) throw new Error(`db/seed/guildDesigns: "${d.title}" cannot be planned: ${JSON.stringify(planned.error)}`);
  const plan = planned.value;
  const summary = summaryOf(plan);
  const strokes = plan.route.map(strokePathOf);
  return db.transaction().execute(async (trx) => {
    const row = await insertDesign(trx, {
      ownerId,
      title: d.title,
      notes: d.notes,
      dataJson: JSON.stringify(d.design),
      thumbnailSvg: buildDesignThumbnailSvg(d.design),
      summary,
      summaryCurrent: true,
    });
    await insertDesignVersion(trx, row.id);
    await upsertDesignRoute(trx, { designId: row.id, kind: 'planned', strokes, summary, designVersion: row.version });
    return { id: row.id, added: true };
  });
}
