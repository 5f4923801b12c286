import type { Point } from '../geometry/point.ts';
import type { PlanarGraph } from '../graph/planarGraph.types.ts';

/**
 * Where a thread end (a pass's start or its tie-off) sits, by how well the small bump of the knot hides:
 * - `edge`: at the block's outer edge, where the binding will cover it;
 * - `seam`: on a seam line, where the knot sinks into the ditch;
 * - `open`: in the open middle of a patch, where it shows.
 * Preferring the first two is common practice, no source.
 */
export type EndPlace = 'edge' | 'seam' | 'open';

/**
 * Why a thread end is where it is:
 * - `fixed`: the quilter set the route's start or end there;
 * - `hidden`: the planner put it on a seam or at the edge;
 * - `no-hidden-place`: no route with as little travel (plus the allowance for hidden ends) ends at a seam or the edge.
 */
export type EndReason = 'fixed' | 'hidden' | 'no-hidden-place';

/** One thread end of a planned route: every pass has a start and a tie-off. */
export interface ThreadEnd {
  readonly pass: number;
  readonly end: 'start' | 'tie-off';
  readonly vertex: number;
  readonly point: Point;
  readonly place: EndPlace;
  readonly reason: EndReason;
}

/** The block outline and its binding band (design units), to tell edge places from the planar graph alone. */
export interface BlockFrame {
  readonly width: number;
  readonly height: number;
  readonly band: number;
}

/**
 * Place of every vertex: `edge` when it lies within the binding band of the block outline (or on an outline edge),
 * else `seam` when a seam line passes through it, else `open`. Without a frame only outline edges mark `edge`.
 */
export function findEndPlaces(graph: PlanarGraph, frame: BlockFrame | null): EndPlace[] {
  const places: EndPlace[] = graph.vertices.map(([x, y]) =>
    frame && Math.min(x, y, frame.width - x, frame.height - y) <= frame.band ? 'edge' : 'open',
  );
  for (const e of graph.edges) {
    for (const v of [e.u, e.v]) {
      if (e.kind === 'edge') places[v] = 'edge';
      else if (e.kind === 'seam' && places[v] === 'open') places[v] = 'seam';
    }
  }
  return places;
}

/** How much the planner's objective charges for a free thread end, in integer travel-cost units. */
export interface EndCosts {
  /** Charged for every free end (so a stop that saves no travel is never made): one cost unit. */
  readonly tie: number;
  /** Charged on top for an end in the open: two more units plus the allowance (extra travel a hidden end may cost). */
  readonly open: number;
  /** The allowance in design units (weighted like travel). */
  readonly allowance: number;
  /**
   * The tie as the exact search's solver sees it, in design units: 1e-7 of the block's size. One cost unit (about
   * 1e-14 of the design's length) is below the solver's tolerances; 1e-7 of the size is far above them and far below
   * any travel difference a quilter could measure.
   */
  readonly solverTie: number;
}

export function makeEndCosts(graph: PlanarGraph, quantum: number, allowance: number): EndCosts {
  let minX = Infinity;
  let minY = Infinity;
  let maxX = -Infinity;
  let maxY = -Infinity;
  for (const [x, y] of graph.vertices) {
    minX = Math.min(minX, x);
    minY = Math.min(minY, y);
    maxX = Math.max(maxX, x);
    maxY = Math.max(maxY, y);
  }
  const size = Math.max(maxX - minX, maxY - minY, 0);
  return { tie: 1, open: 2 + Math.round(allowance / quantum), allowance, solverTie: Math.max(1e-7 * size, 1e3 * quantum) };
}

/** Integer cost of a free thread end at v. */
export function endCostAt(costs: EndCosts, places: readonly EndPlace[], v: number): number {
  return costs.tie + (places[v] === 'open' ? costs.open : 0);
}

/** The same end cost in the solver's design units (see EndCosts.solverTie). */
export function solverEndCostAt(costs: EndCosts, places: readonly EndPlace[], v: number): number {
  return places[v] === 'open' ? 3 * costs.solverTie + costs.allowance : costs.solverTie;
}
