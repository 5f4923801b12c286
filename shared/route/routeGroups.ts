import type { PlanarGraph } from '../graph/planarGraph.types.ts';
import type { TravelGraph } from './travelGraph.ts';
import { UnionFind } from './unionFind.ts';

/** Quilting lines split by what joins them: pieces (joined by quilting lines) inside travel groups. */
export interface RouteGroups {
  /** Number of pieces: connected groups of quilting edges. */
  readonly pieceCount: number;
  /** Per travel group that holds quilting lines: its quilting edge ids and vertices, in a stable order. */
  readonly groups: readonly RouteGroup[];
  /** Odd points: vertices where an odd number of quilting-edge ends meet (a loop counts twice). */
  readonly oddVertices: readonly number[];
  /** Index into `groups` of the group each vertex can travel within, or −1 (no quilting line reachable). */
  readonly groupOfVertex: Int32Array;
}

export interface RouteGroup {
  readonly quiltingEdges: readonly number[];
  /** Vertices touched by the group's quilting edges. */
  readonly vertices: readonly number[];
  /** How many pieces the group holds (more than 1 means travel must join them). */
  readonly pieceCount: number;
}

/**
 * Groups the quilting lines. Two pieces share a group when travel lines (retrace, ditch, edge) connect them;
 * each group is one pass, since travel can always carry the needle between its pieces without a stop.
 */
export function findRouteGroups(graph: PlanarGraph, travel: TravelGraph): RouteGroups {
  const n = graph.vertices.length;
  const pieces = new UnionFind(n);
  const groups = new UnionFind(n);
  const degree = new Int32Array(n);
  const touched = new Uint8Array(n);
  for (const e of graph.edges) {
    if (travel.cost[e.id]! >= 0) groups.union(e.u, e.v);
    if (e.kind !== 'quilting') continue;
    pieces.union(e.u, e.v);
    degree[e.u]!++;
    degree[e.v]!++;
    touched[e.u] = 1;
    touched[e.v] = 1;
  }
  // Groups are numbered in the order of their lowest touched vertex.
  const groupOfRoot = new Int32Array(n).fill(-1);
  const pieceSeen = new Uint8Array(n);
  const edgeLists: number[][] = [];
  const vertexLists: number[][] = [];
  const pieceCounts: number[] = [];
  for (let v = 0; v < n; v++) {
    if (!touched[v]) continue;
    const root = groups.find(v);
    let g = groupOfRoot[root]!;
    if (g < 0) {
      g = groupOfRoot[root] = edgeLists.length;
      edgeLists.push([]);
      vertexLists.push([]);
      pieceCounts.push(0);
    }
    vertexLists[g]!.push(v);
    const piece = pieces.find(v);
    if (!pieceSeen[piece]) {
      pieceSeen[piece] = 1;
      pieceCounts[g]!++;
    }
  }
  for (const e of graph.edges) if (e.kind === 'quilting') edgeLists[groupOfRoot[groups.find(e.u)]!]!.push(e.id);
  const oddVertices: number[] = [];
  for (let v = 0; v < n; v++) if (degree[v]! % 2 === 1) oddVertices.push(v);
  const groupOfVertex = new Int32Array(n);
  for (let v = 0; v < n; v++) groupOfVertex[v] = groupOfRoot[groups.find(v)]!;
  let pieceCount = 0;
  const out = edgeLists.map((quiltingEdges, g) => {
    pieceCount += pieceCounts[g]!;
    return { quiltingEdges, vertices: vertexLists[g]!, pieceCount: pieceCounts[g]! };
  });
  return { pieceCount, groups: out, oddVertices, groupOfVertex };
}
