import type { Point, Polyline } from '../geometry/point.ts';

/**
 * Quilting lines stay inside the block: a point counts as inside within `BLOCK_EDGE_TOLERANCE` × the longer side of
 * the edges (motif fills reach the outline within about 1e-8 of the patch size, see shared/motifs/motifs.ts), so
 * rounding never makes a line on the edge "outside". The server refuses new quilting lines outside the block
 * (designInputSchema), the workbench clips what is drawn (shared/editor/blockGuard.ts) and the planner clips old
 * drawings before it counts anything (planDesign), all with these functions.
 */
export const BLOCK_EDGE_TOLERANCE = 1e-6;

export interface BlockSize {
  readonly width: number;
  readonly height: number;
}

export function isInsideBlock([x, y]: Point, block: BlockSize): boolean {
  const eps = BLOCK_EDGE_TOLERANCE * Math.max(block.width, block.height);
  return x >= -eps && y >= -eps && x <= block.width + eps && y <= block.height + eps;
}

export function isLineInsideBlock(line: Polyline, block: BlockSize): boolean {
  return line.every((p) => isInsideBlock(p, block));
}

/**
 * The parts of a polyline inside the block rectangle [0, width] × [0, height], in order. Each segment is clipped
 * by Liang–Barsky (parametric: the entering t is the largest of the lower crossings, the leaving t the smallest of
 * the upper ones); consecutive clipped segments that meet stay one polyline, so a line that leaves and comes back
 * gives two pieces. Pieces shorter than two distinct points are dropped.
 */
export function clipPolylineToBlock(line: Polyline, block: BlockSize): Point[][] {
  if (isLineInsideBlock(line, block)) return [[...line]];
  const pieces: Point[][] = [];
  let current: Point[] | null = null;
  for (let i = 0; i + 1 < line.length; i++) {
    const clipped = clipSegment(line[i]!, line[i + 1]!, block);
    if (!clipped) {
      current = null;
      continue;
    }
    const [p, q, entered, left] = clipped;
    if (current && !entered) current.push(q);
    else {
      current = [p, q];
      pieces.push(current);
    }
    if (left) current = null;
  }
  return pieces.filter((piece) => piece.some((p) => p[0] !== piece[0]![0] || p[1] !== piece[0]![1]));
}

/** [start, end, whether the start was moved onto the edge, whether the end was] or null when nothing is inside. */
function clipSegment(a: Point, b: Point, block: BlockSize): [Point, Point, boolean, boolean] | null {
  const dx = b[0] - a[0];
  const dy = b[1] - a[1];
  let t0 = 0;
  let t1 = 1;
  const edges: [number, number][] = [[-dx, a[0]], [dx, block.width - a[0]], [-dy, a[1]], [dy, block.height - a[1]]];
  for (const [p, q] of edges) {
    if (p === 0) {
      if (q < 0) return null;
      continue;
    }
    const t = q / p;
    if (p < 0) t0 = Math.max(t0, t);
    else t1 = Math.min(t1, t);
    if (t0 > t1) return null;
  }
  const at = (t: number): Point => [a[0] + t * dx, a[1] + t * dy];
  return [t0 > 0 ? at(t0) : a, t1 < 1 ? at(t1) : b, t0 > 0, t1 < 1];
}

/** The design's quilting lines clipped to the block (the same object when every line is inside already). */
export function clipLinesToBlock<D extends BlockSize & { readonly lines: readonly Polyline[] }>(design: D): D {
  if (design.lines.every((l) => isLineInsideBlock(l, design))) return design;
  return { ...design, lines: design.lines.flatMap((l) => clipPolylineToBlock(l, design)) };
}
