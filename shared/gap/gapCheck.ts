import { CM_PER_INCH, type Design } from '../design/design.schema.ts';
import type { Point } from '../geometry/point.ts';
import { checkDesign, type DesignProblem } from '../graph/designProblem.ts';
import { ok, type Result } from '../result.ts';
import { DistanceField } from './distanceField.ts';
import { MaxHeap } from './maxHeap.ts';

export interface GapOptions {
  /** Wanted certainty of the radius in design units; default 0.01 in (0.0254 cm). */
  readonly precision?: number;
  /** Most cells the search may evaluate before it stops with what it has proven; default 400,000. */
  readonly maxCells?: number;
}

/** The largest empty disc: no quilting line or seam crosses it and it stays inside the block. */
export interface Gap {
  /** Proven lower bound of the largest empty radius (design units): the disc at `center` is empty. */
  readonly radius: number;
  readonly center: Point;
  /** Certified: the true largest radius lies in [radius, radius + precision]. */
  readonly precision: number;
}

/**
 * Comparison of the widest gap with the batting's spacing limit (`design.thread.battingSpacing`).
 * Batting makers state the largest distance allowed between quilting lines; two lines that far apart
 * leave an empty disc of that diameter, so the widest gap is the diameter 2r. Status:
 * `over` when 2r > limit (certain), `within` when 2(r + precision) ≤ limit (certain), `at-limit`
 * when the limit falls inside the resolution, `no-limit` when the design states no spacing.
 */
export interface GapCheck extends Gap {
  readonly widestGap: number;
  readonly limit: number | null;
  readonly status: 'within' | 'over' | 'at-limit' | 'no-limit';
}

/**
 * The largest empty circle in the block (border, seams and quilting lines all bound it), by
 * branch-and-bound on f(p) = distance to the nearest line or border, in the manner of polylabel
 * (Agafonkin, Mapbox 2016): square cells, each with the upper bound f(centre) + h·√2 (h = half-size; f is
 * 1-Lipschitz); the cell with the best bound is split first, and the search stops when no cell can beat
 * the best centre by more than the precision. If `maxCells` runs out first, the returned `precision` is
 * the (larger) gap actually proven. Route strokes are ignored. A design with no lines is allowed here.
 */
export function findWidestGap(design: Design, options: GapOptions = {}): Result<Gap, DesignProblem> {
  const checked = checkDesign(design, false);
  if (!checked.ok && checked.error.kind !== 'empty-design') return checked;
  const unitsPerInch = design.units === 'in' ? 1 : CM_PER_INCH;
  const wanted = options.precision ?? 0.01 * unitsPerInch;
  const maxCells = options.maxCells ?? 400_000;
  const { width: w, height: h } = design;
  const field = new DistanceField(w, h, [...design.lines, ...design.seams], Math.max(w, h) / 64);

  const cx: number[] = [];
  const cy: number[] = [];
  const ch: number[] = [];
  const cf: number[] = [];
  const heap = new MaxHeap();
  let bestX = w / 2;
  let bestY = h / 2;
  let best = field.at(bestX, bestY);
  const addCell = (x: number, y: number, half: number, bound: number): void => {
    const f = field.at(x, y, bound);
    const id = cx.length;
    cx.push(x);
    cy.push(y);
    ch.push(half);
    cf.push(f);
    if (f > best) {
      best = f;
      bestX = x;
      bestY = y;
    }
    heap.push(id, f + half * Math.SQRT2);
  };
  const size = Math.min(w, h);
  for (let x = 0; x < w; x += size) for (let y = 0; y < h; y += size) addCell(x + size / 2, y + size / 2, size / 2, Infinity);

  while (heap.size > 0 && heap.peekKey() - best > wanted && cx.length < maxCells) {
    const id = heap.pop();
    const half = ch[id]! / 2;
    // Children's centres are half·√2 from the parent's, so f(child) ≤ f(parent) + half·√2 (1-Lipschitz).
    const bound = cf[id]! + half * Math.SQRT2;
    addCell(cx[id]! - half, cy[id]! - half, half, bound);
    addCell(cx[id]! + half, cy[id]! - half, half, bound);
    addCell(cx[id]! - half, cy[id]! + half, half, bound);
    addCell(cx[id]! + half, cy[id]! + half, half, bound);
  }
  // Every point of the block lies in a cell still queued, so the best queued bound certifies the answer.
  const precision = heap.size === 0 ? 0 : Math.max(0, heap.peekKey() - best);
  return ok({ radius: best, center: [bestX, bestY], precision });
}

/** `findWidestGap` plus the comparison with `design.thread.battingSpacing` (see `GapCheck`). */
export function checkGap(design: Design, options: GapOptions = {}): Result<GapCheck, DesignProblem> {
  const found = findWidestGap(design, options);
  if (!found.ok) return found;
  const gap = found.value;
  const widestGap = 2 * gap.radius;
  const limit = design.thread?.battingSpacing ?? null;
  const status = limit === null ? 'no-limit' : widestGap > limit ? 'over' : 2 * (gap.radius + gap.precision) <= limit ? 'within' : 'at-limit';
  return ok({ ...gap, widestGap, limit, status });
}
