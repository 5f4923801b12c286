import type { PlanarGraph } from '../graph/planarGraph.types.ts';
import { allocateStops } from './allocateStops.ts';
import type { PlannedGroup } from './groupPlans.ts';
import { travelFactor, type TravelWeights } from './travelGraph.ts';

/** The table covers 0 to this many stops beyond the fewest passes. */
export const MAX_EXTRA_STOPS = 3;

/**
 * One row of the stops-vs-travel table: with up to `extraStops` stops beyond the fewest passes, the least travel.
 * A stop that saves no travel is not made, so `passes` may be fewer than the fewest passes + extraStops.
 */
export interface StopsTableRow {
  readonly extraStops: number;
  readonly passes: number;
  readonly stops: number;
  /** Travel length (design units) and its weighted cost, of the best route found with this many stops. */
  readonly travelLength: number;
  readonly travelCost: number;
  readonly travelLowerBound: number;
  readonly optimal: boolean;
  readonly gapPercent: number;
}

/**
 * The table from per-group plans for 0…MAX_EXTRA_STOPS extra stops (`planOf(g, k)`): row K shares K stops among the
 * groups where they save the most (allocateStops). Same model as the route: the dummy end vertex's degree grows by
 * two per extra stop.
 */
export function buildStopsTable(
  graph: PlanarGraph,
  weights: TravelWeights,
  quantum: number,
  groupCount: number,
  planOf: (g: number, k: number) => PlannedGroup,
): StopsTableRow[] {
  const ks = Array.from({ length: MAX_EXTRA_STOPS + 1 }, (_, k) => k);
  const groupsIdx = Array.from({ length: groupCount }, (_, g) => g);
  return ks.map((K) => {
    const objective = groupsIdx.map((g) => ks.map((k) => (k <= K ? planOf(g, k).plan.travelCost + planOf(g, k).plan.endCost : Infinity)));
    const bounds = groupsIdx.map((g) => ks.map((k) => (k <= K ? planOf(g, k).plan.lowerBound : Infinity)));
    const chosen = allocateStops(objective, K).stops.map((k, g) => planOf(g, k));
    const optimal = groupsIdx.every((g) => ks.every((k) => k > K || planOf(g, k).proven));
    let travelLength = 0;
    let travelCost = 0;
    for (const p of chosen) {
      for (const e of p.plan.travelCopies) {
        const edge = graph.edges[e]!;
        travelLength += edge.length;
        travelCost += edge.length * travelFactor(edge.kind, weights);
      }
    }
    const endCost = chosen.reduce((s, p) => s + p.plan.endCost, 0);
    const bound = optimal ? travelCost : Math.min(travelCost, Math.max(0, allocateStops(bounds, K).total - endCost) * quantum);
    const passes = chosen.reduce((s, p) => s + p.plan.passes.length, 0);
    return {
      extraStops: K,
      passes,
      stops: Math.max(0, passes - 1),
      travelLength,
      travelCost,
      travelLowerBound: bound,
      optimal,
      gapPercent: travelCost > 0 ? (100 * (travelCost - bound)) / travelCost : 0,
    };
  });
}
