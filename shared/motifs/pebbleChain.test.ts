import { execFileSync } from 'node:child_process';
import { describe, expect, it } from 'vitest';
import type { Point } from '../geometry/point.ts';
import { signedArea } from '../layouts/patch.ts';
import { generatePebbles, placePebbles, type PebblesParams } from './pebbles.ts';
import { distanceToOutline, isInsideOrOn } from './polygon.ts';
import { UnionFind } from '../route/unionFind.ts';

const base: PebblesParams = { kind: 'pebbles', minRadius: 0.2, maxRadius: 0.6, gap: 0, overlap: 0, seed: 7, chordError: 0.005, separate: false };
const shapes: Point[][] = [
  [[0, 0], [6, 0], [6, 6], [0, 6]],
  [[0, 0], [8, 0], [0, 5]],
  [[0, 0], [4, 0], [4, 1], [1, 1], [1, 4], [0, 4]],
  [[0, 3], [3, 0], [6, 3]],
];
const gapOf = (p: { center: Point; radius: number }, q: { center: Point; radius: number }) => Math.hypot(p.center[0] - q.center[0], p.center[1] - q.center[1]) - p.radius - q.radius;

describe('motifs/pebbles (joined): a touching chain', () => {
  it.each(shapes.flatMap((s, i) => [0, 0.05].map((overlap) => [i, overlap, s] as const)))(
    'shape %s, overlap %s: circle tangency — centre distance = r₁ + r₂ − overlap for a neighbour of every pebble, never closer',
    (_, overlap, shape) => {
      // Circle tangency (analytic): two circles touch from outside exactly when the distance between their
      // centres equals the sum of their radii; overlapping by o means the distance is r₁ + r₂ − o.
      const pebbles = placePebbles(shape, { ...base, overlap });
      expect(pebbles.length).toBeGreaterThan(5);
      const joined = new UnionFind(pebbles.length + 1);
      pebbles.forEach((p, i) => {
        expect(p.radius).toBeGreaterThanOrEqual(base.minRadius - 1e-12);
        expect(p.radius).toBeLessThanOrEqual(base.maxRadius + 1e-12);
        expect(isInsideOrOn(p.center, shape, 0)).toBe(true);
        expect(distanceToOutline(p.center, shape)).toBeGreaterThanOrEqual(p.radius - 1e-9);
        if (Math.abs(distanceToOutline(p.center, shape) - p.radius) <= 1e-9) joined.union(i, pebbles.length);
        let touches = 0;
        pebbles.forEach((q, j) => {
          if (j === i) return;
          expect(gapOf(p, q)).toBeGreaterThanOrEqual(-overlap - 1e-9);
          if (Math.abs(gapOf(p, q) + overlap) <= 1e-9) {
            touches++;
            joined.union(i, j);
          }
        });
        expect(touches).toBeGreaterThan(0);
      });
      // Every pebble reaches the outline through touching pebbles: one cluster with the outline.
      pebbles.forEach((_, i) => expect(joined.find(i)).toBe(joined.find(pebbles.length)));
    },
  );

  it('puts each touching point on both lines as the same vertex, and keeps the chord error', () => {
    for (const overlap of [0, 0.05]) {
      const shape = shapes[0]!;
      const pebbles = placePebbles(shape, { ...base, overlap });
      const { lines } = generatePebbles(shape, { ...base, overlap });
      const vertexKeys = lines.map((l) => new Set(l.map((p) => `${p[0]},${p[1]}`)));
      let shared = 0;
      pebbles.forEach((p, i) => {
        pebbles.forEach((q, j) => {
          if (j <= i || Math.abs(gapOf(p, q) + overlap) > 1e-9) return;
          const common = [...vertexKeys[i]!].filter((k) => vertexKeys[j]!.has(k));
          expect(common.length).toBe(overlap === 0 ? 1 : 2);
          shared++;
        });
        const loop = lines[i]!;
        expect(loop[0]).toEqual(loop[loop.length - 1]);
        for (let k = 1; k < loop.length; k++) {
          const mid: Point = [(loop[k - 1]![0] + loop[k]![0]) / 2, (loop[k - 1]![1] + loop[k]![1]) / 2];
          expect(p.radius - Math.hypot(mid[0] - p.center[0], mid[1] - p.center[1])).toBeLessThanOrEqual(base.chordError + 1e-12);
        }
      });
      expect(shared).toBeGreaterThanOrEqual(pebbles.length - 1);
    }
  });

  it('reports the covered fraction: Σπr² / area when tangent, and as Shapely measures the union of discs', () => {
    const shape = shapes[0]!;
    const tangent = generatePebbles(shape, base);
    const discs = placePebbles(shape, base).reduce((s, p) => s + Math.PI * p.radius ** 2, 0);
    // Tangent within rounding: the union sees slivers of lens up to ~1e-9 where centres land a hair closer.
    expect(tangent.coveredFraction).toBeCloseTo(discs / 36, 8);
    // Dense for the size range (measured; README lists it per layout): above 0.7 for radii 0.2–0.6.
    expect(tangent.coveredFraction!).toBeGreaterThan(0.7);
    const overlapping = placePebbles(shape, { ...base, overlap: 0.08 });
    const fraction = generatePebbles(shape, { ...base, overlap: 0.08 }).coveredFraction!;
    const script = `
import json, sys
from shapely.geometry import Point, Polygon
from shapely.ops import unary_union
d = json.load(sys.stdin)
u = unary_union([Point(c).buffer(r, resolution=256) for c, r in d['discs']])
print(json.dumps(u.area / Polygon(d['shape']).area))`;
    const input = JSON.stringify({ shape, discs: overlapping.map((p) => [p.center, p.radius]) });
    const shapely = JSON.parse(execFileSync('/usr/bin/python3', ['-c', script], { input }).toString()) as number;
    // Shapely approximates each disc by a 1024-gon, short of the disc by about (2π/1024)²/6 ≈ 6e-6 of its area.
    expect(Math.abs(fraction - shapely)).toBeLessThan(1e-4);
  });

  it('is deterministic for a seed, changes with it, and fits nothing in a sliver', () => {
    const shape = shapes[1]!;
    expect(placePebbles(shape, base)).toEqual(placePebbles(shape, base));
    expect(placePebbles(shape, { ...base, seed: 8 })).not.toEqual(placePebbles(shape, base));
    expect(placePebbles([[0, 0], [10, 0], [10, 0.3], [0, 0.3]], base)).toEqual([]);
    expect(Math.abs(signedArea(shape))).toBe(20);
  });
});
