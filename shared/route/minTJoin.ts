import { findMinCostPerfectMatching, type PerfectMatching } from './minWeightMatching.ts';
import type { PathSearch } from './shortestPaths.ts';

/** A minimum T-join: terminals paired along shortest travel paths (the odd-point pairing of route inspection). */
export interface TJoin {
  /** Pairs of terminal vertices joined by a travel path. */
  readonly pairs: readonly (readonly [number, number])[];
  /** Travel path (graph edge ids, from pair[0] to pair[1]) for each pair. */
  readonly paths: readonly (readonly number[])[];
  /** Terminals matched to a free end: the route starts or ends there instead of being joined. */
  readonly openEnds: readonly number[];
  /** Σ integer travel cost of the paths (TravelGraph units). */
  readonly cost: number;
  /** Σ integer end cost (see TJoinEnds.costOf) of the open ends. */
  readonly endCost: number;
}

/**
 * Free thread ends offered to the pairing: `count` dummy terminals (the route's free ends plus two per extra stop
 * allowed). A dummy joins a terminal at `costOf(vertex)` (integer TravelGraph units; −1: no thread end may be
 * there) and another dummy at 0 (an allowed end left unused).
 */
export interface TJoinEnds {
  readonly count: number;
  readonly costOf: (vertex: number) => number;
}

/** Free ends without costs, as the plain route inspection uses them. */
export function plainEnds(count: number, notFree: readonly number[] = []): TJoinEnds {
  return { count, costOf: (v) => (notFree.includes(v) ? -1 : 0) };
}

/** Work counters and step times (ms) for the benchmark; times are kept only when a clock is passed in. */
export interface PlannerStats {
  readonly clock: (() => number) | null;
  searches: number;
  matchings: number;
  searchMs: number;
  matchMs: number;
  walkMs: number;
}

/** Runs f, adding its wall time to stats[key] when the stats carry a clock. */
export function timed<T>(stats: PlannerStats | undefined, key: 'searchMs' | 'matchMs' | 'walkMs', f: () => T): T {
  if (!stats?.clock) return f();
  const t = stats.clock();
  const out = f();
  stats[key] += stats.clock() - t;
  return out;
}

const FIRST_NEIGHBOURS = 12;

/**
 * Exact minimum T-join over travel lines (Edmonds & Johnson, Math. Programming 5 (1973) 88–124): a minimum-cost
 * perfect matching of the terminals under shortest-path distances. `ends` adds dummy terminals (free thread ends)
 * joined to every real terminal at its end cost and to each other at 0 (docs/engine.md §3.1): whichever
 * terminals they take become free ends of the route's passes. A terminal with end cost −1 may not be a free end (a
 * fixed start off the quilting lines: ending there again means travelling out and back, never better).
 *
 * Sparse and certified: each terminal first searches only until its nearest FIRST_NEIGHBOURS terminals are settled,
 * which gives candidate pairs and a radius r (every other terminal is at least r away). The matching on the
 * candidates is optimal for the complete graph when every missing pair (i, j) satisfies max(r_i, r_j) ≥ its dual
 * price (LP duality; Derigs & Metz, Math. Prog. 50 (1991) 113–121 price out pairs the same way). Terminals whose
 * pairs fail widen their search (×2) and the matching is solved again, up to the complete graph.
 */
export function findMinTJoin(
  search: PathSearch,
  terminals: readonly number[],
  ends: TJoinEnds,
  stats?: PlannerStats,
): TJoin {
  const k = terminals.length;
  const dummies = k === 0 ? 0 : ends.count;
  if ((k + dummies) % 2 === 1) throw new Error(`route/minTJoin: ${k} terminals and ${ends.count} free ends cannot be paired`);
  if (k === 0) return { pairs: [], paths: [], openEnds: [], cost: 0, endCost: 0 };
  // Terminal index per vertex (−1: not a terminal).
  const indexOf = new Int32Array(search.vertexCount).fill(-1);
  terminals.forEach((t, i) => {
    if (indexOf[t] !== -1) throw new Error('route/minTJoin: terminals must be distinct');
    indexOf[t] = i;
  });

  const endCost = Float64Array.from(terminals, (t) => ends.costOf(t));
  const reach = new Int32Array(k).fill(Math.min(k - 1, FIRST_NEIGHBOURS));
  const radius = new Float64Array(k);
  const candidates = new Map<number, number>();
  const stale = new Uint8Array(k).fill(1);
  for (;;) {
    timed(stats, 'searchMs', () => searchStale(search, terminals, indexOf, reach, stale, radius, candidates, stats));
    const matching = timed(stats, 'matchMs', () => solve(k, dummies, candidates, endCost));
    if (stats) stats.matchings++;
    if (matching === null) {
      // The candidate graph has no perfect matching: widen every search.
      for (let i = 0; i < k; i++) widen(i, reach, stale, k);
      if (!stale.includes(1)) throw new Error('route/minTJoin: terminals are not all connected by travel lines');
      continue;
    }
    const failing = timed(stats, 'matchMs', () => findUnpricedTerminals(k, candidates, radius, matching));
    if (failing.length === 0) return timed(stats, 'searchMs', () => expand(search, terminals, k, matching, candidates, endCost));
    for (const i of failing) widen(i, reach, stale, k);
  }
}

