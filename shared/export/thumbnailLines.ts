import type { Point, Polyline } from '../geometry/point.ts';
import { polylineLength } from '../geometry/polyline.ts';
import { simplifyPolyline } from '../editor/simplify.ts';

/**
 * Lines for a list thumbnail, within a fixed point budget whatever the design holds (a design at the cap has
 * 200,000 points; a thumbnail is 96 px wide). Steps:
 * 1. Ramer–Douglas–Peucker at half a pixel: invisible at thumbnail size.
 * 2. Over budget: coarser tolerances, up to 2 px.
 * 3. Still over budget (thousands of separate lines): keep the longest lines whole until the budget is spent,
 *    and shade the thumbnail's cells (4 px squares) that the other lines cross, so dense areas still read as
 *    dense instead of vanishing.
 * Line ends are always kept; every kept line still has ≥ 2 points.
 */
export interface ThumbnailLines {
  readonly lines: readonly Polyline[];
  /** Cells covered by lines left out, as [column, row] on a grid of `cellSize` design units. */
  readonly shadedCells: readonly (readonly [number, number])[];
  readonly cellSize: number;
}

/** Most points a thumbnail's quilting lines may carry (seams are few and get their own simplification). */
export const THUMBNAIL_POINT_BUDGET = 400;
const CELL_PIXELS = 4;

export function thumbnailLines(lines: readonly Polyline[], side: number, pixels: number, budget = THUMBNAIL_POINT_BUDGET): ThumbnailLines {
  const pixel = side / pixels;
  const cellSize = pixel * CELL_PIXELS;
  let simplified = lines.map((l) => simplifyPolyline(l, pixel / 2));
  for (let tolerance = pixel; countPoints(simplified) > budget && tolerance <= 2 * pixel; tolerance *= 2) {
    simplified = simplified.map((l) => simplifyPolyline(l, tolerance));
  }
  if (countPoints(simplified) <= budget) return { lines: simplified, shadedCells: [], cellSize };

  const byLength = simplified.map((l, i) => ({ i, length: polylineLength(l) })).sort((a, b) => b.length - a.length || a.i - b.i);
  const kept = new Set<number>();
  let spent = 0;
  for (const { i } of byLength) {
    const n = simplified[i]!.length;
    if (spent + n > budget) continue;
    kept.add(i);
    spent += n;
  }
  const cells = new Set<string>();
  const shadedCells: [number, number][] = [];
  const mark = (x: number, y: number) => {
    const c = Math.floor(x / cellSize);
    const r = Math.floor(y / cellSize);
    const id = `${c},${r}`;
    if (!cells.has(id)) {
      cells.add(id);
      shadedCells.push([c, r]);
    }
  };
  simplified.forEach((line, i) => {
    if (kept.has(i)) return;
    for (let k = 1; k < line.length; k++) markSegment(line[k - 1]!, line[k]!, cellSize / 2, mark);
  });
  shadedCells.sort((a, b) => a[1] - b[1] || a[0] - b[0]);
  return { lines: simplified.filter((_, i) => kept.has(i)), shadedCells, cellSize };
}

function countPoints(lines: readonly Polyline[]): number {
  let n = 0;
  for (const l of lines) n += l.length;
  return n;
}

/** Calls `mark` at both ends and at most every `step` along the segment, so no cell it crosses is missed by much. */
function markSegment(a: Point, b: Point, step: number, mark: (x: number, y: number) => void): void {
  const n = Math.max(1, Math.ceil(Math.hypot(b[0] - a[0], b[1] - a[1]) / step));
  for (let k = 0; k <= n; k++) mark(a[0] + ((b[0] - a[0]) * k) / n, a[1] + ((b[1] - a[1]) * k) / n);
}
