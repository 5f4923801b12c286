/**
 * Seeded multi-piece designs built like real blocks, for the exact planner's reference tests and benchmark: the
 * quilting lines form several pieces that only travel (ditch, edge, retrace) can join. 12 in blocks, inches,
 * coordinates on a 1/16 in grid where a quilter would mark them.
 * - patch fills: a grid of patches, each filled with straight lines from seam to seam;
 * - arch rows: rows of arches whose feet stand on travelled ditch lines;
 * - square in a square: corner and side triangles filled with lines parallel to a seam, the centre with lines or
 *   a zigzag, all seams travelled.
 */
import type { Design } from '../design/design.schema.ts';
import type { Point, Polyline } from '../geometry/point.ts';
import { seededRandom } from '../seededRandom.ts';

const SIZE = 12;
const snap = (v: number): number => Math.round(v * 16) / 16;

function block(lines: Polyline[], seams: Polyline[], edgeTravel = true): Design {
  return { version: 1, units: 'in', width: SIZE, height: SIZE, seams, lines, edgeTravel };
}

/** `cells`×`cells` patches, each with 1…`maxLines` straight lines (horizontal or vertical) from seam to seam. */
export function patchFillDesign(seed: number, cells: number, maxLines: number): Design {
  const rnd = seededRandom(seed);
  const step = SIZE / cells;
  const seams: Polyline[] = [];
  for (let i = 1; i < cells; i++) seams.push([[i * step, 0], [i * step, SIZE]], [[0, i * step], [SIZE, i * step]]);
  const lines: Polyline[] = [];
  for (let cx = 0; cx < cells; cx++) {
    for (let cy = 0; cy < cells; cy++) {
      const count = 1 + Math.floor(rnd() * maxLines);
      const vertical = rnd() < 0.5;
      for (let j = 1; j <= count; j++) {
        const c = snap((j * step) / (count + 1));
        lines.push(vertical ? [[cx * step + c, cy * step], [cx * step + c, (cy + 1) * step]] : [[cx * step, cy * step + c], [(cx + 1) * step, cy * step + c]]);
      }
    }
  }
  return block(lines, seams);
}

/** `rows` horizontal ditch lines, each carrying up to `arches` arches; some neighbours share a foot (one piece). */
export function archRowsDesign(seed: number, rows: number, arches: number): Design {
  const rnd = seededRandom(seed);
  const seams: Polyline[] = [];
  const lines: Polyline[] = [];
  const spacing = SIZE / (rows + 1);
  const width = SIZE / arches;
  for (let r = 1; r <= rows; r++) {
    const y = snap(r * spacing);
    seams.push([[0, y], [SIZE, y]]);
    for (let i = 0; i < arches; i++) {
      if (rnd() < 0.15) continue;
      const shareLeft = i > 0 && rnd() < 0.3;
      const x0 = snap(i * width + (shareLeft ? 0 : 0.125));
      const x1 = snap((i + 1) * width - 0.125);
      lines.push(arch(x0, x1, y, Math.min(spacing * 0.8, (x1 - x0) * 0.6)));
    }
  }
  return block(lines, seams);
}

function arch(x0: number, x1: number, y: number, h: number): Point[] {
  const pts: Point[] = [];
  const steps = 12;
  for (let k = 0; k <= steps; k++) {
    const t = Math.PI * (1 - k / steps);
    pts.push([(x0 + x1) / 2 + ((x1 - x0) / 2) * Math.cos(t), y + h * Math.sin(t)]);
  }
  pts[0] = [x0, y];
  pts[steps] = [x1, y];
  return pts;
}

/**
 * Square in a square: outline, a diamond through the side midpoints and an inner square through the diamond's
 * midpoints are the seams. Corner triangles get lines parallel to the diamond, side triangles lines parallel to the
 * inner square, the centre either straight lines or one zigzag.
 */
