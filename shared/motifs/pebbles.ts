import { z } from 'zod';
import type { Point, Polyline } from '../geometry/point.ts';
import { signedArea, type Polygon } from '../layouts/patch.ts';
import { seededRandom } from '../seededRandom.ts';
import { circleCircle, unionArea } from './circles.ts';
import { chordErrorSchema, positiveNumber, separateSchema, type MotifLines } from './motif.types.ts';
import { packPebbleChain, PebbleGrid, sidesOf, type Pebble } from './pebblePack.ts';
import { distanceToOutline, isInsideOrOn, orientedPositive, toleranceFor } from './polygon.ts';

export type { Pebble } from './pebblePack.ts';

export const pebblesParamsSchema = z
  .object({
    kind: z.literal('pebbles'),
    /** Smallest pebble radius, design units. */
    minRadius: positiveNumber,
    /** Largest pebble radius, design units (≥ minRadius). */
    maxRadius: positiveNumber,
    /** Separate pebbles only: least clear distance between two pebbles, and between a pebble and the outline. */
    gap: z.number().finite().min(0).default(0),
    /**
     * Joined pebbles only: how far neighbouring pebbles overlap, design units (0: they just touch). At most
     * half the smallest radius, so a pebble never hides its neighbour's centre.
     */
    overlap: z.number().finite().min(0).default(0),
    /** Seed of the placement order; the same seed gives the same pebbles. */
    seed: z.number().int().default(1),
    chordError: chordErrorSchema,
    separate: separateSchema,
  })
  .strict()
  .refine((p) => p.maxRadius >= p.minRadius, { message: 'maxRadius must be at least minRadius', path: ['maxRadius'] })
  .refine((p) => p.overlap <= p.minRadius / 2, { message: 'overlap must be at most half of minRadius', path: ['overlap'] });
export type PebblesParams = z.output<typeof pebblesParamsSchema>;

/** The pebbles of a placement: a touching chain (default) or, with `separate`, circles kept `gap` apart. */
export function placePebbles(polygon: Polygon, params: PebblesParams): Pebble[] {
  return params.separate ? packPebbles(polygon, params) : packPebbleChain(polygon, params);
}

/**
 * Pebbles as quilting lines: each circle flattened to a closed inscribed polygon (vertices on the circle,
 * chord error ≤ chordError), so each line stays inside its circle and hence inside the patch. Where a pebble
 * touches a neighbour or the outline the touching point is a vertex of both lines (tangent pebbles share one
 * point, overlapping pebbles their two crossings), so the planar graph joins them exactly there.
 */
export function generatePebbles(polygon: Polygon, params: PebblesParams): MotifLines {
  const pebbles = placePebbles(polygon, params);
  const contacts = findContacts(polygon, pebbles, params.separate ? -1 : params.overlap);
  const lines = pebbles.map((p, i) => flattenPebble(p, contacts[i]!, params.chordError));
  return { lines, coveredFraction: coveredFraction(polygon, pebbles) };
}

/** Share of the patch the pebbles cover: the exact area of their union (see `unionArea`) over the patch's. */
export function coveredFraction(polygon: Polygon, pebbles: readonly Pebble[]): number {
  if (pebbles.length === 0) return 0;
  const maxR = Math.max(...pebbles.map((p) => p.radius));
  const grid = new PebbleGrid(2 * maxR);
  const index = new Map(pebbles.map((p, i) => [p, i]));
  pebbles.forEach((p) => grid.add(p));
  const near = (i: number) => grid.near(pebbles[i]!.center, pebbles[i]!.radius + maxR).map((q) => index.get(q)!);
  return unionArea(pebbles, near) / Math.abs(signedArea(polygon));
}

/**
 * Touching points of each pebble: with neighbours whose centre distance is r₁ + r₂ − overlap (within a
 * rounding tolerance) and with sides or reflex corners at distance r. `overlap` < 0 finds none (separate pebbles).
 */
function findContacts(polygon: Polygon, pebbles: readonly Pebble[], overlap: number): Point[][] {
  const contacts: Point[][] = pebbles.map(() => []);
  if (overlap < 0) return contacts;
  const outline = orientedPositive(polygon);
  const tol = toleranceFor(outline) * 1e4;
  const index = new Map(pebbles.map((p, i) => [p, i]));
  forNearPairs(pebbles, (p, q) => {
    const d = Math.hypot(q.center[0] - p.center[0], q.center[1] - p.center[1]);
    if (Math.abs(d - (p.radius + q.radius - overlap)) > tol) return;
    const points: Point[] =
      overlap <= tol
        ? [[p.center[0] + ((q.center[0] - p.center[0]) * p.radius) / d, p.center[1] + ((q.center[1] - p.center[1]) * p.radius) / d]]
        : circleCircle(p, q);
    contacts[index.get(p)!]!.push(...points);
    contacts[index.get(q)!]!.push(...points);
  });
  const sides = sidesOf(outline);
  pebbles.forEach((p, i) => {
    for (const s of sides) {
      const t = (p.center[0] - s.a[0]) * s.d[0] + (p.center[1] - s.a[1]) * s.d[1];
      const dist = (p.center[0] - s.a[0]) * s.n[0] + (p.center[1] - s.a[1]) * s.n[1];
      if (t >= 0 && t <= s.length && Math.abs(dist - p.radius) <= tol) contacts[i]!.push([s.a[0] + s.d[0] * t, s.a[1] + s.d[1] * t]);
    }
    for (const v of outline) if (Math.abs(Math.hypot(v[0] - p.center[0], v[1] - p.center[1]) - p.radius) <= tol) contacts[i]!.push(v);
  });
  return contacts;
}

