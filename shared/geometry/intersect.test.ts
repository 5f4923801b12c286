import { describe, expect, it } from 'vitest';
import { intersectSegments, properCrossing } from './intersect.ts';

const TOL = 1e-9;

describe('geometry/intersect', () => {
  it('finds a proper crossing of the two diagonals of a square at its centre (analytic)', () => {
    const r = intersectSegments([0, 0], [2, 2], [0, 2], [2, 0], TOL);
    expect(r.kind).toBe('crossing');
    expect(r.contacts[0]!.point).toEqual([1, 1]);
    expect(r.contacts[0]!.t).toBe(0.5);
    expect(r.contacts[0]!.u).toBe(0.5);
  });

  it('finds the crossing of y = x with x + 2y = 3 at (1, 1), t = 1/3 (analytic)', () => {
    const r = intersectSegments([0, 0], [3, 3], [3, 0], [-1, 2], TOL);
    expect(r.kind).toBe('crossing');
    expect(r.contacts[0]!.point[0]).toBeCloseTo(1, 14);
    expect(r.contacts[0]!.point[1]).toBeCloseTo(1, 14);
    expect(r.contacts[0]!.t).toBeCloseTo(1 / 3, 14);
  });

  it('reports a T-junction: an end of b on the interior of a', () => {
    const r = intersectSegments([0, 0], [4, 0], [1, 0], [1, 3], TOL);
    expect(r.kind).toBe('touch');
    expect(r.contacts).toEqual([{ point: [1, 0], t: 0.25, u: 0, end: 'b0' }]);
  });

  it('reports a T-junction within tolerance but not beyond it', () => {
    expect(intersectSegments([0, 0], [4, 0], [1, 1e-5], [1, 3], 1e-4).kind).toBe('touch');
    expect(intersectSegments([0, 0], [4, 0], [1, 1e-3], [1, 3], 1e-4).kind).toBe('none');
  });

  it('reports ends touching (both ends coincide)', () => {
    const r = intersectSegments([0, 0], [1, 0], [1, 0], [1, 1], TOL);
    expect(r.kind).toBe('touch');
    expect(r.contacts.map((c) => c.end)).toEqual(['a1', 'b0']);
  });

  it('reports collinear overlaps with the overlap ends', () => {
    const r = intersectSegments([0, 0], [4, 0], [2, 0], [6, 0], TOL);
    expect(r.kind).toBe('overlap');
    expect(r.contacts.map((c) => [c.end, c.t, c.u])).toEqual([['a1', 1, 0.5], ['b0', 0.5, 0]]);
    const inside = intersectSegments([0, 0], [4, 0], [3, 0], [1, 0], TOL);
    expect(inside.kind).toBe('overlap');
    expect(inside.contacts.map((c) => c.t)).toEqual([0.75, 0.25]);
  });

  it('does not report collinear disjoint or parallel segments', () => {
    expect(intersectSegments([0, 0], [1, 0], [2, 0], [3, 0], TOL).kind).toBe('none');
    expect(intersectSegments([0, 0], [1, 0], [0, 1], [1, 1], TOL).kind).toBe('none');
  });

  it('gets the sign right on near-collinear input where naive floating point fails (Shewchuk, robust predicates)', () => {
    // b0 lies exactly on a's supporting line (both on y = x), b1 slightly off: no proper crossing.
    const a0 = [0.5, 0.5] as const;
    const a1 = [12, 12] as const;
    expect(properCrossing(a0, a1, [24, 24], [0.5000000000000001, 0.5])).toBeNull();
    expect(properCrossing([0, 0], [1, 1], [0, 1e-300], [1, -1e-300])).not.toBeNull();
  });
  it('adds no crossing inside a near-collinear overlap (ill-conditioned; pinned from a replayed planned route)', () => {
    // b runs along a between two points rounded off a's supporting line by ~1e-16 (a crossing vertex of the design
    // [2.25, 2.5]–[7.5, 1] with the seam [6.25, 5.5]–[0.5, 0.25]). The supporting lines cross at a rounding-level
    // angle, so the "crossing" landed 1.4e-4 beyond b's end with t and u that disagree; the ends alone define the overlap.
    const r = intersectSegments([2.25, 2.5], [7.5, 1], [2.6546242774566475, 2.3843930635838153], [2.7940414507772022, 2.344559585492228], 1e-4);
    expect(r.kind).toBe('overlap');
    expect(r.contacts.map((c) => c.end)).toEqual(['b0', 'b1']);
  });
});
