import type { PlanarGraph } from '../graph/planarGraph.types.ts';
import { findEulerWalk, type EulerWalk } from './eulerWalk.ts';
import { joinComponents } from './joinPieces.ts';
import { findMinTJoin, timed, type PlannerStats } from './minTJoin.ts';
import type { RouteGroup } from './routeGroups.ts';
import type { PathSearch } from './shortestPaths.ts';
import { UnionFind } from './unionFind.ts';

/** How one pass was planned. */
export interface GroupPlan {
  readonly walk: EulerWalk;
  /** Graph edge ids of the travel copies (each copy once per traversal). */
  readonly travelCopies: readonly number[];
  /** Σ integer travel cost of the chosen route and of the lower bound (min T-join). */
  readonly travelCost: number;
  readonly lowerBoundCost: number;
  readonly lowerBoundEdges: readonly number[];
  /** `exact`: one piece, or the min T-join already connects the pieces; otherwise the join that won. */
  readonly method: 'exact' | 'tree-then-pairing' | 'pairing-then-double-tree';
}

/**
 * Plans one pass over a travel group: fewest passes (one), then least travel.
 * Terminals are the group's odd points with the fixed ends toggled in (T = odd Δ {s} Δ {t}); missing ends become
 * free ends (engine-references.md §1.3). When the quilting lines form one piece this is route inspection and exact
 * (Edmonds & Johnson 1973; Orloff 1974 for optional travel lines). With several pieces the min T-join is a lower
 * bound (any route's travel contains a T-join); if its paths already connect the pieces (and any fixed end lying
 * off the quilting lines) it is optimal. Otherwise
 * two joins are tried and the cheaper kept:
 *  (a) Frederickson (J. ACM 26 (1979) 538–554): spanning tree over the pieces, then pair the new odd points;
 *  (b) the min T-join, then a spanning tree over what is still apart, each tree path travelled twice.
 */
export function planGroup(graph: PlanarGraph, search: PathSearch, group: RouteGroup, start: number, end: number, stats?: PlannerStats): GroupPlan {
  const required = group.quiltingEdges;
  const freeEnds = ((start < 0 ? 1 : 0) + (end < 0 ? 1 : 0)) as 0 | 1 | 2;
  const parity = new Uint8Array(graph.vertices.length);
  const flipped: number[] = [];
  const flip = (v: number): void => {
    if (parity[v] === 0) flipped.push(v);
    parity[v]! ^= 1;
  };
  const terminalsOf = (extra: readonly number[]): number[] => {
    for (const list of [required, extra]) {
      for (const e of list) {
        flip(graph.edges[e]!.u);
        flip(graph.edges[e]!.v);
      }
    }
    if (start >= 0) flip(start);
    if (end >= 0) flip(end);
    const out: number[] = [];
    for (const v of flipped) {
      if (parity[v] === 1) out.push(v);
      parity[v] = 0;
    }
    flipped.length = 0;
    return out.sort((a, b) => a - b);
  };

  const onLines = new Uint8Array(graph.vertices.length);
  for (const e of required) onLines[graph.edges[e]!.u] = onLines[graph.edges[e]!.v] = 1;
  // With one end fixed off the quilting lines and the other free, the free end must not be that same point.
  const notFree = freeEnds === 1 ? [start, end].filter((v) => v >= 0 && !onLines[v]) : [];
  const join = findMinTJoin(search, terminalsOf([]), freeEnds, stats, notFree);
  const joinEdges = join.paths.flat();
  const lowerBound = { lowerBoundCost: join.cost, lowerBoundEdges: joinEdges };
  let travelCopies = joinEdges;
  let travelCost = join.cost;
  let method: GroupPlan['method'] = 'exact';
  let openEnds = join.openEnds;

  // The route must reach a fixed start or end even when it lies off the quilting lines (a block corner): such an
  // end counts as one more piece to join.
  const mustReach = [...group.vertices];
  for (const v of [start, end]) if (v >= 0 && !onLines[v] && !mustReach.includes(v)) mustReach.push(v);
  const joined = componentsOf(graph, required, joinEdges);
  if (countRoots(joined, mustReach) > 1) {
    const pieces = componentsOf(graph, required);
    const tree = timed(stats, 'searchMs', () => joinComponents(search, mustReach, (v) => pieces.find(v)));
    const treeEdges = tree.paths.flat();
    const rejoin = findMinTJoin(search, terminalsOf(treeEdges), freeEnds, stats, notFree);
    const costA = tree.cost + rejoin.cost;
    const treeB = timed(stats, 'searchMs', () => joinComponents(search, mustReach, (v) => joined.find(v)));
    const costB = join.cost + 2 * treeB.cost;
    if (costA <= costB) {
      travelCopies = [...treeEdges, ...rejoin.paths.flat()];
      travelCost = costA;
      method = 'tree-then-pairing';
      openEnds = rejoin.openEnds;
    } else {
      const treeEdgesB = treeB.paths.flat();
      travelCopies = [...joinEdges, ...treeEdgesB, ...treeEdgesB];
      travelCost = costB;
      method = 'pairing-then-double-tree';
    }
  }

  const walkStart = start >= 0 ? start : pickStart(openEnds, end, graph, required);
  const walk = timed(stats, 'walkMs', () => {
    const copies = new Int32Array(required.length + travelCopies.length);
    copies.set(required);
    copies.set(travelCopies, required.length);
    return findEulerWalk(graph, copies, walkStart);
  });
  const steps = walk.edges.length;
  if (end >= 0 && steps > 0) {
    const last = graph.edges[walk.edges[steps - 1]!]!;
    const at = walk.forward[steps - 1] === 1 ? last.v : last.u;
    if (at !== end) throw new Error(`route/planGroup: walk ends at ${at}, not at the fixed end ${end}`);
  }
  return { walk, travelCopies, travelCost, method, ...lowerBound };
}

/** With a free start: begin at a free end the pairing left open (not the fixed end), else anywhere on the lines. */
function pickStart(openEnds: readonly number[], end: number, graph: PlanarGraph, required: readonly number[]): number {
  const other = openEnds.find((v) => v !== end);
  if (other !== undefined) return other;
  if (end >= 0) return end;
  return graph.edges[required[0]!]!.u;
}

function componentsOf(graph: PlanarGraph, ...lists: (readonly number[])[]): UnionFind {
  const uf = new UnionFind(graph.vertices.length);
  for (const edges of lists) for (const e of edges) uf.union(graph.edges[e]!.u, graph.edges[e]!.v);
  return uf;
}

function countRoots(uf: UnionFind, vertices: readonly number[]): number {
  const roots = new Set<number>();
  for (const v of vertices) roots.add(uf.find(v));
  return roots.size;
}
