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
  const groupIndex = new Map<number, number>();
  const edgeLists: number[][] = [];
  const vertexLists: number[][] = [];
  const pieceRoots: Set<number>[] = [];
  for (let v = 0; v < n; v++) {
    if (!touched[v]) continue;
    const root = groups.find(v);
    let g = groupIndex.get(root);
    if (g === undefined) {
      g = edgeLists.length;
      groupIndex.set(root, g);
      edgeLists.push([]);
      vertexLists.push([]);
      pieceRoots.push(new Set());
    }
    vertexLists[g]!.push(v);
    pieceRoots[g]!.add(pieces.find(v));
  }
  for (const e of graph.edges) if (e.kind === 'quilting') edgeLists[groupIndex.get(groups.find(e.u))!]!.push(e.id);
  const oddVertices: number[] = [];
  degree.forEach((d, v) => {
    if (d % 2 === 1) oddVertices.push(v);
  });
  const groupOfVertex = new Int32Array(n).fill(-1);
  for (let v = 0; v < n; v++) groupOfVertex[v] = groupIndex.get(groups.find(v)) ?? -1;
  let pieceCount = 0;
  const out = edgeLists.map((quiltingEdges, g) => {
    pieceCount += pieceRoots[g]!.size;
    return { quiltingEdges, vertices: vertexLists[g]!, pieceCount: pieceRoots[g]!.size };
  });
  return { pieceCount, groups: out, oddVertices, groupOfVertex };
}