export function squareInSquareDesign(seed: number, maxLines: number): Design {
  const rnd = seededRandom(seed);
  const h = SIZE / 2;
  const q = SIZE / 4;
  const seams: Polyline[] = [
    [[h, 0], [SIZE, h], [h, SIZE], [0, h], [h, 0]],
    [[q, q], [SIZE - q, q], [SIZE - q, SIZE - q], [q, SIZE - q], [q, q]],
  ];
  const lines: Polyline[] = [];
  const corners: [Point, Point, Point][] = [
    [[0, 0], [h, 0], [0, h]],
    [[SIZE, 0], [SIZE, h], [h, 0]],
    [[SIZE, SIZE], [h, SIZE], [SIZE, h]],
    [[0, SIZE], [0, h], [h, SIZE]],
  ];
  // Corner triangle (apex c, legs to a and b on the diamond): lines from leg to leg, parallel to a–b.
  for (const [c, a, b] of corners) {
    const count = 1 + Math.floor(rnd() * maxLines);
    for (let j = 1; j <= count; j++) {
      const t = j / (count + 1);
      lines.push([lerp(c, a, t), lerp(c, b, t)]);
    }
  }
  // Side triangles between the diamond and the inner square: apex on the outline midpoint, base on the inner square.
  const sides: [Point, Point, Point][] = [
    [[h, 0], [q, q], [SIZE - q, q]],
    [[SIZE, h], [SIZE - q, q], [SIZE - q, SIZE - q]],
    [[h, SIZE], [SIZE - q, SIZE - q], [q, SIZE - q]],
    [[0, h], [q, SIZE - q], [q, q]],
  ];
  for (const [c, a, b] of sides) {
    const count = 1 + Math.floor(rnd() * maxLines);
    for (let j = 1; j <= count; j++) {
      const t = j / (count + 1);
      lines.push([lerp(c, a, t), lerp(c, b, t)]);
    }
  }
  const count = 1 + Math.floor(rnd() * maxLines);
  if (rnd() < 0.5) {
    for (let j = 1; j <= count; j++) lines.push([[q, q + (j * h) / (count + 1)], [SIZE - q, q + (j * h) / (count + 1)]]);
  } else {
    const zig: Point[] = [];
    for (let j = 0; j <= 2 * count; j++) zig.push([j % 2 === 0 ? q : SIZE - q, q + (j * h) / (2 * count)]);
    lines.push(zig);
  }
  return block(lines.map((l) => l.map(([x, y]) => [snap(x), snap(y)] as Point)), seams);
}

function lerp(a: Point, b: Point, t: number): Point {
  return [a[0] + (b[0] - a[0]) * t, a[1] + (b[1] - a[1]) * t];
}

/** Route ends a quilter might set: free, corner to corner, back to the start corner, start only, end only. */
export const END_CHOICES: readonly { readonly name: string; readonly start?: Point; readonly end?: Point }[] = [
  { name: 'free ends' },
  { name: 'corner to corner', start: [0, 0], end: [SIZE, SIZE] },
  { name: 'closed at a corner', start: [0, 0], end: [0, 0] },
  { name: 'start fixed', start: [0, 0] },
  { name: 'end fixed', end: [SIZE, 0] },
];

/** The reference set: `count` designs cycling through the three kinds and the end choices. */
export function multiPieceDesigns(count: number): { readonly name: string; readonly design: Design }[] {
  const out: { name: string; design: Design }[] = [];
  for (let i = 0; i < count; i++) {
    const seed = 101 + i;
    const ends = END_CHOICES[i % END_CHOICES.length]!;
    const kind = i % 3;
    const base =
      kind === 0 ? patchFillDesign(seed, 2 + (i % 2), 3) : kind === 1 ? archRowsDesign(seed, 2 + (i % 3), 4 + (i % 4)) : squareInSquareDesign(seed, 3);
    const label = kind === 0 ? 'patch fills' : kind === 1 ? 'arch rows' : 'square in a square';
    out.push({ name: `${label} #${seed}, ${ends.name}`, design: { ...base, ...(ends.start ? { start: ends.start } : {}), ...(ends.end ? { end: ends.end } : {}) } });
  }
  return out;
}
