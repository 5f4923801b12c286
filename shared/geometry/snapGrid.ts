/**
 * Vertex snapping with a hash grid: `snap(x, y)` returns the id of the nearest vertex already stored
 * within `tolerance` (Euclidean), or stores (x, y) as a new vertex. Cells are `tolerance` wide, so the
 * 3×3 neighbouring cells hold every candidate. Snapping is greedy and never moves a stored vertex:
 * points inserted first keep their exact position (callers insert line ends before computed crossings).
 * Two stored vertices are always more than `tolerance` apart.
 * Cells hash into an Int32Array bucket table with chaining (plain Map keys above 2³¹ are slow doubles);
 * a bucket may mix cells, which the distance test sorts out.
 */
export class SnapGrid {
  readonly #tolerance: number;
  readonly #tol2: number;
  #heads: Int32Array;
  #next: Int32Array;
  #mask: number;
  readonly xs: number[] = [];
  readonly ys: number[] = [];

  constructor(tolerance: number) {
    if (!(tolerance > 0) || !Number.isFinite(tolerance)) throw new Error('geometry/snapGrid: tolerance must be a positive number');
    this.#tolerance = tolerance;
    this.#tol2 = tolerance * tolerance;
    this.#heads = new Int32Array(1024).fill(-1);
    this.#next = new Int32Array(1024);
    this.#mask = 1023;
  }

  get size(): number {
    return this.xs.length;
  }

  /** Id of the vertex at (x, y) within tolerance; a new id when none is that close. */
  snap(x: number, y: number): number {
    const cx = Math.floor(x / this.#tolerance);
    const cy = Math.floor(y / this.#tolerance);
    const { xs, ys } = this;
    let best = -1;
    let bestD = this.#tol2;
    for (let i = -1; i <= 1; i++) {
      for (let j = -1; j <= 1; j++) {
        let id = this.#heads[cellHash(cx + i, cy + j) & this.#mask]!;
        while (id >= 0) {
          const dx = xs[id]! - x;
          const dy = ys[id]! - y;
          const d = dx * dx + dy * dy;
          if (d < bestD || (d === bestD && (best < 0 || id < best))) {
            best = id;
            bestD = d;
          }
          id = this.#next[id]!;
        }
      }
    }
    if (best >= 0) return best;
    const id = xs.length;
    xs.push(x);
    ys.push(y);
    if (id >= this.#next.length) this.#grow();
    this.#link(id, cx, cy);
    return id;
  }

  #link(id: number, cx: number, cy: number): void {
    const bucket = cellHash(cx, cy) & this.#mask;
    this.#next[id] = this.#heads[bucket]!;
    this.#heads[bucket] = id;
  }

  /** Doubles the tables and re-links every vertex (amortised O(1) per insert). */
  #grow(): void {
    const size = this.#next.length * 2;
    this.#heads = new Int32Array(size).fill(-1);
    this.#next = new Int32Array(size);
    this.#mask = size - 1;
    for (let id = 0; id < this.xs.length - 1; id++) {
      this.#link(id, Math.floor(this.xs[id]! / this.#tolerance), Math.floor(this.ys[id]! / this.#tolerance));
    }
  }
}

/** Spatial hash of a cell (the large primes of Teschner et al. 2003, "Optimized spatial hashing"; from memory). */
function cellHash(cx: number, cy: number): number {
  return (Math.imul(cx | 0, 73856093) ^ Math.imul(cy | 0, 19349663)) >>> 0;
}
