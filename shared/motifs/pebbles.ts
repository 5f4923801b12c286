import { z } from 'zod';
import { flattenArc } from '../design/flatten.ts';
import type { Point } from '../geometry/point.ts';
import type { Polygon } from '../layouts/patch.ts';
import { chordErrorSchema, positiveNumber, type MotifLines } from './motif.types.ts';
import { distanceToOutline, isInsideOrOn } from './polygon.ts';
import { seededRandom } from '../seededRandom.ts';

export const pebblesParamsSchema = z
  .object({
    kind: z.literal('pebbles'),
    /** Smallest pebble radius, design units. */
    minRadius: positiveNumber,
    /** Largest pebble radius, design units (≥ minRadius). */
    maxRadius: positiveNumber,
    /** Least clear distance between two pebbles, and between a pebble and the outline. */
    gap: z.number().finite().min(0).default(0),
    /** Seed of the placement order; the same seed gives the same pebbles. */
    seed: z.number().int().default(1),
    chordError: chordErrorSchema,
  })
  .strict()
  .refine((p) => p.maxRadius >= p.minRadius, { message: 'maxRadius must be at least minRadius', path: ['maxRadius'] });
export type PebblesParams = z.output<typeof pebblesParamsSchema>;

/** One pebble before flattening. */
export interface Pebble {
  readonly center: Point;
  readonly radius: number;
}

/** Candidate centres are tried on a square lattice of this many steps per minRadius… */
const STEPS_PER_MIN_RADIUS = 2;
/** …but never more than this many candidates (the lattice is coarsened instead). */
const MAX_CANDIDATES = 40_000;

/**
 * Packs pebbles (circles) into the patch greedily: lattice points are visited in a seeded random
 * order, and each gets the largest radius ≤ maxRadius that keeps `gap` clear of the outline and of every
 * pebble placed so far; it is kept when that radius is ≥ minRadius. Guarantees: pebbles are disjoint
 * (centre distance ≥ r₁ + r₂ + gap) and inside the patch (centre inside, distance to outline ≥ r + gap).
 */
export function packPebbles(polygon: Polygon, params: PebblesParams): Pebble[] {
  const xs = polygon.map((p) => p[0]);
  const ys = polygon.map((p) => p[1]);
  const [x0, x1, y0, y1] = [Math.min(...xs), Math.max(...xs), Math.min(...ys), Math.max(...ys)];
  let step = params.minRadius / STEPS_PER_MIN_RADIUS;
  const cells = (s: number) => (Math.floor((x1 - x0) / s) + 1) * (Math.floor((y1 - y0) / s) + 1);
  while (cells(step) > MAX_CANDIDATES) step *= 1.5;
  const candidates: Point[] = [];
  for (let x = x0 + step / 2; x < x1; x += step) for (let y = y0 + step / 2; y < y1; y += step) candidates.push([x, y]);
  shuffle(candidates, seededRandom(params.seed));

  const bucketSize = 2 * params.maxRadius + params.gap;
  const buckets = new Map<string, Pebble[]>();
  const bucketKey = (i: number, j: number) => `${i},${j}`;
  const pebbles: Pebble[] = [];
  for (const c of candidates) {
    if (!isInsideOrOn(c, polygon, 0)) continue;
    let r = Math.min(params.maxRadius, distanceToOutline(c, polygon) - params.gap);
    const bi = Math.floor((c[0] - x0) / bucketSize);
    const bj = Math.floor((c[1] - y0) / bucketSize);
    for (let i = bi - 1; i <= bi + 1 && r >= params.minRadius; i++) {
      for (let j = bj - 1; j <= bj + 1; j++) {
        for (const p of buckets.get(bucketKey(i, j)) ?? []) {
          r = Math.min(r, Math.hypot(c[0] - p.center[0], c[1] - p.center[1]) - p.radius - params.gap);
        }
      }
    }
    if (r < params.minRadius) continue;
    const pebble = { center: c, radius: r };
    pebbles.push(pebble);
    const key = bucketKey(bi, bj);
    buckets.set(key, [...(buckets.get(key) ?? []), pebble]);
  }
  return pebbles;
}

/**
 * Pebbles as quilting lines: each circle flattened to a closed inscribed polygon (vertices on the circle,
 * chord error ≤ chordError), so each line stays inside its circle and hence inside the patch.
 */
export function generatePebbles(polygon: Polygon, params: PebblesParams): MotifLines {
  return {
    lines: packPebbles(polygon, params).map((p) => {
      const ring = flattenArc(p.center, p.radius, 0, 2 * Math.PI, params.chordError);
      // Close exactly: sin(2π) is not 0 in floating point, and a loop must end where it starts.
      return [...ring.slice(0, -1), ring[0]!];
    }),
  };
}

/** Fisher–Yates shuffle in place with the given uniform source. */
function shuffle<T>(items: T[], random: () => number): void {
  for (let i = items.length - 1; i > 0; i--) {
    const j = Math.floor(random() * (i + 1));
    [items[i], items[j]] = [items[j]!, items[i]!];
  }
}
