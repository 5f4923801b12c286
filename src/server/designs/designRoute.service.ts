// Route check, planning and saved routes for one design. The engine runs in the worker pool; its refusals
// (DesignProblem) and the pool's failures (time cap, busy) come back as values the endpoints turn into answers.
import type { Kysely } from 'kysely';
import type { Database, DesignRow } from '../../../db/schema.ts';
import type { Design } from '../../../shared/design/design.schema.ts';
import type { DesignProblem } from '../../../shared/graph/designProblem.ts';
import { err, ok, type Result } from '../../../shared/result.ts';
import type { CheckAnswer, PlanAnswer } from '../engine/engine.types.ts';
import { runEngine } from '../engine/enginePool.ts';
import { summaryOf } from '../engine/engineSummaries.ts';
import type { PoolFailure } from '../engine/workerPool.ts';
import { upsertDesignRoute } from './design.repository.ts';
import { storedDesign, type SavedRouteSummary } from './designRecord.ts';

export type EngineFailure = { readonly kind: 'engine'; readonly failure: PoolFailure } | { readonly kind: 'problem'; readonly problem: DesignProblem };

export async function checkDesignOnServer(design: Design): Promise<Result<CheckAnswer, EngineFailure>> {
  const r = await runEngine({ op: 'check', design });
  if (!r.ok) return err({ kind: 'engine', failure: r.error });
  return r.value.ok ? ok(r.value.value) : err({ kind: 'problem', problem: r.value.problem });
}

export async function planDesignOnServer(design: Design): Promise<Result<PlanAnswer, EngineFailure>> {
  const r = await runEngine({ op: 'plan', design });
  if (!r.ok) return err({ kind: 'engine', failure: r.error });
  return r.value.ok ? ok(r.value.value) : err({ kind: 'problem', problem: r.value.problem });
}

/** Keeps the planner's route for the design as saved at `row.version` (planned again here: never trusted from a client). */
export async function savePlannedRoute(db: Kysely<Database>, row: DesignRow): Promise<Result<Awaited<ReturnType<typeof upsertDesignRoute>>, EngineFailure>> {
  const planned = await planDesignOnServer(storedDesign(row));
  if (!planned.ok) return planned;
  const p = planned.value;
  const summary: SavedRouteSummary = summaryOf(p);
  return ok(await upsertDesignRoute(db, { designId: row.id, kind: 'planned', strokes: p.route, summary, designVersion: row.version }));
}
