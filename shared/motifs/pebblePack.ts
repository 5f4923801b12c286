import type { Point } from '../geometry/point.ts';
import type { Polygon } from '../layouts/patch.ts';
import { seededRandom } from '../seededRandom.ts';
import { circleCircle, lineCircle, type Circle } from './circles.ts';
import { distanceToOutline, isInsideOrOn, orientedPositive, toleranceFor } from './polygon.ts';

/** One pebble before flattening. */
export interface Pebble {
  readonly center: Point;
  readonly radius: number;
}

export interface ChainPackOptions {
  readonly minRadius: number;
  readonly maxRadius: number;
  /** How far neighbouring pebbles overlap: centre distance = r₁ + r₂ − overlap (0: tangent). */
  readonly overlap: number;
  readonly seed: number;
}

/**
 * Packs a chain of touching pebbles into the patch, growing from one corner (an advancing front, in the
 * manner of front-chain disc packings: each new disc is placed tangent to two discs or sides already there).
 *  1. The first pebble touches two sides (a corner, or two facing sides of a narrow patch).
 *  2. Pebbles wait in a first-in first-out queue. For the pebble A at its head, a radius r is drawn in
 *     [minRadius, maxRadius]; candidate centres are those at r + r_A − overlap from A and, at the same time,
 *     at r + r_B − overlap from a pebble B near A, or at r from a side, or at r from a reflex corner. The
 *     candidate nearest the first pebble that overlaps no pebble by more than `overlap` and stays inside
 *     (distance to the outline ≥ r) is placed and queued. When none fits, r = minRadius is tried; when that
 *     fails too, A leaves the queue.
 * Guarantees (by construction, checked in pebbles.test.ts): every pebble touches the pebble it was grown
 * from (or, the first, two sides), so pebbles and outline form one connected cluster; no two overlap by more
 * than `overlap`; every pebble lies inside the patch. Returns [] when not even a minRadius pebble fits.
 */
export function packPebbleChain(polygon: Polygon, options: ChainPackOptions): Pebble[] {
  const outline = orientedPositive(polygon);
  const eps = toleranceFor(outline) * 1e3;
  const random = seededRandom(options.seed);
  const drawRadius = (): number => options.minRadius + random() * (options.maxRadius - options.minRadius);
  const grid = new PebbleGrid(2 * options.maxRadius);
  const sides = sidesOf(outline);
  const reflex = reflexCorners(outline);
  const fits = (c: Point, r: number): boolean =>
    !grid.some(c, r + options.maxRadius, (p) => Math.hypot(c[0] - p.center[0], c[1] - p.center[1]) < r + p.radius - options.overlap - eps) &&
    distanceToOutline(c, outline) >= r - eps &&
    isInsideOrOn(c, outline, 0);

  const first = placeFirst(outline, sides, drawRadius(), options.minRadius, fits);
  if (!first) return [];
  const pebbles: Pebble[] = [first];
  grid.add(first);
  const seedPoint = first.center;
  const queue: Pebble[] = [first];
  for (let head = 0; head < queue.length; ) {
    const a = queue[head]!;
    let placed: Pebble | null = null;
    for (const r of [drawRadius(), options.minRadius]) {
      placed = bestAround(a, r);
      if (placed) break;
    }
    if (!placed) {
      head++;
      continue;
    }
    pebbles.push(placed);
    grid.add(placed);
    queue.push(placed);
  }
  return pebbles;

  function bestAround(a: Pebble, r: number): Pebble | null {
    const around: Circle = { center: a.center, radius: a.radius + r - options.overlap };
    const candidates: Point[] = [];
    for (const b of grid.near(a.center, a.radius + 2 * r + options.maxRadius)) {
      if (b === a) continue;
      candidates.push(...circleCircle(around, { center: b.center, radius: b.radius + r - options.overlap }));
    }
    for (const side of sides) {
      // Centres at r from the side lie on its line moved r inward (positive orientation: inward is the left normal).
      const at: Point = [side.a[0] + side.n[0] * r, side.a[1] + side.n[1] * r];
      for (const c of lineCircle(at, side.d, around)) {
        const t = (c[0] - side.a[0]) * side.d[0] + (c[1] - side.a[1]) * side.d[1];
        if (t >= -eps && t <= side.length + eps) candidates.push(c);
      }
    }
    for (const v of reflex) candidates.push(...circleCircle(around, { center: v, radius: r }));
    // Nearest the first pebble first; the first that fits wins (fits is the costly test).
    const far = candidates.map((c) => Math.hypot(c[0] - seedPoint[0], c[1] - seedPoint[1]));
    const order = candidates.map((_, i) => i).sort((x, y) => far[x]! - far[y]!);
    const found = order.find((i) => fits(candidates[i]!, r));
    const best = found === undefined ? null : candidates[found]!;
    return best ? { center: best, radius: r } : null;
  }
}

