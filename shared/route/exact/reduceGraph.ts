import type { PlanarGraph } from '../../graph/planarGraph.types.ts';
import type { EndPlace } from '../threadEnds.ts';
import type { TravelGraph } from '../travelGraph.ts';
import { UnionFind } from '../unionFind.ts';
import { findKeptPaths } from './keptPaths.ts';

/** An edge of the reduced graph: a run of planar-graph edges between two kept vertices (indices into `kept`). */
export interface ReducedEdge {
  readonly a: number;
  readonly b: number;
  /** Planar-graph edge ids from kept[a] to kept[b], in order. */
  readonly edges: readonly number[];
  /** Σ integer travel cost (TravelGraph units) of one traversal. */
  readonly cost: number;
}

/**
 * The rural postman instance reduced after Christofides, Campos, Corberán & Mota (1981, Imperial College report
 * IC.O.R.81.5; report number from memory) and as used by Ghiani & Laporte (Math. Programming 87 (2000) 467–481):
 * - kept vertices: where quilting lines end or meet anything else, plus fixed route ends;
 * - required edges: the quilting lines, with chains through vertices that nothing else touches contracted;
 * - travel edges: one shortest travel path between two kept vertices, unless some other kept vertex splits it at
 *   no extra cost (then the two shorter paths are enough), and unless it only retraces one required edge.
 */
export interface ReducedGraph {
  /** Kept vertex i is planar-graph vertex kept[i]. */
  readonly kept: Int32Array;
  /** Planar-graph vertex → kept index, or −1. */
  readonly keptIndex: Int32Array;
  readonly required: readonly ReducedEdge[];
  readonly travel: readonly ReducedEdge[];
  /** Piece (connected run of required edges) per kept vertex; −1 for a fixed end off the quilting lines. */
  readonly pieceOf: Int32Array;
  readonly pieceCount: number;
  /** Number of required-edge ends at each kept vertex, mod 2. */
  readonly parity: Uint8Array;
}

/**
 * Reduces one travel group. `quiltingEdges` are the group's quilting edges; `fixedEnds` lists the fixed start and
 * end vertices (may lie off the quilting lines, e.g. a block corner reached by edge travel). A vertex in a hidden
 * place (`places`) is kept even inside a chain: a thread end may be put there.
 */
export function reduceGraph(
  graph: PlanarGraph,
  travel: TravelGraph,
  quiltingEdges: readonly number[],
  fixedEnds: readonly number[],
  places: readonly EndPlace[],
): ReducedGraph {
  const n = graph.vertices.length;
  const inGroup = new Uint8Array(graph.edges.length);
  const reqDegree = new Int32Array(n);
  for (const e of quiltingEdges) {
    inGroup[e] = 1;
    reqDegree[graph.edges[e]!.u]!++;
    reqDegree[graph.edges[e]!.v]!++;
  }
  // A chain vertex: two quilting-line ends and no other line of any kind (so travel through it follows the chain),
  // in the open (no thread end is ever better placed there than at the chain's ends).
  const chain = new Uint8Array(n);
  for (const e of quiltingEdges) {
    for (const v of [graph.edges[e]!.u, graph.edges[e]!.v]) {
      chain[v] = reqDegree[v] === 2 && travel.offset[v + 1]! - travel.offset[v]! === 2 && places[v] === 'open' && !fixedEnds.includes(v) ? 1 : 0;
    }
  }
  const keptIndex = new Int32Array(n).fill(-1);
  const kept: number[] = [];
  const keep = (v: number): void => {
    if (keptIndex[v]! >= 0) return;
    keptIndex[v] = kept.length;
    kept.push(v);
  };
  for (const e of quiltingEdges) for (const v of [graph.edges[e]!.u, graph.edges[e]!.v]) if (!chain[v]) keep(v);
  for (const v of fixedEnds) keep(v);

  const required = contractChains(graph, travel, quiltingEdges, inGroup, chain, keptIndex, kept, keep);
  const pieces = new UnionFind(kept.length);
  for (const r of required) pieces.union(r.a, r.b);
  const pieceOf = new Int32Array(kept.length).fill(-1);
  const onLines = new Uint8Array(kept.length);
  for (const r of required) onLines[r.a] = onLines[r.b] = 1;
  const pieceIds = new Map<number, number>();
  for (let i = 0; i < kept.length; i++) {
    if (!onLines[i]) continue;
    const root = pieces.find(i);
    if (!pieceIds.has(root)) pieceIds.set(root, pieceIds.size);
    pieceOf[i] = pieceIds.get(root)!;
  }
  const parity = new Uint8Array(kept.length);
  for (let i = 0; i < kept.length; i++) parity[i] = reqDegree[kept[i]!]! % 2;

  const keptArr = Int32Array.from(kept);
  const retraceKeys = new Set(required.map((r) => pathKey(r.edges)));
  const travelEdges = findKeptPaths(travel, keptArr, keptIndex).filter((t) => !retraceKeys.has(pathKey(t.edges)));
  return { kept: keptArr, keptIndex, required, travel: travelEdges, pieceOf, pieceCount: pieceIds.size, parity };
}

/** Follows each quilting line from a kept vertex through chain vertices to the next kept vertex. */
function contractChains(
  graph: PlanarGraph,
  travel: TravelGraph,
  quiltingEdges: readonly number[],
  inGroup: Uint8Array,
  chain: Uint8Array,
  keptIndex: Int32Array,
  kept: number[],
  keep: (v: number) => void,
): ReducedEdge[] {
  const used = new Uint8Array(graph.edges.length);
  const out: ReducedEdge[] = [];
  const otherQuilting = (v: number, e: number): number => {
    for (let q = travel.offset[v]!; q < travel.offset[v + 1]!; q++) {
      const f = travel.adjEdge[q]!;
      if (f !== e && inGroup[f] && !used[f]) return f;
    }
    throw new Error(`route/exact/reduceGraph: chain vertex ${v} has no second quilting edge`);
  };
  const walk = (start: number, first: number): void => {
    const edges: number[] = [];
    let cost = 0;
    let e = first;
    let at = start;
    for (;;) {
      used[e] = 1;
      edges.push(e);
      cost += travel.cost[e]!;
      const edge = graph.edges[e]!;
      at = edge.u === at ? edge.v : edge.u;
      if (!chain[at]) break;
      e = otherQuilting(at, e);
    }
    out.push({ a: keptIndex[start]!, b: keptIndex[at]!, edges, cost });
  };
  for (let i = 0; i < kept.length; i++) {
    const v = kept[i]!;
    for (let q = travel.offset[v]!; q < travel.offset[v + 1]!; q++) {
      const e = travel.adjEdge[q]!;
      if (inGroup[e] && !used[e]) walk(v, e);
    }
  }
  // Closed loops of chain vertices only: keep one vertex of each and follow the loop from it.
  for (const e of quiltingEdges) {
    if (used[e]) continue;
    const v = graph.edges[e]!.u;
    chain[v] = 0;
    keep(v);
    walk(v, e);
  }
  return out;
}

/** Same planar edges in any order and direction ⇒ same key. */
function pathKey(edges: readonly number[]): string {
  return [...edges].sort((a, b) => a - b).join(',');
}
