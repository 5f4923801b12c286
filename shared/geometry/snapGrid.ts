/**
 * Vertex snapping with a hash grid: `snap(x, y)` returns the id of the nearest vertex already stored
 * within `tolerance` (Euclidean), or stores (x, y) as a new vertex. Cells are `tolerance` wide, so the
 * 3×3 neighbouring cells hold every candidate. Snapping is greedy and never moves a stored vertex:
 * points inserted first keep their exact position (callers insert line ends before computed crossings).
 * Two stored vertices are always more than `tolerance` apart.
 */
export class SnapGrid {
  readonly #tolerance: number;
  readonly #tol2: number;
  readonly #heads = new Map<number, number>();
  readonly #next: number[] = [];
  readonly xs: number[] = [];
  readonly ys: number[] = [];

  constructor(tolerance: number) {
    if (!(tolerance > 0) || !Number.isFinite(tolerance)) throw new Error('geometry/snapGrid: tolerance must be a positive number');
    this.#tolerance = tolerance;
    this.#tol2 = tolerance * tolerance;
  }

  get size(): number {
    return this.xs.length;
  }

  /** Id of the vertex at (x, y) within tolerance; a new id when none is that close. */
  snap(x: number, y: number): number {
    const cx = Math.floor(x / this.#tolerance);
    const cy = Math.floor(y / this.#tolerance);
    let best = -1;
    let bestD = this.#tol2;
    for (let i = -1; i <= 1; i++) {
      for (let j = -1; j <= 1; j++) {
        let id = this.#heads.get(cellKey(cx + i, cy + j));
        while (id !== undefined && id >= 0) {
          const dx = this.xs[id]! - x;
          const dy = this.ys[id]! - y;
          const d = dx * dx + dy * dy;
          if (d < bestD || (d === bestD && (best < 0 || id < best))) {
            best = id;
            bestD = d;
          }
          id = this.#next[id];
        }
      }
    }
    if (best >= 0) return best;
    const id = this.xs.length;
    this.xs.push(x);
    this.ys.push(y);
    const key = cellKey(cx, cy);
    this.#next.push(this.#heads.get(key) ?? -1);
    this.#heads.set(key, id);
    return id;
  }
}

/** Cell coordinates packed into one safe integer; cells within ±2^24 of the origin per axis (ample for DESIGN_LIMITS). */
function cellKey(cx: number, cy: number): number {
  return (cx + 16_777_216) * 33_554_432 + (cy + 16_777_216);
}
