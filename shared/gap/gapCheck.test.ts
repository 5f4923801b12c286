import { describe, expect, it } from 'vitest';
import type { Design } from '../design/design.schema.ts';
import type { Polyline } from '../geometry/point.ts';
import { flattenArc } from '../design/flatten.ts';
import { checkGap, findWidestGap, type Gap } from './gapCheck.ts';

function design(lines: Polyline[], extra: Partial<Design> = {}): Design {
  return { version: 1, units: 'in', width: 12, height: 12, seams: [], lines, edgeTravel: true, ...extra };
}

function gapOf(d: Design, precision = 1e-6): Gap {
  const r = findWidestGap(d, { precision });
  if (!r.ok) throw new Error(r.error.message);
  return r.value;
}

/** The true radius must lie in [radius, radius + precision]. */
function expectRadius(g: Gap, expected: number): void {
  expect(g.radius).toBeLessThanOrEqual(expected + 1e-12);
  expect(g.radius + g.precision).toBeGreaterThanOrEqual(expected - 1e-12);
}

// Analytic anchors: docs/engine.md §10 (values derived there and re-derived below).
describe('gap/gapCheck: largest empty circle', () => {
  it('border only: the inscribed circle of a 12 in square, r = 6 at the centre', () => {
    const g = gapOf(design([]));
    expectRadius(g, 6);
    expect(g.center).toEqual([6, 6]);
  });

  it('both diagonals: the incircle of a right isosceles triangle with legs 6√2, r = 6(√2 − 1)', () => {
    // Incircle of a right triangle r = (a + b − c)/2 with a = b = 6√2, c = 12 (analytic).
    const g = gapOf(design([[[0, 0], [12, 12]], [[0, 12], [12, 0]]]));
    expectRadius(g, 6 * (Math.SQRT2 - 1));
    expect(g.radius).toBeCloseTo(2.4852813742, 5);
  });

  it('E9 crosshatch at s = 0.25: r = s/2 = 0.125', () => {
    const lines: Polyline[] = [];
    for (let n = 0; n < 48; n++) {
      const c = 0.125 + n * 0.25;
      lines.push([[c, 0], [c, 12]], [[0, c], [12, c]]);
    }
    const g = gapOf(design(lines), 1e-4);
    expectRadius(g, 0.125);
  });

  it('a circle R = 2 at the centre: the corner disc wins, r = (6√2 − 2)/(1 + √2) = 2.6862915010', () => {
    // A disc in a corner tangent to both sides has its centre at (r, r); tangent to the circle outside it:
    // √2·(6 − r) = 2 + r, so r = (6√2 − 2)/(1 + √2) (analytic). The 4096-gon has a vertex on the diagonal.
    const circle = flattenArc([6, 6], 2, 0, 2 * Math.PI, 2 * (1 - Math.cos(Math.PI / 4096)) * (1 + 1e-9));
    expect(circle).toHaveLength(4097);
    const g = gapOf(design([circle]));
    expectRadius(g, (6 * Math.SQRT2 - 2) / (1 + Math.SQRT2));
    expect(g.radius).toBeCloseTo(2.686291501, 6);
    expect(Math.min(g.center[0], 12 - g.center[0])).toBeCloseTo(g.radius, 5);
  });

  it('a rectangular block with one seam across: half the taller part', () => {
    const g = gapOf(design([[[0, 3], [20, 3]]], { width: 20, height: 10 }), 1e-3);
    expectRadius(g, 3.5);
  });

  it('scales with units: the same block in cm has a radius 2.54 times larger', () => {
    const inch = gapOf(design([[[0, 0], [12, 12]]]));
    const cm = gapOf(design([[[0, 0], [12 * 2.54, 12 * 2.54]]], { units: 'cm', width: 12 * 2.54, height: 12 * 2.54 }));
    expect(cm.radius).toBeCloseTo(inch.radius * 2.54, 5);
  });

  it('reports the precision it proved when the cell budget runs out', () => {
    const g = findWidestGap(design([[[0, 0], [12, 12]]]), { precision: 1e-9, maxCells: 50 });
    expect(g.ok && g.value.precision).toBeGreaterThan(1e-9);
    if (g.ok) expectRadius(g.value, 12 / (2 + Math.SQRT2)); // incircle of the right triangle with legs 12
  });
});

describe('gap/gapCheck: batting spacing', () => {
  const cross = design([[[6, 0], [6, 12]], [[0, 6], [12, 6]]]); // four 6 in squares: widest gap 6 in
  it('compares the widest gap (diameter 2r) with the batting limit', () => {
    const status = (limit: number): string => {
      const r = checkGap({ ...cross, thread: { battingSpacing: limit } }, { precision: 1e-4 });
      return r.ok ? r.value.status : r.error.kind;
    };
    expect(status(8)).toBe('within');
    expect(status(4)).toBe('over');
    expect(status(6.0001)).toBe('at-limit');
    const none = checkGap(cross);
    expect(none.ok && none.value.status).toBe('no-limit');
    expect(none.ok && none.value.widestGap).toBeCloseTo(6, 1);
  });
  it('refuses broken designs with a typed problem', () => {
    const r = checkGap(design([[[0, 0], [Number.NaN, 1]]]));
    expect(r.ok || r.error.kind).toBe('non-finite');
  });
});
