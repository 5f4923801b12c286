import { maxWeightMatching, type BlossomResult } from './blossom.ts';

/** A minimum-cost perfect matching with the dual solution that proves it optimal. */
export interface PerfectMatching {
  /** mate[v] = partner of v. */
  readonly mate: Int32Array;
  /** Σ cost over matched pairs (integer units, as given). */
  readonly cost: number;
  /**
   * Lower bound on the cost a pair (i, j) must have for the matching to stay optimal when that pair is added:
   * the matching is optimal over any larger edge set whose every extra pair costs at least this much.
   */
  readonly priceOf: (i: number, j: number) => number;
}

/**
 * Exact minimum-cost perfect matching on a sparse graph of n vertices (edges eu[k]–ev[k], integer costs ≥ 0).
 * Uses the blossom solver on weights C − cost with maximum cardinality, which among perfect matchings maximises
 * Σ(C − cost) = (n/2)·C − Σcost, i.e. minimises the cost (the transform networkx 2.8 uses too).
 * Returns null when the graph has no perfect matching.
 */
export function findMinCostPerfectMatching(n: number, eu: Int32Array, ev: Int32Array, cost: Float64Array): PerfectMatching | null {
  if (n % 2 === 1) return null;
  if (n === 0) return { mate: new Int32Array(0), cost: 0, priceOf: () => 0 };
  let maxCost = 0;
  for (let k = 0; k < cost.length; k++) {
    const c = cost[k]!;
    if (!Number.isInteger(c) || c < 0) throw new Error(`route/minWeightMatching: cost ${c} is not a non-negative integer`);
    maxCost = Math.max(maxCost, c);
  }
  if (maxCost >= 2 ** 50) throw new Error('route/minWeightMatching: costs must stay below 2^50 for exact duals');
  const big = maxCost + 1;
  const weight = new Float64Array(cost.length);
  for (let k = 0; k < cost.length; k++) weight[k] = big - cost[k]!;
  const solved = maxWeightMatching(n, eu, ev, weight, true);
  const { mate } = solved;
  let total = 0;
  for (let k = 0; k < eu.length; k++) if (mate[eu[k]!] === ev[k]) total += cost[k]!;
  for (let v = 0; v < n; v++) if (mate[v]! < 0) return null;
  return { mate, cost: total, priceOf: makePricer(solved, big) };
}

/**
 * LP duality for the perfect-matching polytope (Edmonds 1965): the matching stays optimal after adding pair (i, j)
 * iff 2u(i) + 2u(j) + 2Σz(b ∋ i, j) ≥ 2(C − cost), i.e. cost ≥ C − (2u(i) + 2u(j) + 2Σz)/2.
 */
function makePricer(solved: BlossomResult, big: number): (i: number, j: number) => number {
  const { vertexDual, blossomDual, blossomParent } = solved;
  const n = vertexDual.length;
  return (i, j) => {
    let shared = 0;
    // Blossoms containing both: walk i's chain, mark, then walk j's chain. Nests are shallow (a few levels).
    for (let a = blossomParent[i]!; a !== -1; a = blossomParent[a]!) {
      for (let b = blossomParent[j]!; b !== -1; b = blossomParent[b]!) {
        if (a === b) {
          shared += blossomDual[a - n]!;
          break;
        }
      }
    }
    return big - (vertexDual[i]! + vertexDual[j]! + 2 * shared) / 2;
  };
}
