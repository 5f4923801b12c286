import type { PlanarGraph } from '../graph/planarGraph.types.ts';
import { buildPasses } from './buildPasses.ts';
import { findEndOffers, type EndOffer } from './endOffers.ts';
import type { EulerWalk } from './eulerWalk.ts';
import { joinComponents } from './joinPieces.ts';
import { findMinTJoin, timed, type PlannerStats, type TJoin } from './minTJoin.ts';
import type { RouteGroup } from './routeGroups.ts';
import type { PathSearch } from './shortestPaths.ts';
import type { EndCosts, EndPlace } from './threadEnds.ts';
import { UnionFind } from './unionFind.ts';

/** How the planner may end passes inside one group. */
export interface GroupEnds {
  /** Stops allowed beyond the group's one pass (each adds two free thread ends). */
  readonly extraStops: number;
  readonly places: readonly EndPlace[];
  readonly costs: EndCosts;
}

/** How one group was planned. Costs are integers in TravelGraph units. */
export interface GroupPlan {
  /** The group's passes in sewing order. */
  readonly passes: readonly EulerWalk[];
  /** Planar edge ids of the travel copies (each copy once per traversal). */
  readonly travelCopies: readonly number[];
  readonly travelCost: number;
  /** Σ end cost of the free thread ends (see threadEnds.ts). */
  readonly endCost: number;
  /** No route over the group with this many stops has travelCost + endCost below this. */
  readonly lowerBound: number;
  /**
   * - `exact`: one piece, or the min T-join already joins the pieces (proven);
   * - `tree-then-pairing`, `pairing-then-double-tree`: the heuristic joins (not proven unless they meet the bound);
   * - `branch-and-cut`: the exact planner (exact/planGroupExact.ts).
   */
  readonly method: 'exact' | 'tree-then-pairing' | 'pairing-then-double-tree' | 'branch-and-cut';
}

/**
 * Plans one travel group: one pass plus at most `ends.extraStops` stops, least travel plus end costs.
 * Terminals are the group's odd points with the fixed ends toggled in (T = odd Δ {s} Δ {t}); missing ends become
 * free ends, and each extra stop adds two more (docs/engine.md §3.1). When the quilting lines form one piece
 * this is route inspection and exact (Edmonds & Johnson 1973; Orloff 1974 for optional travel lines). With several
 * pieces the min T-join is a lower bound (any route's travel contains a T-join); if its paths already connect the
 * pieces (passes may also meet through free ends) it is optimal. Otherwise two joins are tried and the cheaper kept:
 *  (a) Frederickson (J. ACM 26 (1979) 538–554): spanning tree over the pieces, then pair the new odd points;
 *  (b) the min T-join, then a spanning tree over what is still apart, each tree path travelled twice.
 * This heuristic is the exact planner's first upper bound and its fallback.
 */
