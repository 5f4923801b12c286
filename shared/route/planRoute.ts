import type { Point } from '../geometry/point.ts';
import type { PlanarGraph } from '../graph/planarGraph.types.ts';
import { allocateStops } from './allocateStops.ts';
import { Budget } from './exact/budget.ts';
import type { LpSolver } from './exact/lpSolver.ts';
import type { ExactStats } from './exact/planGroupExact.ts';
import { GroupPlans, type GroupSetting, type PlannedGroup } from './groupPlans.ts';
import type { PlannerStats } from './minTJoin.ts';
import { findRouteGroups } from './routeGroups.ts';
import { buildStrokes, type RouteLengths, type Stroke } from './routeStrokes.ts';
import { PathSearch } from './shortestPaths.ts';
import { buildStopsTable, MAX_EXTRA_STOPS, type StopsTableRow } from './stopsTable.ts';
import { findEndPlaces, makeEndCosts, type BlockFrame, type ThreadEnd } from './threadEnds.ts';
import { describeThreadEnds } from './describeThreadEnds.ts';
import { buildTravelGraph, EQUAL_TRAVEL_WEIGHTS, travelFactor, type TravelWeights } from './travelGraph.ts';

export interface PlanOptions {
  /** Cost factors for retrace, ditch and edge travel (default: all 1, equal by length). */
  readonly weights?: TravelWeights;
  /** Whether the block outline may carry travel (default true). */
  readonly edgeTravel?: boolean;
  /** Where the route should begin and end (design units); each maps to the nearest vertex of a pass's lines. */
  readonly start?: Point;
  readonly end?: Point;
  /** A millisecond clock for per-step timings and the time budget; the core never reads one itself. */
  readonly clock?: () => number;
  /** Stops allowed beyond the fewest passes (0 to MAX_EXTRA_STOPS; default 0). Unused stops are not made. */
  readonly extraStops?: number;
  /** Extra travel (design units) one thread end on a seam or at the edge may cost instead of one in the open (default 0). */
  readonly hiddenEndAllowance?: number;
  /** The block's outline and binding band, so thread ends within the band count as hidden under the binding. */
  readonly frame?: BlockFrame;
  /**
   * The exact planner (solver and time budget in ms); without it the heuristic's route and bound stand. `always`
   * runs the exact search even where the heuristic proved its route (to compare the two).
   */
  readonly exact?: { readonly solver: LpSolver; readonly timeBudgetMs: number; readonly always?: boolean };
  /** Also give the stops-vs-travel table for 0…MAX_EXTRA_STOPS extra stops. */
  readonly stopsTable?: boolean;
}

/**
 * Wall time per planner step, in ms, when a clock was passed: travel graph and groups, shortest paths, matching,
 * Euler walk (Hierholzer only; turning walks into strokes is the rest of the planning time), exact search.
 */
export interface PlanStepTimes {
  travelGraph: number;
  shortestPaths: number;
  matching: number;
  eulerWalk: number;
  exactSearch: number;
}

/** A planned route with its figures and its proof status. Lengths in design units. */
export interface RoutePlan extends RouteLengths {
  readonly route: readonly Stroke[];
  readonly passes: number;
  readonly stops: number;
  readonly pieces: number;
  readonly oddPoints: number;
  /** retrace + ditch + edge length. */
  readonly travelLength: number;
  /** Σ weight × length over travel (equals travelLength with equal weights). */
  readonly travelCost: number;
  /** No route over these lines with this many stops (and as well-hidden ends) has less travel cost than this. */
  readonly travelLowerBound: number;
  /** True when the travel is proven least (it equals the lower bound). */
  readonly optimal: boolean;
  /** (travelCost − travelLowerBound) / travelCost in percent; 0 when proven. */
  readonly gapPercent: number;
  /** Stops beyond the fewest passes that the planner was allowed. */
  readonly extraStops: number;
  /** Every pass's start and tie-off: where, and why there. */
  readonly threadEnds: readonly ThreadEnd[];
  /** Least travel for 0…3 extra stops, when asked for. */
  readonly stopsTable: readonly StopsTableRow[] | null;
  /** The exact search's figures summed over groups; null when it did not run. */
  readonly exactSearch: ExactStats | null;
  /** Vertices the start and end points were mapped to, if given. */
  readonly startVertex: number | null;
  readonly endVertex: number | null;
  readonly steps: PlanStepTimes | null;
}

