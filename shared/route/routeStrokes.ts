import type { StrokeKind, StrokePath } from '../contract/strokes.ts';
import type { Point } from '../geometry/point.ts';
import type { PlanarGraph } from '../graph/planarGraph.types.ts';
import { assertNever } from '../assertNever.ts';
import type { EulerWalk } from './eulerWalk.ts';

/** A run of one kind within one pass (the API's StrokePath) and the planar-graph edge ids it runs over, in order. */
export interface Stroke extends StrokePath {
  readonly edges: readonly number[];
}

/** Travel and stitch lengths of a route, in design units. */
export interface RouteLengths {
  stitchLength: number;
  retraceLength: number;
  ditchLength: number;
  edgeLength: number;
}

/**
 * Turns one pass's walk into strokes. A quilting edge is `stitch` the first time the walk covers it and `retrace`
 * after that (so travel copies never come before the stitching they retrace); seams are `ditch`, outline `edge`.
 * `stitched` carries coverage across passes. Adds the lengths to `totals`.
 */
export function buildStrokes(
  graph: PlanarGraph,
  walk: EulerWalk,
  pass: number,
  stitched: Uint8Array,
  totals: RouteLengths,
): Stroke[] {
  const strokes: Stroke[] = [];
  let kind: StrokeKind | null = null;
  let points: Point[] = [];
  let length = 0;
  let edges: number[] = [];
  const flush = (): void => {
    if (kind !== null) strokes.push({ pass, kind, points, length, edges });
  };
  for (let w = 0; w < walk.edges.length; w++) {
    const edge = walk.edges[w]!;
    const forward = walk.forward[w] === 1;
    const e = graph.edges[edge]!;
    const k = strokeKindOf(e.kind, stitched, edge);
    addLength(totals, k, e.length);
    const pts = e.points;
    const last = pts.length - 1;
    if (k !== kind) {
      flush();
      kind = k;
      points = [pts[forward ? 0 : last]!];
      length = 0;
      edges = [];
    }
    edges.push(edge);
    for (let i = 1; i <= last; i++) points.push(pts[forward ? i : last - i]!);
    length += e.length;
  }
  flush();
  return strokes;
}

/**
 * The kind of a stroke over planar edge `edge`: a quilting edge is `stitch` the first time (and is marked in
 * `stitched`) and `retrace` after; seams are `ditch`, the outline `edge`. Planned and own routes both use it.
 */
export function strokeKindOf(kind: PlanarGraph['edges'][number]['kind'], stitched: Uint8Array, edge: number): StrokeKind {
  switch (kind) {
    case 'quilting':
      if (stitched[edge]) return 'retrace';
      stitched[edge] = 1;
      return 'stitch';
    case 'seam':
      return 'ditch';
    case 'edge':
      return 'edge';
    default:
      return assertNever(kind);
  }
}

export function addLength(totals: RouteLengths, kind: StrokeKind, length: number): void {
  switch (kind) {
    case 'stitch':
      totals.stitchLength += length;
      return;
    case 'retrace':
      totals.retraceLength += length;
      return;
    case 'ditch':
      totals.ditchLength += length;
      return;
    case 'edge':
      totals.edgeLength += length;
      return;
    default:
      assertNever(kind);
  }
}
