// Route check, planning and saved routes for one design. The engine runs in the worker pool; its refusals
// (DesignProblem) and the pool's failures (time cap, busy) come back as values the endpoints turn into answers.
import type { Kysely } from 'kysely';
import type { z } from 'zod';
import type { Database, DesignRow } from '../../../db/schema.ts';
import { designSchema, type Design } from '../../../shared/design/design.schema.ts';
import type { DesignProblem } from '../../../shared/graph/designProblem.ts';
import type { PlanSettings } from '../../../shared/route/planSettings.ts';
import { err, ok, type Result } from '../../../shared/result.ts';
import type { CheckAnswer, PlanAnswer } from '../engine/engine.types.ts';
import { runEngine } from '../engine/enginePool.ts';
import { summaryOf, threadSummaryOf } from '../engine/engineSummaries.ts';
import type { PoolFailure } from '../engine/workerPool.ts';
import { upsertDesignRoute } from './design.repository.ts';
import { storedDesign, type SavedRouteSummary } from './designRecord.ts';

export type EngineFailure = { readonly kind: 'engine'; readonly failure: PoolFailure } | { readonly kind: 'problem'; readonly problem: DesignProblem };
/** Saving an own route can also fail on the route's shape (a zod error at paths `route.i.j`). */
export type OwnRouteFailure = EngineFailure | { readonly kind: 'invalid'; readonly error: z.ZodError };

export async function checkDesignOnServer(design: Design): Promise<Result<CheckAnswer, EngineFailure>> {
  const r = await runEngine({ op: 'check', design });
  if (!r.ok) return err({ kind: 'engine', failure: r.error });
  return r.value.ok ? ok(r.value.value) : err({ kind: 'problem', problem: r.value.problem });
}

export async function planDesignOnServer(design: Design, settings?: PlanSettings): Promise<Result<PlanAnswer, EngineFailure>> {
  const r = await runEngine({ op: 'plan', design, ...(settings ? { settings } : {}) });
  if (!r.ok) return err({ kind: 'engine', failure: r.error });
  return r.value.ok ? ok(r.value.value) : err({ kind: 'problem', problem: r.value.problem });
}

/** Keeps the planner's route for the design as saved at `row.version` (planned again here: never trusted from a client). */
export async function savePlannedRoute(db: Kysely<Database>, row: DesignRow): Promise<Result<Awaited<ReturnType<typeof upsertDesignRoute>>, EngineFailure>> {
  const planned = await planDesignOnServer(storedDesign(row));
  if (!planned.ok) return planned;
  const p = planned.value;
  const summary: SavedRouteSummary = summaryOf(p);
  const strokes = p.route.map(({ pass, kind, points, length }) => ({ pass, kind, points, length }));
  return ok(await upsertDesignRoute(db, { designId: row.id, kind: 'planned', strokes, summary, designVersion: row.version }));
}

/**
 * Keeps the quilter's own route (polylines in stitching order) for the design as saved at `row.version`.
 * The route is checked against the block like the design's lines (designSchema), then measured by the
 * engine; strokes and figures are computed here, never taken from the client.
 */
export async function saveOwnRoute(db: Kysely<Database>, row: DesignRow, route: readonly unknown[]): Promise<Result<Awaited<ReturnType<typeof upsertDesignRoute>>, OwnRouteFailure>> {
  const parsed = designSchema.safeParse({ ...storedDesign(row), route });
  if (!parsed.success) return err({ kind: 'invalid', error: parsed.error });
  const r = await runEngine({ op: 'ownRoute', design: parsed.data });
  if (!r.ok) return err({ kind: 'engine', failure: r.error });
  if (!r.value.ok) return err({ kind: 'problem', problem: r.value.problem });
  const { check, strokes } = r.value.value;
  const summary: SavedRouteSummary = {
    passes: check.passes,
    stops: check.stops,
    pieces: check.pieces,
    oddPoints: check.oddPoints,
    stitchLength: check.stitchLength,
    travelLength: check.travelLength,
    retraceLength: check.retraceLength,
    ditchLength: check.ditchLength,
    edgeLength: check.edgeLength,
    units: check.units,
    optimal: null,
    thread: threadSummaryOf(check.threadBudget),
  };
  return ok(await upsertDesignRoute(db, { designId: row.id, kind: 'own', strokes, summary, designVersion: row.version }));
}
