import { execFileSync } from 'node:child_process';
import { describe, expect, it } from 'vitest';
import type { Point } from '../geometry/point.ts';
import { signedArea } from '../layouts/patch.ts';
import { buildEchoRings, generateEcho } from './echo.ts';
import { distanceToOutline } from './polygon.ts';

/** Distance from p to the infinite line through a and b. */
const lineDistance = (p: Point, a: Point, b: Point) =>
  Math.abs((b[0] - a[0]) * (p[1] - a[1]) - (b[1] - a[1]) * (p[0] - a[0])) / Math.hypot(b[0] - a[0], b[1] - a[1]);
const edges = (poly: readonly Point[]) => poly.map((a, i) => [a, poly[(i + 1) % poly.length]!] as const);
const nearestEdgeLine = (v: Point, poly: readonly Point[]) => Math.min(...edges(poly).map(([a, b]) => lineDistance(v, a, b)));
const echo = (poly: Point[], spacing: number, separate = false) => generateEcho(poly, { kind: 'echo', spacing, maxCount: 100, separate });

const square: Point[] = [[0, 0], [6, 0], [6, 6], [0, 6]];
const triangle: Point[] = [[0, 0], [4, 0], [0, 3]];
const ell: Point[] = [[0, 0], [4, 0], [4, 1.5], [1.5, 1.5], [1.5, 4], [0, 4]];
const ushape: Point[] = [[0, 0], [8, 0], [8, 5], [5, 5], [5, 2], [3, 2], [3, 5], [0, 5]];

describe('motifs/echo (separate): closed rings', () => {
  it('echoes a square as squares of side L − 2ks, each vertex exactly k·s from the outline', () => {
    const { lines } = echo(square, 0.5, true);
    // Side 6 at spacing 0.5: insets at 0.5 … 2.5 have positive size; at 3 the square vanishes.
    expect(lines.length).toBe(5);
    lines.forEach((loop, i) => {
      const k = i + 1;
      expect(loop[0]).toEqual(loop[loop.length - 1]);
      const ring = loop.slice(0, -1);
      expect(signedArea(ring)).toBeCloseTo((6 - 2 * k * 0.5) ** 2, 12);
      ring.forEach((v) => expect(nearestEdgeLine(v, square)).toBeCloseTo(k * 0.5, 12));
    });
  });

  it('echoes a triangle as triangles shrunk about the incentre: inradius r − k·s', () => {
    // 3-4-5 right triangle: area 6, semiperimeter 6, inradius r = A/s = 1 (Heron / incircle formula).
    const { lines } = echo(triangle, 0.25, true);
    expect(lines.length).toBe(3); // at 1.0 the triangle shrinks to the incentre
    lines.forEach((loop, i) => {
      const d = (i + 1) * 0.25;
      const ring = loop.slice(0, -1);
      expect(ring.length).toBe(3);
      // The inner parallel body of a triangle is homothetic about the incentre with ratio (r − d)/r.
      expect(Math.abs(signedArea(ring))).toBeCloseTo(6 * (1 - d) ** 2, 12);
      ring.forEach((v) => expect(nearestEdgeLine(v, triangle)).toBeCloseTo(d, 12));
    });
  });
});