/**
 * Plans a route over a planar graph: fewest passes first (one per group of pieces that travel lines connect;
 * pieces no travel reaches get their own pass), plus up to `extraStops` more where they save travel; then least
 * travel cost, and among equal travel, thread ends on seams or at the edge (threadEnds.ts). Each group is planned
 * by the heuristic (planGroup), exact when it proves itself; otherwise by the exact search (exact/) within the
 * time budget. `start`/`end` map to the nearest vertex (Euclidean) from which travel lines reach quilting lines
 * (block corners qualify when edge travel is on); the pass holding the start goes first and the pass holding the
 * end goes last. Other groups follow in the order of their lowest vertex index.
 */
export function planRoute(graph: PlanarGraph, options: PlanOptions = {}): RoutePlan {
  const clock = options.clock;
  const t0 = clock?.() ?? 0;
  const weights = options.weights ?? EQUAL_TRAVEL_WEIGHTS;
  const extraStops = options.extraStops ?? 0;
  if (!Number.isInteger(extraStops) || extraStops < 0 || extraStops > MAX_EXTRA_STOPS) {
    throw new Error(`route/planRoute: extraStops ${extraStops} must be a whole number from 0 to ${MAX_EXTRA_STOPS}`);
  }
  const travel = buildTravelGraph(graph, weights, options.edgeTravel ?? true);
  const { groups, pieceCount, oddVertices, groupOfVertex } = findRouteGroups(graph, travel);
  const t1 = clock?.() ?? 0;
  const search = new PathSearch(travel);
  const stats: PlannerStats = { clock: clock ?? null, searches: 0, matchings: 0, searchMs: 0, matchMs: 0, walkMs: 0 };

  const startVertex = options.start ? nearestVertex(graph, groupOfVertex, options.start) : -1;
  const endVertex = options.end ? nearestVertex(graph, groupOfVertex, options.end) : -1;
  const startGroup = startVertex >= 0 ? groupOfVertex[startVertex]! : -1;
  const endGroup = endVertex >= 0 ? groupOfVertex[endVertex]! : -1;
  const order = groups.map((_, i) => i);
  const rank = (i: number): number => (i === startGroup ? -1 : i === endGroup ? 1 : 0);
  order.sort((a, b) => rank(a) - rank(b) || a - b);
  const settings: GroupSetting[] = order.map((gi) => ({
    group: groups[gi]!,
    start: gi === startGroup ? startVertex : -1,
    end: gi === endGroup ? endVertex : -1,
  }));

  const places = findEndPlaces(graph, options.frame ?? null);
  const costs = makeEndCosts(graph, travel.quantum, options.hiddenEndAllowance ?? 0);
  const budget = options.exact ? new Budget(options.exact.timeBudgetMs, clock ?? null) : null;
  const plans = new GroupPlans(graph, travel, search, settings, places, costs, options.exact && budget ? { solver: options.exact.solver, budget, always: options.exact.always ?? false } : null, stats);
  // The route's own group plans get the budget first, then the table's other rows share what is left.
  const routeKeys = settings.flatMap((_, g) => (settings.length === 1 ? [[g, extraStops]] : range(extraStops + 1).map((k) => [g, k])));
  planAll(plans, routeKeys, budget);
  const chosen = allocateStops(settings.map((_, g) => range(extraStops + 1).map((k) => (plans.has(g, k) ? objectiveOf(plans.get(g, k, 0)) : Infinity))), extraStops);
  const picked = chosen.stops.map((k, g) => plans.get(g, k, 0));
  let stopsTable: StopsTableRow[] | null = null;
  if (options.stopsTable) {
    planAll(plans, settings.flatMap((_, g) => range(MAX_EXTRA_STOPS + 1).map((k) => [g, k])), budget);
    stopsTable = buildStopsTable(graph, weights, travel.quantum, settings.length, (g, k) => plans.get(g, k, 0));
  }

  const totals: RouteLengths = { stitchLength: 0, retraceLength: 0, ditchLength: 0, edgeLength: 0 };
  const stitched = new Uint8Array(graph.edges.length);
  const route: Stroke[] = [];
  const walks = picked.flatMap((p) => p.plan.passes);
  walks.forEach((walk, i) => {
    for (const stroke of buildStrokes(graph, walk, i + 1, stitched, totals)) route.push(stroke);
  });
  let cost = 0;
  for (const p of picked) for (const e of p.plan.travelCopies) cost += weightedLength(graph, weights, e);
  // Proven when every plan the allocation weighed is; the bound is the least Σ of group bounds over all shares.
  const optimal = routeKeys.every(([g, k]) => plans.get(g!, k!, 0).proven);
  const objectiveBound = allocateStops(settings.map((_, g) => range(extraStops + 1).map((k) => (plans.has(g, k) ? plans.get(g, k, 0).plan.lowerBound : Infinity))), extraStops).total;
  const endCost = picked.reduce((s, p) => s + p.plan.endCost, 0);
  const lowerBound = optimal ? cost : Math.min(cost, Math.max(0, objectiveBound - endCost) * travel.quantum);
  const travelLength = totals.retraceLength + totals.ditchLength + totals.edgeLength;
  return {
    ...totals,
    route,
    passes: walks.length,
    stops: Math.max(0, walks.length - 1),
    pieces: pieceCount,
    oddPoints: oddVertices.length,
    travelLength,
    travelCost: cost,
    travelLowerBound: lowerBound,
    optimal,
    gapPercent: cost > 0 ? (100 * (cost - lowerBound)) / cost : 0,
    extraStops,
    threadEnds: describeThreadEnds(graph, walks, places, startVertex, endVertex),
    stopsTable,
    exactSearch: sumStats(picked),
    startVertex: startVertex >= 0 ? startVertex : null,
    endVertex: endVertex >= 0 ? endVertex : null,
    steps: clock
      ? { travelGraph: t1 - t0, shortestPaths: stats.searchMs, matching: stats.matchMs, eulerWalk: stats.walkMs, exactSearch: budget?.spentMs() ?? 0 }
      : null,
  };
}