export function planGroup(graph: PlanarGraph, search: PathSearch, group: RouteGroup, start: number, end: number, ends: GroupEnds, stats?: PlannerStats): GroupPlan {
  const required = group.quiltingEdges;
  const freeEnds = (start < 0 ? 1 : 0) + (end < 0 ? 1 : 0);
  const onLines = new Uint8Array(graph.vertices.length);
  for (const e of required) onLines[graph.edges[e]!.u] = onLines[graph.edges[e]!.v] = 1;
  // A fixed end off the quilting lines (a block corner) is never a free end: that would be a pass of no stitches.
  const barred = (v: number): boolean => (v === start || v === end) && !onLines[v];
  const endCount = freeEnds + 2 * ends.extraStops;
  const pairing = (extra: readonly number[]): { join: TJoin; offers: Map<number, EndOffer | null> } => {
    const terminals = findTerminals(graph, [required, extra], start, end);
    const offers = endCount > 0 ? findEndOffers(search, terminals, ends.places, onLines, ends.costs, barred) : new Map<number, EndOffer | null>();
    const costOf = (v: number): number => {
      const o = offers.get(v);
      return o ? o.travel + o.end : -1;
    };
    return { join: findMinTJoin(search, terminals, { count: endCount, costOf }, stats), offers };
  };

  const first = pairing([]);
  const lowerBound = first.join.cost + first.join.endCost;
  let best = settle(first.join, first.offers, []);
  let method: GroupPlan['method'] = 'exact';
  const mustReach = [...group.vertices];
  for (const v of [start, end]) if (v >= 0 && !onLines[v] && !mustReach.includes(v)) mustReach.push(v);
  const joined = componentsOf(graph, [required, best.copies], best.freeEnds);
  if (countRoots(joined, mustReach) > 1) {
    const pieces = componentsOf(graph, [required], []);
    const tree = timed(stats, 'searchMs', () => joinComponents(search, mustReach, (v) => pieces.find(v)));
    const treeEdges = tree.paths.flat();
    const rejoin = pairing(treeEdges);
    const a = settle(rejoin.join, rejoin.offers, treeEdges, tree.cost);
    const treeB = timed(stats, 'searchMs', () => joinComponents(search, mustReach, (v) => joined.find(v)));
    const treeEdgesB = treeB.paths.flat();
    const b = { ...best, copies: [...best.copies, ...treeEdgesB, ...treeEdgesB], travel: best.travel + 2 * treeB.cost };
    const aWins = a.travel + a.endCost <= b.travel + b.endCost;
    best = aWins ? a : b;
    method = aWins ? 'tree-then-pairing' : 'pairing-then-double-tree';
  }
  const passes = timed(stats, 'walkMs', () => buildPasses(graph, [...required, ...best.copies], best.freeEnds, start, end));
  return { passes, travelCopies: best.copies, travelCost: best.travel, endCost: best.endCost, lowerBound, method };
}

interface Settled {
  readonly copies: number[];
  readonly freeEnds: number[];
  readonly travel: number;
  readonly endCost: number;
}

/** A pairing's travel copies and free ends, with each open terminal moved to where its offer puts the thread end. */
function settle(join: TJoin, offers: Map<number, EndOffer | null>, extra: readonly number[], extraCost = 0): Settled {
  const copies = [...extra, ...join.paths.flat()];
  const freeEnds: number[] = [];
  let travel = extraCost + join.cost;
  let endCost = 0;
  for (const t of join.openEnds) {
    const o = offers.get(t)!;
    freeEnds.push(o.vertex);
    copies.push(...o.path);
    travel += o.travel;
    endCost += o.end;
  }
  return { copies, freeEnds, travel, endCost };
}

/** T = vertices of odd degree over the edge lists, toggled by the fixed ends; sorted. */
function findTerminals(graph: PlanarGraph, lists: readonly (readonly number[])[], start: number, end: number): number[] {
  const parity = new Uint8Array(graph.vertices.length);
  const flipped: number[] = [];
  const flip = (v: number): void => {
    if (parity[v] === 0) flipped.push(v);
    parity[v]! ^= 1;
  };
  for (const list of lists) {
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
    parity[v] = 0; // a vertex flipped back and forth is listed more than once: report it once
  }
  return out.sort((a, b) => a - b);
}

/** Components of the given edges; all free ends count as joined (passes meet through their thread ends). */
function componentsOf(graph: PlanarGraph, lists: readonly (readonly number[])[], freeEnds: readonly number[]): UnionFind {
  const uf = new UnionFind(graph.vertices.length);
  for (const edges of lists) for (const e of edges) uf.union(graph.edges[e]!.u, graph.edges[e]!.v);
  for (let i = 1; i < freeEnds.length; i++) uf.union(freeEnds[0]!, freeEnds[i]!);
  return uf;
}

function countRoots(uf: UnionFind, vertices: readonly number[]): number {
  const roots = new Set<number>();
  for (const v of vertices) roots.add(uf.find(v));
  return roots.size;
}