/** Calls `visit` once for every pair of pebbles close enough to touch. */
function forNearPairs(pebbles: readonly Pebble[], visit: (p: Pebble, q: Pebble) => void): void {
  if (pebbles.length < 2) return;
  const maxR = Math.max(...pebbles.map((p) => p.radius));
  const grid = new PebbleGrid(2 * maxR);
  pebbles.forEach((p) => {
    for (const q of grid.near(p.center, p.radius + maxR)) visit(q, p);
    grid.add(p);
  });
}

/**
 * One pebble as a closed polyline: the given touching points (design units, on the circle) plus enough
 * points on the circle between them that every chord's sagitta r(1 − cos(θ/2)) stays ≤ chordError.
 */
function flattenPebble(p: Pebble, touching: readonly Point[], chordError: number): Polyline {
  const { center: [cx, cy], radius: r } = p;
  const maxStep = chordError >= r ? Math.PI / 2 : 2 * Math.acos(1 - chordError / r);
  const angleOf = (q: Point): number => Math.atan2(q[1] - cy, q[0] - cx);
  // Touching points sorted round the circle; one that repeats another (a side's end is also a corner) is dropped.
  const sorted = [...touching].sort((a, b) => angleOf(a) - angleOf(b));
  const distinct = sorted.filter((m, i) => i === 0 || angleOf(m) - angleOf(sorted[i - 1]!) > 1e-12);
  if (distinct.length > 1 && angleOf(distinct[0]!) + 2 * Math.PI - angleOf(distinct[distinct.length - 1]!) <= 1e-12) distinct.pop();
  const marks = distinct.length > 0 ? distinct : [[cx + r, cy] as Point];
  const ring: Point[] = [];
  marks.forEach((m, i) => {
    const from = angleOf(m);
    const next = marks[(i + 1) % marks.length]!;
    let to = angleOf(next);
    if (to <= from) to += 2 * Math.PI;
    ring.push(m);
    const steps = Math.max(marks.length === 1 ? 3 : 1, Math.ceil((to - from) / maxStep));
    for (let k = 1; k < steps; k++) {
      const a = from + ((to - from) * k) / steps;
      ring.push([cx + r * Math.cos(a), cy + r * Math.sin(a)]);
    }
  });
  ring.push(ring[0]!);
  return ring.filter((q, i) => i === 0 || q[0] !== ring[i - 1]![0] || q[1] !== ring[i - 1]![1]);
}

/** Candidate centres are tried on a square lattice of this many steps per minRadius… */
const STEPS_PER_MIN_RADIUS = 2;
/** …but never more than this many candidates (the lattice is coarsened instead). */
const MAX_CANDIDATES = 40_000;

/**
 * Separate pebbles (the older look): lattice points are visited in a seeded random order, and each gets the
 * largest radius ≤ maxRadius that keeps `gap` clear of the outline and of every pebble placed so far; it is
 * kept when that radius is ≥ minRadius. Guarantees: pebbles are disjoint (centre distance ≥ r₁ + r₂ + gap)
 * and inside the patch (centre inside, distance to outline ≥ r + gap).
 */
export function packPebbles(polygon: Polygon, params: Pick<PebblesParams, 'minRadius' | 'maxRadius' | 'gap' | 'seed'>): Pebble[] {
  const xs = polygon.map((p) => p[0]);
  const ys = polygon.map((p) => p[1]);
  const [x0, x1, y0, y1] = [Math.min(...xs), Math.max(...xs), Math.min(...ys), Math.max(...ys)];
  let step = params.minRadius / STEPS_PER_MIN_RADIUS;
  const cells = (s: number) => (Math.floor((x1 - x0) / s) + 1) * (Math.floor((y1 - y0) / s) + 1);
  while (cells(step) > MAX_CANDIDATES) step *= 1.5;
  const candidates: Point[] = [];
  for (let x = x0 + step / 2; x < x1; x += step) for (let y = y0 + step / 2; y < y1; y += step) candidates.push([x, y]);
  shuffle(candidates, seededRandom(params.seed));
  const grid = new PebbleGrid(2 * params.maxRadius + params.gap);
  const pebbles: Pebble[] = [];
  for (const c of candidates) {
    if (!isInsideOrOn(c, polygon, 0)) continue;
    let r = Math.min(params.maxRadius, distanceToOutline(c, polygon) - params.gap);
    for (const p of grid.near(c, 2 * params.maxRadius + params.gap)) {
      if (r < params.minRadius) break;
      r = Math.min(r, Math.hypot(c[0] - p.center[0], c[1] - p.center[1]) - p.radius - params.gap);
    }
    if (r < params.minRadius) continue;
    const pebble = { center: c, radius: r };
    pebbles.push(pebble);
    grid.add(pebble);
  }
  return pebbles;
}

/** Fisher–Yates shuffle in place with the given uniform source. */
function shuffle<T>(items: T[], random: () => number): void {
  for (let i = items.length - 1; i > 0; i--) {
    const j = Math.floor(random() * (i + 1));
    [items[i], items[j]] = [items[j]!, items[i]!];
  }
}
