import type { Point } from '../geometry/point.ts';
import type { PlanarGraph } from '../graph/planarGraph.types.ts';
import type { PlannerStats } from './minTJoin.ts';
import { planGroup, type GroupPlan } from './planGroup.ts';
import { findRouteGroups } from './routeGroups.ts';
import { buildStrokes, type RouteLengths, type Stroke } from './routeStrokes.ts';
import { PathSearch } from './shortestPaths.ts';
import { buildTravelGraph, EQUAL_TRAVEL_WEIGHTS, travelFactor, type TravelWeights } from './travelGraph.ts';

export interface PlanOptions {
  /** Cost factors for retrace, ditch and edge travel (default: all 1, equal by length). */
  readonly weights?: TravelWeights;
  /** Whether the block outline may carry travel (default true). */
  readonly edgeTravel?: boolean;
  /** Where the route should begin and end (design units); each maps to the nearest vertex of a pass's lines. */
  readonly start?: Point;
  readonly end?: Point;
  /** A millisecond clock for per-step timings (benchmarks pass `performance.now`); the core never reads one itself. */
  readonly clock?: () => number;
}

/**
 * Wall time per planner step, in ms, when a clock was passed: travel graph and groups, shortest paths, matching,
 * Euler walk (Hierholzer only; turning walks into strokes is the rest of the planning time).
 */
export interface PlanStepTimes {
  travelGraph: number;
  shortestPaths: number;
  matching: number;
  eulerWalk: number;
}

/** An optimal (or, for joined pieces, best-found) route with its figures. Lengths in design units. */
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
  /** No route over these lines with this many passes has less travel cost than this. */
  readonly travelLowerBound: number;
  /** True when the travel is proven least (it equals the lower bound). */
  readonly optimal: boolean;
  /** Vertices the start and end points were mapped to, if given. */
  readonly startVertex: number | null;
  readonly endVertex: number | null;
  readonly steps: PlanStepTimes | null;
}

/**
 * Plans a route over a planar graph: fewest passes first (one per group of pieces that travel lines connect;
 * pieces no travel reaches get their own pass), then least travel cost within each pass (see planGroup).
 * `start`/`end` map to the nearest vertex (Euclidean) from which travel lines reach quilting lines (block corners
 * qualify when edge travel is on); the pass holding the start
 * goes first and the pass holding the end goes last. Other passes follow in the order of their lowest vertex index.
 */
export function planRoute(graph: PlanarGraph, options: PlanOptions = {}): RoutePlan {
  const clock = options.clock;
  const t0 = clock?.() ?? 0;
  const weights = options.weights ?? EQUAL_TRAVEL_WEIGHTS;
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

  const totals: RouteLengths = { stitchLength: 0, retraceLength: 0, ditchLength: 0, edgeLength: 0 };
  const stitched = new Uint8Array(graph.edges.length);
  const route: Stroke[] = [];
  let cost = 0;
  let lowerBound = 0;
  let lowerBoundCost = 0;
  let travelCostInt = 0;
  order.forEach((gi, pass) => {
    const group = groups[gi]!;
    const s = gi === startGroup ? startVertex : -1;
    const t = gi === endGroup ? endVertex : -1;
    const plan: GroupPlan = planGroup(graph, search, group, s, t, stats);
    // Turning the walk into strokes is output, not part of the Euler-walk step (the benchmark compares that step alone).
    for (const stroke of buildStrokes(graph, plan.walk, pass + 1, stitched, totals)) route.push(stroke);
    for (const e of plan.travelCopies) cost += weightedLength(graph, weights, e);
    for (const e of plan.lowerBoundEdges) lowerBound += weightedLength(graph, weights, e);
    lowerBoundCost += plan.lowerBoundCost;
    travelCostInt += plan.travelCost;
  });
  const travelLength = totals.retraceLength + totals.ditchLength + totals.edgeLength;
  return {
    ...totals,
    route,
    passes: groups.length,
    stops: Math.max(0, groups.length - 1),
    pieces: pieceCount,
    oddPoints: oddVertices.length,
    travelLength,
    travelCost: cost,
    travelLowerBound: lowerBound,
    optimal: travelCostInt === lowerBoundCost,
    startVertex: startVertex >= 0 ? startVertex : null,
    endVertex: endVertex >= 0 ? endVertex : null,
    steps: clock
      ? {
          travelGraph: t1 - t0,
          shortestPaths: stats.searchMs,
          matching: stats.matchMs,
          eulerWalk: stats.walkMs,
        }
      : null,
  };
}

function weightedLength(graph: PlanarGraph, weights: TravelWeights, e: number): number {
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
