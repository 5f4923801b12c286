// Planning a quilt's chained route off the request thread: the placed designs are read (the owner's live ones, as
// JSON text the worker validates) and the whole planning step runs as one job in the engine's worker pool, in the
// interactive lane, fair between accounts like every check and plan. Each corner-pair plan gets a short time budget
// (QUILT_PAIR_BUDGET_MS) so a small quilt fits the job's 8 s cap; a larger one answers engine_timeout.
import type { Kysely } from 'kysely';
import type { Database } from '@db/schema.ts';
import type { QuiltPlan } from '@shared/contract/quiltPlan.ts';
import type { Quilt } from '@shared/quilt/quilt.schema.ts';
import type { QuiltRouteProblem } from '@shared/quilt/quiltRoute.ts';
import { err, ok, type Result } from '@shared/result.ts';
import { runEngine } from '../engine/enginePool.ts';
import type { PoolFailure } from '../engine/workerPool.ts';
import { liveOwnedDesignTexts } from './quilt.repository.ts';

/** Time budget of each corner-pair plan (the planner's least, 100 ms). */
export const QUILT_PAIR_BUDGET_MS = 100;

const UUID = /^[0-9a-f]{8}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{12}$/i;

export type QuiltPlanFailure =
  | { readonly kind: 'empty' }
  | { readonly kind: 'problem'; readonly problem: QuiltRouteProblem }
  | { readonly kind: 'engine'; readonly failure: PoolFailure };

export async function planQuiltOnServer(db: Kysely<Database>, ownerId: string, quilt: Quilt, signal?: AbortSignal): Promise<Result<QuiltPlan, QuiltPlanFailure>> {
  const ids = new Set<string>();
  for (const row of quilt.placements) for (const p of row) if (p && UUID.test(p.designId)) ids.add(p.designId);
  if (!quilt.placements.some((row) => row.some((p) => p !== null))) return err({ kind: 'empty' });
  // A design deleted since the quilt was saved is simply absent: planQuiltRoute names its cell (missing-design).
  const rows = await liveOwnedDesignTexts(db, ownerId, [...ids]);
  const designs = rows.map((r) => ({ id: r.id, revision: `${r.id}@${r.version}`, designText: r.data_json }));
  const r = await runEngine({ op: 'quiltPlan', quilt, designs, settings: { timeBudgetMs: QUILT_PAIR_BUDGET_MS, extraStops: 0, hiddenEndAllowance: 0 } }, { key: ownerId, ...(signal ? { signal } : {}) });
  if (!r.ok) return err({ kind: 'engine', failure: r.error });
  return r.value.ok ? ok(r.value.value) : err({ kind: 'problem', problem: r.value.quiltProblem });
}
