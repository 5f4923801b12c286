import type { Point } from '../geometry/point.ts';

/**
 * What a graph edge stands for on the quilt:
 * - `quilting`: a quilting line that must be stitched exactly once (travel may retrace it);
 * - `seam`: a seam line, usable for travel in the ditch;
 * - `edge`: a piece of the block outline, usable for travel inside the binding band.
 */
export type LineKind = 'quilting' | 'seam' | 'edge';

/** One piece of a line between two vertices of the planar graph. */
export interface GraphEdge {
  readonly id: number;
  /** Vertex index at `points[0]`. */
  readonly u: number;
  /** Vertex index at the last point. */
  readonly v: number;
  readonly kind: LineKind;
  /** Planar length in design units (sum of the polyline's segment lengths). */
  readonly length: number;
  /** The edge's geometry from u to v (≥ 2 points; interior points are bends, never vertices). */
  readonly points: readonly Point[];
  /** Index into `design.lines` (quilting) or `design.seams` (seam); -1 for the block outline. */
  readonly source: number;
}

/** Lines of a design noded into a planar multigraph: vertices at every end, crossing, T-junction and bend-free join. */
export interface PlanarGraph {
  readonly vertices: readonly Point[];
  readonly edges: readonly GraphEdge[];
}