/** Plans every (group, stops) key not yet planned, each with an even share of the budget left. */
function planAll(plans: GroupPlans, keys: readonly number[][], budget: Budget | null): void {
  const todo = keys.filter(([g, k]) => !plans.has(g!, k!));
  todo.forEach(([g, k], i) => {
    const share = budget ? budget.remainingMs() / (todo.length - i) : 0;
    plans.get(g!, k!, share);
  });
}

export function objectiveOf(p: PlannedGroup): number {
  return p.plan.travelCost + p.plan.endCost;
}

function sumStats(picked: readonly PlannedGroup[]): ExactStats | null {
  const ran = picked.map((p) => p.exact).filter((s): s is ExactStats => s !== null);
  if (ran.length === 0) return null;
  const sum = (f: (s: ExactStats) => number): number => ran.reduce((t, s) => t + f(s), 0);
  return {
    pieces: sum((s) => s.pieces),
    keptVertices: sum((s) => s.keptVertices),
    reducedEdges: sum((s) => s.reducedEdges),
    cutRounds: sum((s) => s.cutRounds),
    cuts: sum((s) => s.cuts),
    nodes: sum((s) => s.nodes),
    lpBound: sum((s) => s.lpBound),
    objective: sum((s) => s.objective),
    proven: ran.every((s) => s.proven),
    ms: sum((s) => s.ms),
  };
}

function range(n: number): number[] {
  return Array.from({ length: n }, (_, i) => i);
}

export function weightedLength(graph: PlanarGraph, weights: TravelWeights, e: number): number {
  const edge = graph.edges[e]!;
  return edge.length * travelFactor(edge.kind, weights);
}

function nearestVertex(graph: PlanarGraph, groupOfVertex: Int32Array, p: Point): number {
  let best = -1;
  let bestD = Infinity;
  for (let v = 0; v < graph.vertices.length; v++) {
    if (groupOfVertex[v]! < 0) continue;
    const q = graph.vertices[v]!;
    const d = (q[0] - p[0]) ** 2 + (q[1] - p[1]) ** 2;
    if (d < bestD || (d === bestD && v < best)) {
      best = v;
      bestD = d;
    }
  }
  return best;
}
