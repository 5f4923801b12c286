// One whole-quilt plan as a planning worker runs it: the corner-pair plans go to a pool of engine threads side by
// side (`runPair`), each design's table is read from and written back to a persisted store as soon as it is known
// (`store`), and progress is told after every plan. The steps are shared/quilt/quiltRoute.ts's own
// (checkQuiltDesigns, pairsToProve, finishQuiltRoute), so the answer is the one planQuiltRoute gives one plan at a
// time; what this adds is the parallelism and the persistence.
//
// Why per pair and not per design: 48 designs × 10 pairs spread over 2 threads balance well, and a progress bar
// moves 480 times, not 48.
import type { Design } from '@shared/design/design.schema.ts';
import type { DesignProblem } from '@shared/graph/designProblem.ts';
import type { LinkMetric } from '@shared/quilt/chain.ts';
import { CornerCostCache } from '@shared/quilt/cornerCostCache.ts';
import type { Corner } from '@shared/quilt/cornerMap.ts';
import { PLANS_PER_DESIGN, type CornerPairPlan, type DesignCornerCosts } from '@shared/quilt/cornerCosts.ts';
import type { Cell, Quilt } from '@shared/quilt/quilt.schema.ts';
import { checkQuiltDesigns, finishQuiltRoute, pairsToProve, type QuiltRoute, type QuiltRouteProblem } from '@shared/quilt/quiltRoute.ts';
import { err, ok, type Result } from '@shared/result.ts';

/** A placed design as the worker knows it: its size (for the fit check), version and drawing as JSON text. */
export interface RunDesign {
  readonly id: string;
  readonly version: number;
  readonly shape: Pick<Design, 'units' | 'width' | 'height'>;
  readonly designText: string;
}

/** Where corner-pair tables are kept between plans (PostgreSQL in the worker, a Map in tests). */
export interface CornerCostStore {
  load(designs: readonly { id: string; version: number }[]): Promise<Map<string, DesignCornerCosts>>;
  save(designId: string, version: number, table: DesignCornerCosts): Promise<void>;
}

/** Plans one corner pair (design corners, a ≤ b) of a design; `exact` gives it the exact search. */
export type PairRunner = (designText: string, a: Corner, b: Corner, exact: boolean) => Promise<Result<CornerPairPlan, DesignProblem>>;

export interface RunOptions {
  readonly store: CornerCostStore;
  readonly runPair: PairRunner;
  /** Prove the pairs the chain uses (the exact search); false: the heuristic tables alone. */
  readonly prove: boolean;
  readonly onProgress?: (done: number, total: number) => void;
  readonly metric?: LinkMetric;
  /**
   * Wall time the proving rounds may start within (ms from the start of the run); a round under way finishes, no new
   * one starts. The answer is then the best chain found with its lower bound (not proven least); the pairs proved are
   * kept, so the next plan over these designs starts further on. Default: no limit.
   */
  readonly proveWithinMs?: number;
  readonly clock?: () => number;
}

/** Counts of what a run did, for logs and the benchmark. */
export interface RunStats {
  readonly heuristicPlans: number;
  readonly provedPlans: number;
  readonly cachedDesigns: number;
  /** True when proving stopped at `proveWithinMs` with pairs still to prove. */
  readonly proofCut: boolean;
}

