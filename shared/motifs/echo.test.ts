import { execFileSync } from 'node:child_process';
import { describe, expect, it } from 'vitest';
import type { Point } from '../geometry/point.ts';
import { signedArea } from '../layouts/patch.ts';
import { generateEcho } from './echo.ts';

/** Distance from p to the infinite line through a and b. */
const lineDistance = (p: Point, a: Point, b: Point) =>
  Math.abs((b[0] - a[0]) * (p[1] - a[1]) - (b[1] - a[1]) * (p[0] - a[0])) / Math.hypot(b[0] - a[0], b[1] - a[1]);
const edges = (poly: readonly Point[]) => poly.map((a, i) => [a, poly[(i + 1) % poly.length]!] as const);

describe('motifs/echo', () => {
  it('echoes a square as squares of side L − 2ks, each vertex exactly k·s from the outline', () => {
    const square: Point[] = [[0, 0], [6, 0], [6, 6], [0, 6]];
    const result = generateEcho(square, { kind: 'echo', spacing: 0.5, maxCount: 100 });
    if (!result.ok) throw new Error('echo refused a square');
    // Side 6 at spacing 0.5: insets at 0.5 … 2.5 have positive size; at 3 the square vanishes.
    expect(result.value.lines.length).toBe(5);
    result.value.lines.forEach((loop, i) => {
      const k = i + 1;
      expect(loop[0]).toEqual(loop[loop.length - 1]);
      const ring = loop.slice(0, -1);
      expect(signedArea(ring)).toBeCloseTo((6 - 2 * k * 0.5) ** 2, 12);
      ring.forEach((v) => expect(Math.min(...edges(square).map(([a, b]) => lineDistance(v, a, b)))).toBeCloseTo(k * 0.5, 12));
    });
  });

  it('echoes a triangle as triangles shrunk about the incentre: inradius r − k·s', () => {
    // 3-4-5 right triangle: area 6, semiperimeter 6, inradius r = A/s = 1 (Heron / incircle formula).
    const triangle: Point[] = [[0, 0], [4, 0], [0, 3]];
    const result = generateEcho(triangle, { kind: 'echo', spacing: 0.25, maxCount: 100 });
    if (!result.ok) throw new Error('echo refused a triangle');
    expect(result.value.lines.length).toBe(3); // at 1.0 the triangle shrinks to the incentre
    result.value.lines.forEach((loop, i) => {
      const d = (i + 1) * 0.25;
      const ring = loop.slice(0, -1);
      expect(ring.length).toBe(3);
      // The inner parallel body of a triangle is homothetic about the incentre with ratio (r − d)/r.
      expect(Math.abs(signedArea(ring))).toBeCloseTo(6 * (1 - d) ** 2, 12);
      ring.forEach((v) => expect(Math.min(...edges(triangle).map(([a, b]) => lineDistance(v, a, b)))).toBeCloseTo(d, 12));
    });
  });

  it('refuses a non-convex patch', () => {
    const ell: Point[] = [[0, 0], [4, 0], [4, 1], [1, 1], [1, 4], [0, 4]];
    expect(generateEcho(ell, { kind: 'echo', spacing: 0.5, maxCount: 3 })).toEqual({ ok: false, error: { kind: 'patch-not-convex' } });
  });

  it('matches Shapely negative buffers with mitre joins (independent reference library)', () => {
    const polygons: Point[][] = [
      [[0, 0], [7, 1], [8, 5], [3, 7], [-1, 4]],
      [[0, 0], [12, 0], [6, 3]],
      [[2, 0], [5, 2], [2, 4], [-1, 2]],
    ];
    const spacing = 0.4;
    const ours = polygons.map((p) => {
      const r = generateEcho(p, { kind: 'echo', spacing, maxCount: 100 });
      return r.ok ? r.value.lines.map((l) => l.slice(0, -1)) : [];
    });
    const script = `
import json, sys
from shapely.geometry import Polygon
data = json.load(sys.stdin)
out = []
for poly, loops in zip(data['polygons'], data['ours']):
    p = Polygon(poly)
    diffs = []
    k = 1
    while True:
        ref = p.buffer(-k * data['spacing'], join_style=2)
        if ref.is_empty or ref.area < 1e-12:
            break
        diffs.append(ref.symmetric_difference(Polygon(loops[k - 1])).area if k - 1 < len(loops) else 1e9)
        k += 1
    out.append({'count': k - 1, 'worst': max(diffs) if diffs else 0})
print(json.dumps(out))`;
    const input = JSON.stringify({ polygons, ours, spacing });
    const ref = JSON.parse(execFileSync('/usr/bin/python3', ['-c', script], { input }).toString()) as { count: number; worst: number }[];
    ref.forEach((r, i) => {
      expect(ours[i]!.length).toBe(r.count);
      expect(r.worst).toBeLessThan(1e-9);
    });
  });
});
