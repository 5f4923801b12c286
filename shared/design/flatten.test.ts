import { describe, expect, it } from 'vitest';
import { flattenArc, flattenCubic, quadraticAsCubic } from './flatten.ts';
import { polylineLength } from '../geometry/polyline.ts';
import { pointSegmentDistance } from '../geometry/distance.ts';
import type { Point } from '../geometry/point.ts';

/** Largest distance from sampled curve points to the polyline. */
function chordError(curve: (s: number) => Point, poly: readonly Point[], samples = 20_000): number {
  let worst = 0;
  for (let i = 0; i <= samples; i++) {
    const p = curve(i / samples);
    let best = Infinity;
    for (let k = 1; k < poly.length; k++) best = Math.min(best, pointSegmentDistance(p, poly[k - 1]!, poly[k]!));
    worst = Math.max(worst, best);
  }
  return worst;
}

describe('design/flatten: circular arcs', () => {
  // Anchors listed in docs/engine.md §9; the math is analytic:
  // an inscribed regular n-gon of radius r has perimeter 2nr·sin(π/n) and tends to the circumference 2πr.
  it.each([0.1, 0.01, 1e-3, 1e-4])('a full circle r = 6 at chord error %s is the inscribed n-gon', (maxError) => {
    const r = 6;
    const poly = flattenArc([6, 6], r, 0, 2 * Math.PI, maxError);
    const n = poly.length - 1;
    const perimeter = polylineLength(poly);
    expect(perimeter).toBeCloseTo(2 * n * r * Math.sin(Math.PI / n), 10);
    // Sagitta of one step r(1 − cos(π/n)) is within the bound, and one step fewer would break it.
    expect(r * (1 - Math.cos(Math.PI / n))).toBeLessThanOrEqual(maxError * (1 + 1e-12));
    expect(r * (1 - Math.cos(Math.PI / (n - 1)))).toBeGreaterThan(maxError);
    // Perimeter below 2πr and within the chord-error bound: 2πr − 2nr·sin(π/n) ≤ 2π·maxError for this n.
    expect(perimeter).toBeLessThan(2 * Math.PI * r);
    expect(2 * Math.PI * r - perimeter).toBeLessThanOrEqual(2 * Math.PI * maxError);
    expect(poly[0]![0]).toBeCloseTo(poly[n]![0], 12);
    expect(poly[0]![1]).toBeCloseTo(poly[n]![1], 12);
  });

  it('gives r = 6, n = 6 a perimeter of 36 (hexagon: side = radius)', () => {
    const poly = flattenArc([0, 0], 6, 0, 2 * Math.PI, 6 * (1 - Math.cos(Math.PI / 6)) * (1 + 1e-12));
    expect(poly.length - 1).toBe(6);
    expect(polylineLength(poly)).toBeCloseTo(36, 12);
  });

  it('keeps a quarter arc within its chord error and runs from start to end angle', () => {
    const maxError = 1e-3;
    const poly = flattenArc([0, 0], 2, Math.PI / 2, 0, maxError);
    expect(poly[0]![0]).toBeCloseTo(0, 15);
    expect(poly[0]![1]).toBeCloseTo(2, 15);
    expect(poly[poly.length - 1]).toEqual([2, 0]);
    const err = chordError((s) => [2 * Math.cos(Math.PI / 2 - (s * Math.PI) / 2), 2 * Math.sin(Math.PI / 2 - (s * Math.PI) / 2)], poly);
    expect(err).toBeLessThanOrEqual(maxError * (1 + 1e-9));
    // Arc length rπ/2 = π (analytic), approached from below.
    expect(Math.PI - polylineLength(poly)).toBeGreaterThan(0);
    expect(Math.PI - polylineLength(poly)).toBeLessThan(2 * maxError);
  });

  it('refuses bad arguments', () => {
    expect(() => flattenArc([0, 0], 0, 0, 1, 0.1)).toThrow(/design\/flatten/);
    expect(() => flattenArc([0, 0], 1, 0, 1, 0)).toThrow(/design\/flatten/);
  });
});

describe('design/flatten: cubic Béziers', () => {
  // Parabola y = x² on [0, 1] as the quadratic (0,0),(0.5,0),(1,1): length √5/2 + asinh(2)/4
  // (analytic arc length of a parabola; anchor listed in docs/engine.md §9).
  const PARABOLA = Math.sqrt(5) / 2 + Math.asinh(2) / 4;

  it('checks the anchor value itself', () => {
    expect(PARABOLA).toBeCloseTo(1.4789428575445975, 15);
  });

  it.each([1e-2, 1e-3, 1e-4, 1e-6])('flattens y = x² within chord error %s and approaches its length from below', (maxError) => {
    const [c0, c1, c2, c3] = quadraticAsCubic([0, 0], [0.5, 0], [1, 1]);
    const poly = flattenCubic(c0, c1, c2, c3, maxError);
    for (const [x, y] of poly) expect(y).toBeCloseTo(x * x, 12); // every vertex on the parabola
    const err = chordError((s) => [s, s * s], poly, 4000);
    expect(err).toBeLessThanOrEqual(maxError * (1 + 1e-9));
    const len = polylineLength(poly);
    expect(len).toBeLessThanOrEqual(PARABOLA);
    // An inscribed chord of a convex arc with sagitta h and chord c is shorter by about 8h²/(3c); bounded loosely here.
    expect(PARABOLA - len).toBeLessThan(4 * maxError);
  });

  it('flattens a collinear cubic to its chord (length = chord, docs/engine.md §9)', () => {
    const poly = flattenCubic([0, 0], [1, 1], [2, 2], [3, 3], 1e-6);
    expect(poly).toEqual([[0, 0], [3, 3]]);
    expect(polylineLength(poly)).toBeCloseTo(3 * Math.SQRT2, 15);
  });

  it('refuses a non-positive error', () => {
    expect(() => flattenCubic([0, 0], [1, 1], [2, 2], [3, 3], -1)).toThrow(/design\/flatten/);
  });
});
