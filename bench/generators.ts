/**
 * Seeded design generators for benchmarks and tests. Same seed → same design on every run, so
 * before/after timings compare like with like (the reason flatbush's bench uses mulberry32).
 * All designs are 12 in blocks unless a size is given; coordinates in inches.
 */
import type { Design } from '@shared/design/design.schema.ts';
import type { Point, Polyline } from '@shared/geometry/point.ts';
import { seededRandom } from '@shared/seededRandom.ts';

/** mulberry32 (see shared/seededRandom.ts), under the name the benches and reference tests use. */
export const mulberry32 = seededRandom;

function block(lines: Polyline[], seams: Polyline[], edgeTravel: boolean, size = 12): Design {
  return { version: 1, units: 'in', width: size, height: size, seams, lines, edgeTravel };
}

/**
 * Crosshatch: N = size/spacing vertical and horizontal lines at spacing/2 + n·spacing, edge to edge.
 * `border: 'stitched'` adds the block outline as a quilting line and turns edge travel off (the E9
 * family of docs/engine.md §7.2: 4N odd points, optimal retrace 24 on a 12 in block);
 * `border: 'travel'` leaves the outline to edge travel.
 */
export function crosshatchDesign(spacing: number, border: 'stitched' | 'travel', size = 12): Design {
  const n = Math.round(size / spacing);
  const lines: Polyline[] = border === 'stitched' ? [[[0, 0], [size, 0], [size, size], [0, size], [0, 0]]] : [];
  for (let i = 0; i < n; i++) {
    const c = spacing / 2 + i * spacing;
    lines.push([[c, 0], [c, size]], [[0, c], [size, c]]);
  }
  return block(lines, [], border === 'travel', size);
}

/**
 * Dense back-and-forth fill: the block is cut into `cells`×`cells` squares; each square gets a zigzag
 * (serpentine) line with `rows` turns and a little seeded jitter, and the squares' borders are seams.
 * Gives many pieces joined only by ditch travel, and many odd points where fills end on seams.
 */
export function backAndForthDesign(seed: number, cells = 4, rows = 20): Design {
  const rnd = mulberry32(seed);
  const size = 12;
  const step = size / cells;
  const lines: Polyline[] = [];
  const seams: Polyline[] = [];
  for (let i = 1; i < cells; i++) seams.push([[i * step, 0], [i * step, size]], [[0, i * step], [size, i * step]]);
  for (let cx = 0; cx < cells; cx++) {
    for (let cy = 0; cy < cells; cy++) {
      const x0 = cx * step;
      const y0 = cy * step;
      const pts: Point[] = [];
      for (let r = 0; r <= rows; r++) {
        const y = y0 + (step * (r + 0.5)) / (rows + 1) + (rnd() - 0.5) * (step / (rows + 1)) * 0.3;
        const left: Point = [x0 + step * 0.02 * rnd(), y];
        const right: Point = [x0 + step - step * 0.02 * rnd(), y];
        pts.push(...(r % 2 === 0 ? [left, right] : [right, left]));
      }
      lines.push(pts);
    }
  }
  return block(lines, seams, true);
}

/**
 * Random pieced block: the square is split recursively into rectangles (the seams), and each patch gets
 * one quilting motif chosen at random: a diagonal, both diagonals, or stitch in the ditch around it.
 */
export function piecedBlockDesign(seed: number, patches = 12): Design {
  const rnd = mulberry32(seed);
  type Rect = readonly [number, number, number, number];
  let rects: Rect[] = [[0, 0, 12, 12]];
  while (rects.length < patches) {
    rects.sort((a, b) => (b[2] - b[0]) * (b[3] - b[1]) - (a[2] - a[0]) * (a[3] - a[1]));
    const [x0, y0, x1, y1] = rects.shift()!;
    const cut = 0.25 + 0.5 * rnd();
    const snap = (v: number): number => Math.round(v * 8) / 8; // quilters cut to 1/8 in
    if (x1 - x0 >= y1 - y0) {
      const x = snap(x0 + (x1 - x0) * cut);
      rects.push([x0, y0, x, y1], [x, y0, x1, y1]);
    } else {
      const y = snap(y0 + (y1 - y0) * cut);
      rects.push([x0, y0, x1, y], [x0, y, x1, y1]);
    }
  }
  rects = rects.filter(([x0, y0, x1, y1]) => x1 > x0 && y1 > y0);
  const seams: Polyline[] = [];
  const lines: Polyline[] = [];
  for (const [x0, y0, x1, y1] of rects) {
    seams.push([[x0, y0], [x1, y0], [x1, y1], [x0, y1], [x0, y0]]);
    const pick = rnd();
    if (pick < 0.4) lines.push([[x0, y0], [x1, y1]]);
    else if (pick < 0.8) lines.push([[x0, y0], [x1, y1]], [[x1, y0], [x0, y1]]);
    else lines.push([[x0, y0], [x1, y0], [x1, y1], [x0, y1], [x0, y0]]);
  }
  return block(lines, seams, true);
}

/**
 * One random-walk quilting line of `segments` steps (0.05–0.3 in, turning at most ±60° per step),
 * reflected off the block border: a stress test with thousands of self-crossings.
 */
export function randomWalkDesign(seed: number, segments = 20_000): Design {
  const rnd = mulberry32(seed);
  const size = 12;
  let x = 6;
  let y = 6;
  let heading = rnd() * 2 * Math.PI;
  const pts: Point[] = [[x, y]];
  for (let i = 0; i < segments; i++) {
    heading += (rnd() - 0.5) * (2 * Math.PI / 3);
    const len = 0.05 + 0.25 * rnd();
    x += Math.cos(heading) * len;
    y += Math.sin(heading) * len;
    if (x < 0 || x > size) {
      x = x < 0 ? -x : 2 * size - x;
      heading = Math.PI - heading;
    }
    if (y < 0 || y > size) {
      y = y < 0 ? -y : 2 * size - y;
      heading = -heading;
    }
    pts.push([x, y]);
  }
  return block([pts], [], true);
}
