import type { PlanarGraph } from '../../graph/planarGraph.types.ts';
import { buildPasses } from '../buildPasses.ts';
import type { GroupEnds, GroupPlan } from '../planGroup.ts';
import type { RouteGroup } from '../routeGroups.ts';
import { endCostAt, solverEndCostAt } from '../threadEnds.ts';
import type { TravelGraph } from '../travelGraph.ts';
import { searchRoute, type SearchResult } from './branchAndCut.ts';
import type { Budget } from './budget.ts';
import { ConnectivityCuts } from './connectivityCuts.ts';
import type { LpSolver } from './lpSolver.ts';
import { reduceGraph } from './reduceGraph.ts';
import { buildRppProgram, type RppProgram } from './rppProgram.ts';

/** Figures of one exact search, for the benchmark and the answer. */
export interface ExactStats {
  readonly pieces: number;
  readonly keptVertices: number;
  readonly reducedEdges: number;
  readonly cutRounds: number;
  readonly cuts: number;
  /** Nodes of the search tree solved (the root is one). */
  readonly nodes: number;
  /** The root's linear relaxation bound with the cuts found there (integer cost units; −Infinity if never solved). */
  readonly lpBound: number;
  /** The best objective known (cost units: the search's route, else the heuristic's) and whether it was proven least. */
  readonly objective: number;
  readonly proven: boolean;
  /** Time spent (budget ms: wall time with a clock, else solver time). */
  readonly ms: number;
}

export interface ExactGroupPlan {
  readonly plan: GroupPlan;
  readonly stats: ExactStats;
}

/**
 * The exact planner for one travel group (rural postman with free or fixed ends and up to `ends.extraStops`
 * extra stops): reduce the graph (Christofides et al. 1981), build the integer program (Ghiani & Laporte 2000),
 * search within `limitMs` of the budget. `upper` is a route already known (the heuristic's): the answer is the
 * better of the two, with the best lower bound known; `proven` (lowerBound ≥ cost) only when the search proved it.
 */
export function planGroupExact(
  graph: PlanarGraph,
  travel: TravelGraph,
  group: RouteGroup,
  start: number,
  end: number,
  ends: GroupEnds,
  upper: GroupPlan,
  solver: LpSolver,
  budget: Budget,
  limitMs: number,
): ExactGroupPlan {
  const t0 = budget.spentMs();
  const fixedEnds = [start, end].filter((v) => v >= 0);
  const reduced = reduceGraph(graph, travel, group.quiltingEdges, fixedEnds, ends.places);
  const onLines = new Uint8Array(reduced.kept.length);
  for (const r of reduced.required) onLines[r.a] = onLines[r.b] = 1;
  const barred = (v: number, i: number): boolean => fixedEnds.includes(v) && !onLines[i];
  const endCost = Float64Array.from(reduced.kept, (v, i) => (barred(v, i) ? -1 : endCostAt(ends.costs, ends.places, v)));
  const solverEndCost = Float64Array.from(reduced.kept, (v, i) => (barred(v, i) ? -1 : solverEndCostAt(ends.costs, ends.places, v)));
  const keptStart = start >= 0 ? reduced.keptIndex[start]! : -1;
  const keptEnd = end >= 0 ? reduced.keptIndex[end]! : -1;
  const rpp = buildRppProgram({ reduced, start: keptStart, end: keptEnd, extraStops: ends.extraStops, endCost, solverEndCost, quantum: travel.quantum });
  const cuts = new ConnectivityCuts(reduced, rpp, [keptStart, keptEnd].filter((v) => v >= 0));
  const upperCost = upper.travelCost + upper.endCost;
  // A solver objective exceeds the cost-unit objective (times quantum) by at most 3·solverTie per thread end.
  const freeEnds = (start < 0 ? 1 : 0) + (end < 0 ? 1 : 0) + 2 * ends.extraStops;
  const slack = 3 * ends.costs.solverTie * freeEnds;
  const found: SearchResult = searchRoute(solver, rpp, cuts, budget, limitMs, {
    toCost: (b) => (b - slack) / travel.quantum,
    toSolver: (c) => c * travel.quantum + slack,
    upperCost,
  });
  const stats: ExactStats = {
    pieces: reduced.pieceCount,
    keptVertices: reduced.kept.length,
    reducedEdges: reduced.travel.length + reduced.required.length,
    cutRounds: found.cutRounds,
    cuts: found.cuts,
    nodes: found.nodes,
    lpBound: found.lpBound,
    objective: found.objective,
    proven: found.proven,
    ms: budget.spentMs() - t0,
  };
  // A relaxation bound above a route in hand would mean a broken model (the LP solver's tolerance is 1e-7 design units).
  if (found.lpBound > upperCost * (1 + 1e-9) + 1e-7 / travel.quantum) {
    throw new Error(`route/exact/planGroupExact: LP bound ${found.lpBound} above a known route ${upperCost}`);
  }
  const lowerBound = Math.max(upper.lowerBound, Math.min(found.bound, upperCost));
  if (found.values === null) {
    // No route beat the heuristic's; the search may still have proven it least.
    return { plan: { ...upper, lowerBound: found.proven ? upperCost : lowerBound }, stats };
  }
  const plan = expand(graph, group, rpp, reduced, found.values, start, end);
  return { plan: { ...plan, lowerBound: found.proven ? plan.travelCost + plan.endCost : Math.max(upper.lowerBound, Math.min(found.bound, plan.travelCost + plan.endCost)) }, stats };
}

/** Turns a solution into travel copies, free ends and passes. */
function expand(graph: PlanarGraph, group: RouteGroup, rpp: RppProgram, reduced: ReturnType<typeof reduceGraph>, values: Float64Array, start: number, end: number): GroupPlan {
  const copies: number[] = [];
  let travelCost = 0;
  let endCost = 0;
  for (let c = 0; c < rpp.travelCols; c++) {
    const times = Math.round(values[c]!);
    const t = reduced.travel[c]!;
    for (let i = 0; i < times; i++) copies.push(...t.edges);
    travelCost += times * t.cost;
  }
  reduced.required.forEach((r, i) => {
    const c = rpp.requiredCol[i]!;
    if (c < 0 || Math.round(values[c]!) === 0) return;
    copies.push(...r.edges);
    travelCost += r.cost;
  });
  const freeEnds: number[] = [];
  rpp.endCol.forEach((c, v) => {
    if (c < 0 || Math.round(values[c]!) === 0) return;
    freeEnds.push(reduced.kept[v]!);
    endCost += rpp.colCost[c]!;
  });
  const passes = buildPasses(graph, [...group.quiltingEdges, ...copies], freeEnds, start, end);
  return { passes, travelCopies: copies, travelCost, endCost, lowerBound: 0, method: 'branch-and-cut' };
}