describe('motifs/echo (joined): one spiral with step-over legs', () => {
  it('sews a square as one line: legs of exactly one spacing at the same corner, echoes k·s from the edge lines', () => {
    const { lines } = echo(square, 0.5);
    expect(lines.length).toBe(1);
    const line = lines[0]!;
    // Starts on the outline with a leg one spacing long, square to the side.
    expect(distanceToOutline(line[0]!, square)).toBeLessThan(1e-12);
    expect(Math.hypot(line[1]![0] - line[0]![0], line[1]![1] - line[0]![1])).toBeCloseTo(0.5, 12);
    // Every other point lies on an echo: exactly k·s (k = 1 … 5) or, for the half-step echo, 5.5·s from the edge lines.
    const depths = line.slice(1).map((v) => nearestEdgeLine(v, square) / 0.5);
    depths.forEach((k) => expect(Math.abs(k - Math.round(k * 2) / 2)).toBeLessThan(1e-12));
    expect(Math.max(...depths)).toBeCloseTo(5.5, 12);
    // Legs: the steps between points on echoes of different depth; each is one spacing (half to the half-step echo).
    const legs = line.slice(1).flatMap((v, i) => (i > 0 && Math.abs(depths[i]! - depths[i - 1]!) > 1e-9 ? [Math.hypot(v[0] - line[i]![0], v[1] - line[i]![1])] : []));
    expect(legs.length).toBe(5);
    legs.forEach((l, i) => expect(l).toBeCloseTo(i < 4 ? 0.5 : 0.25, 12));
  });

  it('ring depths match k·s exactly in a triangle, and the half-step echo fills a middle wider than one spacing', () => {
    // Inradius 1 at spacing 0.3: echoes at 0.3, 0.6, 0.9; the middle left (inradius 0.1) is narrower than s/2, so no half step.
    expect(buildEchoRings(triangle, 0.3, 100, true).map((r) => r.depth)).toEqual([1, 2, 3]);
    // At spacing 0.4: echoes at 0.4, 0.8; the inradius 0.2 left is s/2, so a half step would land on the incentre: none.
    expect(buildEchoRings(triangle, 0.4, 100, true).map((r) => r.depth)).toEqual([1, 2]);
    // At spacing 0.35: echoes at 0.35, 0.7; inradius 0.3 left > s/2 = 0.175 → a half-step echo at 0.875.
    expect(buildEchoRings(triangle, 0.35, 100, true).map((r) => r.depth)).toEqual([1, 2, 2.5]);
  });

  it('echoes non-convex patches (an L and a U that splits in two), legs within two spacings', () => {
    for (const poly of [ell, ushape]) {
      const rings = buildEchoRings(poly, 0.3, 100, false);
      expect(rings.length).toBeGreaterThan(1);
      // Mitred insets: no ring point is nearer the outline than its depth (corners may be further).
      rings.forEach((r) => r.points.forEach((v) => expect(distanceToOutline(v, poly)).toBeGreaterThanOrEqual(r.depth * 0.3 - 1e-7)));
      const { lines } = echo(poly, 0.3);
      lines.forEach((l) => l.forEach((v) => expect(distanceToOutline(v, poly) <= 1e-7 || distanceToOutline(v, poly) >= 0.15 - 1e-7).toBe(true)));
    }
    // The U falls apart into its two arms: at some depth there are two rings in one parent.
    const u = buildEchoRings(ushape, 0.3, 100, false);
    const parents = u.map((r) => r.parent);
    expect(parents.some((p, i) => parents.indexOf(p) !== i)).toBe(true);
  });
});

describe('motifs/echo against Shapely negative buffers (independent reference library)', () => {
  const polygons: Point[][] = [
    [[0, 0], [7, 1], [8, 5], [3, 7], [-1, 4]],
    [[0, 0], [12, 0], [6, 3]],
    [[2, 0], [5, 2], [2, 4], [-1, 2]],
    ell,
    ushape,
    [[0, 0], [10, 0], [10, 6], [7, 6], [6, 3], [4, 3], [3, 6], [0, 6]],
  ];
  it('gives the rings of buffer(−k·s, join_style=mitre, mitre_limit=5) for convex and non-convex patches', () => {
    const spacing = 0.4;
    const ours = polygons.map((p) => {
      const rings = buildEchoRings(p, spacing, 100, false);
      const depth = Math.max(0, ...rings.map((r) => r.depth));
      return Array.from({ length: depth }, (_, k) => rings.filter((r) => r.depth === k + 1).map((r) => r.points));
    });
    const script = `
import json, sys
from shapely.geometry import Polygon, MultiPolygon
from shapely.ops import unary_union
data = json.load(sys.stdin)
out = []
for poly, levels in zip(data['polygons'], data['ours']):
    p = Polygon(poly)
    diffs = []
    k = 1
    while True:
        ref = p.buffer(-k * data['spacing'], join_style=2, mitre_limit=5.0)
        if ref.is_empty or ref.area < 1e-12:
            break
        mine = unary_union([Polygon(r) for r in levels[k - 1]]) if k - 1 < len(levels) else Polygon()
        diffs.append(ref.symmetric_difference(mine).area)
        k += 1
    out.append({'count': k - 1, 'worst': max(diffs) if diffs else 0})
print(json.dumps(out))`;
    const input = JSON.stringify({ polygons, ours, spacing });
    const ref = JSON.parse(execFileSync('/usr/bin/python3', ['-c', script], { input }).toString()) as { count: number; worst: number }[];
    ref.forEach((r, i) => {
      expect({ i, count: ours[i]!.length }).toEqual({ i, count: r.count });
      // Convex: exact to rounding; non-convex: Clipper2 keeps 1e-8 design units.
      expect(r.worst).toBeLessThan(1e-6);
    });
  });
});