/** A side of the outline with its unit direction d, inward unit normal n and length. */
export interface Side {
  readonly a: Point;
  readonly b: Point;
  readonly d: Point;
  readonly n: Point;
  readonly length: number;
}

/** Sides of a positively oriented polygon (interior to the left of each side), zero-length sides skipped. */
export function sidesOf(outline: Polygon): Side[] {
  const out: Side[] = [];
  outline.forEach((a, i) => {
    const b = outline[(i + 1) % outline.length]!;
    const length = Math.hypot(b[0] - a[0], b[1] - a[1]);
    if (length === 0) return;
    const d: Point = [(b[0] - a[0]) / length, (b[1] - a[1]) / length];
    out.push({ a, b, d, n: [-d[1], d[0]], length });
  });
  return out;
}

/** Vertices where the interior angle exceeds 180° (a pebble can rest against such a corner point). */
function reflexCorners(outline: Polygon): Point[] {
  return outline.filter((b, i) => {
    const a = outline[(i + outline.length - 1) % outline.length]!;
    const c = outline[(i + 1) % outline.length]!;
    return (b[0] - a[0]) * (c[1] - b[1]) - (b[1] - a[1]) * (c[0] - b[0]) < 0;
  });
}

/**
 * The first pebble: centre where the lines r inside two sides cross (a corner, or the middle of a narrow
 * patch between facing sides), for r = the drawn radius, then minRadius. Among those that fit, the one
 * nearest the outline's first vertex, so the chain grows from a corner.
 */
function placeFirst(outline: Polygon, sides: readonly Side[], r0: number, minRadius: number, fits: (c: Point, r: number) => boolean): Pebble | null {
  for (const r of [r0, minRadius]) {
    let best: Point | null = null;
    let bestD = Infinity;
    for (let i = 0; i < sides.length; i++) {
      for (let j = i + 1; j < sides.length; j++) {
        const c = crossOfInsetLines(sides[i]!, sides[j]!, r);
        if (!c) continue;
        const d = Math.hypot(c[0] - outline[0]![0], c[1] - outline[0]![1]);
        if (d < bestD && fits(c, r)) {
          best = c;
          bestD = d;
        }
      }
    }
    if (best) return { center: best, radius: r };
  }
  return null;
}

/** Where the two sides' lines, each moved r inward, cross; null when they are parallel. */
function crossOfInsetLines(s: Side, t: Side, r: number): Point | null {
  const det = s.d[0] * t.d[1] - s.d[1] * t.d[0];
  if (Math.abs(det) < 1e-12) return null;
  const p: Point = [s.a[0] + s.n[0] * r, s.a[1] + s.n[1] * r];
  const q: Point = [t.a[0] + t.n[0] * r, t.a[1] + t.n[1] * r];
  const k = ((q[0] - p[0]) * t.d[1] - (q[1] - p[1]) * t.d[0]) / det;
  return [p[0] + s.d[0] * k, p[1] + s.d[1] * k];
}

/** A uniform hash grid of pebbles for neighbour queries. */
export class PebbleGrid {
  readonly #cell: number;
  readonly #cells = new Map<number, Pebble[]>();
  constructor(cell: number) {
    this.#cell = cell;
  }
  // Cell (i, j) keyed as one number; |i|, |j| < 2^20 for any block the design schema allows.
  #key(i: number, j: number): number {
    return i * 2_097_152 + j;
  }
  add(p: Pebble): void {
    const key = this.#key(Math.floor(p.center[0] / this.#cell), Math.floor(p.center[1] / this.#cell));
    const list = this.#cells.get(key);
    if (list) list.push(p);
    else this.#cells.set(key, [p]);
  }
  /** Whether `test` holds for some pebble whose centre may lie within `reach` of c (stops at the first). */
  some(c: Point, reach: number, test: (p: Pebble) => boolean): boolean {
    const i0 = Math.floor((c[0] - reach) / this.#cell);
    const i1 = Math.floor((c[0] + reach) / this.#cell);
    const j0 = Math.floor((c[1] - reach) / this.#cell);
    const j1 = Math.floor((c[1] + reach) / this.#cell);
    for (let i = i0; i <= i1; i++) {
      for (let j = j0; j <= j1; j++) {
        const list = this.#cells.get(this.#key(i, j));
        if (list) for (const p of list) if (test(p)) return true;
      }
    }
    return false;
  }
  /** Pebbles whose centres may lie within `reach` of c (a superset). */
  near(c: Point, reach: number): Pebble[] {
    const out: Pebble[] = [];
    const i0 = Math.floor((c[0] - reach) / this.#cell);
    const i1 = Math.floor((c[0] + reach) / this.#cell);
    const j0 = Math.floor((c[1] - reach) / this.#cell);
    const j1 = Math.floor((c[1] + reach) / this.#cell);
    for (let i = i0; i <= i1; i++) {
      for (let j = j0; j <= j1; j++) {
        const list = this.#cells.get(this.#key(i, j));
        if (list) for (const p of list) out.push(p);
      }
    }
    return out;
  }
}
