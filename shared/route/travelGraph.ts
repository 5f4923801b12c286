import type { LineKind, PlanarGraph } from '../graph/planarGraph.types.ts';

/** Cost factor per kind of travel; the planner minimises Σ factor × length. Default: all 1 (equal by length). */
export interface TravelWeights {
  readonly retrace: number;
  readonly ditch: number;
  readonly edge: number;
}

export const EQUAL_TRAVEL_WEIGHTS: TravelWeights = { retrace: 1, ditch: 1, edge: 1 };

/**
 * The lines the needle may travel on, as a compressed adjacency list (CSR) over the planar graph's vertices.
 * Costs are integers so that matching is exact: cost = round(factor × length / quantum), with the quantum chosen
 * from the design's total weighted length so every path sum stays below 2^46 (exact in float64, and scale-free:
 * the same design in inches or centimetres gets the same integer costs).
 */
export interface TravelGraph {
  readonly vertexCount: number;
  /** adjacency of v is [offset[v], offset[v+1]) in `adjEdge`/`adjVertex`. */
  readonly offset: Int32Array;
  readonly adjEdge: Int32Array;
  readonly adjVertex: Int32Array;
  /** Integer travel cost per graph edge; −1 where travel is not allowed (edge travel switched off). */
  readonly cost: Float64Array;
  /** Design units (times factor) per cost unit. */
  readonly quantum: number;
}

const COST_RANGE = 2 ** 46;

export function travelFactor(kind: LineKind, weights: TravelWeights): number {
  switch (kind) {
    case 'quilting':
      return weights.retrace;
    case 'seam':
      return weights.ditch;
    case 'edge':
      return weights.edge;
  }
}

/** Builds the travel graph; `edgeTravel: false` leaves block-outline edges out. */
export function buildTravelGraph(graph: PlanarGraph, weights: TravelWeights, edgeTravel: boolean): TravelGraph {
  for (const f of [weights.retrace, weights.ditch, weights.edge]) {
    if (!(Number.isFinite(f) && f > 0)) throw new Error(`route/travelGraph: travel weight ${f} must be finite and > 0`);
  }
  const n = graph.vertices.length;
  const m = graph.edges.length;
  const allowed = (kind: LineKind): boolean => kind !== 'edge' || edgeTravel;
  let total = 0;
  for (const e of graph.edges) if (allowed(e.kind)) total += e.length * travelFactor(e.kind, weights);
  const quantum = total > 0 ? total / COST_RANGE : 1;
  const cost = new Float64Array(m).fill(-1);
  const degree = new Int32Array(n + 1);
  graph.edges.forEach((e, i) => {
    if (e.id !== i) throw new Error(`route/travelGraph: edge ${i} has id ${e.id}; ids must equal positions`);
    if (!allowed(e.kind)) return;
    cost[i] = Math.round((e.length * travelFactor(e.kind, weights)) / quantum);
    degree[e.u]!++;
    if (e.v !== e.u) degree[e.v]!++;
  });
  const offset = new Int32Array(n + 1);
  for (let v = 0; v < n; v++) offset[v + 1] = offset[v]! + degree[v]!;
  const fill = offset.slice(0, n);
  const adjEdge = new Int32Array(offset[n]!);
  const adjVertex = new Int32Array(offset[n]!);
  graph.edges.forEach((e, i) => {
    if (cost[i]! < 0 || e.u === e.v) return;
    adjEdge[fill[e.u]!] = i;
    adjVertex[fill[e.u]!++] = e.v;
    adjEdge[fill[e.v]!] = i;
    adjVertex[fill[e.v]!++] = e.u;
  });
  return { vertexCount: n, offset, adjEdge, adjVertex, cost, quantum };
}