export async function runQuiltPlan(
  quilt: Quilt,
  designs: readonly RunDesign[],
  options: RunOptions,
): Promise<Result<{ route: QuiltRoute; stats: RunStats }, QuiltRouteProblem>> {
  const clock = options.clock ?? (() => performance.now());
  const started = clock();
  const byId = new Map(designs.map((d) => [d.id, { ...d, design: d.shape, revision: revisionOf(d) }]));
  const checked = checkQuiltDesigns(quilt, byId);
  if (!checked.ok) return checked;
  const order = checked.value;
  const metric = options.metric ?? quilt.linkMetric;
  const ids = [...new Set(order.map((c) => placementAt(quilt, c).designId))];
  const used = ids.map((id) => byId.get(id)!);

  const cache = new CornerCostCache();
  const stored = await options.store.load(used);
  for (const d of used) {
    const table = stored.get(d.id);
    if (table) cache.design(d.id, d.revision, () => ok(table));
  }
  const missing = used.filter((d) => !cache.has(d.id, d.revision));
  let total = PLANS_PER_DESIGN * missing.length;
  let done = 0;
  const tick = (): void => options.onProgress?.(++done, total);
  options.onProgress?.(done, total);

  // Every missing design's 10 pairs at once: the pool queues them and keeps every thread busy.
  const tables = await Promise.all(
    missing.map(async (d) => {
      const plans = await Promise.all(
        PAIRS.map(async ([a, b]) => {
          const r = await options.runPair(d.designText, a, b, false);
          tick();
          return r;
        }),
      );
      const refused = plans.find((p) => !p.ok);
      if (refused && !refused.ok) return err({ design: d, problem: refused.error });
      const table = tableOf(d.shape.units, plans.map((p) => (p.ok ? p.value : null!)));
      await options.store.save(d.id, d.version, table);
      cache.design(d.id, d.revision, () => ok(table));
      return ok(table);
    }),
  );
  for (const t of tables) {
    if (!t.ok) {
      const { design, problem } = t.error;
      const cell = order.find((c) => placementAt(quilt, c).designId === design.id)!;
      return err({ kind: 'design', cell, designId: design.id, problem, message: `The design at row ${cell.row + 1}, column ${cell.column + 1}: ${problem.message}` });
    }
  }

  const known = (id: string): DesignCornerCosts => {
    const r = cache.design(id, byId.get(id)!.revision, () => err(null));
    if (!r.ok) throw new Error(`server/jobs/quiltPlanRun: no table for ${id}`);
    return r.value;
  };
  let proved = 0;
  let round = pairsToProve(quilt, order, known, metric);
  const inTime = (): boolean => options.proveWithinMs === undefined || clock() - started < options.proveWithinMs;
  while (options.prove && round.pairs.length > 0 && inTime()) {
    total += round.pairs.length;
    options.onProgress?.(done, total);
    const planned = await Promise.all(
      round.pairs.map(async (p) => {
        const r = await options.runPair(byId.get(p.designId)!.designText, p.a, p.b, true);
        tick();
        if (!r.ok) throw new Error('server/jobs/quiltPlanRun: a design planned before was refused');
        return { ...p, plan: r.value };
      }),
    );
    const touched = new Set<string>();
    for (const p of planned) {
      cache.refinePair(p.designId, byId.get(p.designId)!.revision, p.a, p.b, p.plan);
      touched.add(p.designId);
    }
    for (const id of touched) await options.store.save(id, byId.get(id)!.version, known(id));
    proved += planned.length;
    round = pairsToProve(quilt, order, known, metric);
  }
  const route = finishQuiltRoute(quilt, order, byId, cache, metric, round.bound);
  const proofCut = options.prove && round.pairs.length > 0;
  return ok({ route, stats: { heuristicPlans: PLANS_PER_DESIGN * missing.length, provedPlans: proved, cachedDesigns: used.length - missing.length, proofCut } });
}

/**
 * The plan from stored tables alone, on the calling thread (the dynamic programme: milliseconds for 6 × 8), or
 * `null` when a table is missing or a pair the chain uses still wants the exact search (a job must plan it).
 */
export function planFromStoredTables(
  quilt: Quilt,
  designs: readonly Omit<RunDesign, 'designText'>[],
  tables: ReadonlyMap<string, DesignCornerCosts>,
  prove: boolean,
): Result<QuiltRoute | null, QuiltRouteProblem> {
  const byId = new Map(designs.map((d) => [d.id, { ...d, design: d.shape, revision: revisionOf(d) }]));
  const checked = checkQuiltDesigns(quilt, byId);
  if (!checked.ok) return checked;
  const order = checked.value;
  const cache = new CornerCostCache();
  for (const c of order) {
    const d = byId.get(placementAt(quilt, c).designId)!;
    const table = tables.get(d.id);
    if (!table) return ok(null);
    cache.design(d.id, d.revision, () => ok(table));
  }
  const known = (id: string): DesignCornerCosts => tables.get(id)!;
  const round = pairsToProve(quilt, order, known, quilt.linkMetric);
  if (prove && round.pairs.length > 0) return ok(null);
  return ok(finishQuiltRoute(quilt, order, byId, cache, quilt.linkMetric, round.bound));
}

/** The 10 pairs a ≤ b a design's table is planned from (the other 6 are the same routes sewn backwards). */
const PAIRS: readonly (readonly [Corner, Corner])[] = [0, 1, 2, 3].flatMap((a) => [0, 1, 2, 3].filter((b) => b >= a).map((b) => [a, b] as const)) as [Corner, Corner][];

/** The 4 × 4 table from the 10 plans in PAIRS order: pair (b, a) is pair (a, b) sewn backwards. */
function tableOf(units: Design['units'], plans: readonly CornerPairPlan[]): DesignCornerCosts {
  const pairs: CornerPairPlan[][] = [[], [], [], []];
  PAIRS.forEach(([a, b], i) => {
    pairs[a]![b] = plans[i]!;
    pairs[b]![a] = plans[i]!;
  });
  return { units, pairs };
}

const revisionOf = (d: { id: string; version: number }): string => `${d.id}@${d.version}`;
const placementAt = (quilt: Quilt, c: Cell) => quilt.placements[c.row]![c.column]!;