function searchStale(
  search: PathSearch,
  terminals: readonly number[],
  indexOf: Int32Array,
  reach: Int32Array,
  stale: Uint8Array,
  radius: Float64Array,
  candidates: Map<number, number>,
  stats: PlannerStats | undefined,
): void {
  const k = terminals.length;
  for (let i = 0; i < k; i++) {
    if (!stale[i]) continue;
    stale[i] = 0;
    let found = 0;
    const want = reach[i]!;
    if (want === 0) {
      radius[i] = Infinity;
      continue;
    }
    radius[i] = search.run([terminals[i]!], (v, d) => {
      const j = indexOf[v]!;
      if (j < 0 || j === i) return false;
      candidates.set(i < j ? i * k + j : j * k + i, d);
      return ++found >= want;
    });
    if (stats) stats.searches++;
  }
}

function widen(i: number, reach: Int32Array, stale: Uint8Array, k: number): void {
  if (reach[i]! >= k - 1) return;
  reach[i] = Math.min(k - 1, 2 * reach[i]!);
  stale[i] = 1;
}

function solve(k: number, dummies: number, candidates: Map<number, number>, endCost: Float64Array): PerfectMatching | null {
  const size = candidates.size + dummies * k + (dummies * (dummies - 1)) / 2;
  const eu = new Int32Array(size);
  const ev = new Int32Array(size);
  const cost = new Float64Array(size);
  let e = 0;
  for (const [key, d] of candidates) {
    eu[e] = Math.floor(key / k);
    ev[e] = key % k;
    cost[e++] = d;
  }
  for (let dmy = 0; dmy < dummies; dmy++) {
    for (let i = 0; i < k; i++) {
      if (endCost[i]! < 0) continue;
      eu[e] = i;
      ev[e] = k + dmy;
      cost[e++] = endCost[i]!;
    }
    for (let other = dmy + 1; other < dummies; other++) {
      eu[e] = k + dmy;
      ev[e] = k + other;
      cost[e++] = 0;
    }
  }
  return findMinCostPerfectMatching(k + dummies, eu.subarray(0, e), ev.subarray(0, e), cost.subarray(0, e));
}

/** Terminals in some missing pair whose lower bound max(r_i, r_j) is below the pair's dual price. */
function findUnpricedTerminals(k: number, candidates: Map<number, number>, radius: Float64Array, m: PerfectMatching): number[] {
  const failing = new Uint8Array(k);
  for (let i = 0; i < k; i++) {
    for (let j = i + 1; j < k; j++) {
      if (candidates.has(i * k + j)) continue;
      const bound = Math.max(radius[i]!, radius[j]!);
      if (bound < m.priceOf(i, j)) {
        failing[i] = 1;
        failing[j] = 1;
      }
    }
  }
  const out: number[] = [];
  failing.forEach((f, i) => {
    if (f) out.push(i);
  });
  return out;
}

function expand(search: PathSearch, terminals: readonly number[], k: number, m: PerfectMatching, candidates: Map<number, number>, endCost: Float64Array): TJoin {
  const pairs: (readonly [number, number])[] = [];
  const paths: number[][] = [];
  const openEnds: number[] = [];
  let cost = 0;
  let openCost = 0;
  for (let i = 0; i < k; i++) {
    const j = m.mate[i]!;
    if (j >= k) {
      openEnds.push(terminals[i]!);
      openCost += endCost[i]!;
      continue;
    }
    if (j < i) continue;
    const target = terminals[j]!;
    search.run([terminals[i]!], (v) => v === target);
    paths.push(search.pathTo(target));
    pairs.push([terminals[i]!, target]);
    cost += candidates.get(i * k + j)!;
  }
  return { pairs, paths, openEnds, cost, endCost: openCost };
}
