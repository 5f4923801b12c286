import Flatbush from 'flatbush';
import type { Polyline } from '../geometry/point.ts';
import { pointSegmentDistanceSquared } from '../geometry/distance.ts';

/**
 * f(p) = distance from p to the nearest line or to the block border, with the border distance signed
 * (negative outside the block). f is 1-Lipschitz (a minimum of 1-Lipschitz functions: point-to-segment
 * distances and the signed distance to a convex rectangle), which is what the branch-and-bound needs.
 * Long segments are cut into chunks of at most `chunk` for the flatbush index, so a query box only
 * meets nearby pieces.
 */
export class DistanceField {
  readonly #width: number;
  readonly #height: number;
  readonly #coords: Float64Array;
  readonly #index: Flatbush | null;

  constructor(width: number, height: number, lines: readonly Polyline[], chunk: number) {
    this.#width = width;
    this.#height = height;
    const coords: number[] = [];
    for (const line of lines) {
      for (let k = 1; k < line.length; k++) {
        const [ax, ay] = line[k - 1]!;
        const [bx, by] = line[k]!;
        const n = Math.max(1, Math.ceil(Math.hypot(bx - ax, by - ay) / chunk));
        for (let i = 0; i < n; i++) {
          coords.push(ax + ((bx - ax) * i) / n, ay + ((by - ay) * i) / n, ax + ((bx - ax) * (i + 1)) / n, ay + ((by - ay) * (i + 1)) / n);
        }
      }
    }
    this.#coords = Float64Array.from(coords);
    const count = coords.length / 4;
    if (count === 0) {
      this.#index = null;
      return;
    }
    const index = new Flatbush(count);
    for (let s = 0; s < count; s++) {
      const [x0, y0, x1, y1] = [coords[4 * s]!, coords[4 * s + 1]!, coords[4 * s + 2]!, coords[4 * s + 3]!];
      index.add(Math.min(x0, x1), Math.min(y0, y1), Math.max(x0, x1), Math.max(y0, y1));
    }
    index.finish();
    this.#index = index;
  }

  /**
   * f at (x, y), in design units. `bound` is any known upper bound of f there (the branch-and-bound
   * passes f(parent) + distance to the parent's centre, valid because f is 1-Lipschitz); it only limits
   * the search box, so a loose bound costs time, never accuracy.
   */
  at(x: number, y: number, bound = Infinity): number {
    const w = this.#width;
    const h = this.#height;
    if (x < 0 || y < 0 || x > w || y > h) {
      const dx = Math.max(-x, 0, x - w);
      const dy = Math.max(-y, 0, y - h);
      return -Math.hypot(dx, dy);
    }
    const border = Math.min(x, y, w - x, h - y);
    const index = this.#index;
    if (index === null || border === 0) return border;
    const c = this.#coords;
    const reach = Math.min(border, bound) * (1 + 1e-9);
    let best2 = border * border;
    index.search(x - reach, y - reach, x + reach, y + reach, (s) => {
      const d = pointSegmentDistanceSquared(x, y, c[4 * s]!, c[4 * s + 1]!, c[4 * s + 2]!, c[4 * s + 3]!);
      if (d < best2) best2 = d;
      return false;
    });
    return Math.sqrt(best2);
  }
}
