import { describe, expect, it } from 'vitest';
import { SnapGrid } from './snapGrid.ts';

describe('geometry/snapGrid', () => {
  it('merges points within tolerance and keeps the first position', () => {
    const g = new SnapGrid(1e-4);
    expect(g.snap(1, 1)).toBe(0);
    expect(g.snap(1 + 5e-5, 1 - 5e-5)).toBe(0);
    expect(g.snap(1 + 2e-4, 1)).toBe(1);
    expect(g.size).toBe(2);
    expect([g.xs[0], g.ys[0]]).toEqual([1, 1]);
  });
  it('finds neighbours across cell borders and picks the nearest', () => {
    const g = new SnapGrid(1);
    g.snap(0.99, 0.99);
    g.snap(2.5, 0.99);
    expect(g.snap(1.01, 1.01)).toBe(0);
    expect(g.snap(1.9, 0.99)).toBe(1);
    expect(g.snap(-0.5, -0.5)).toBe(2);
  });
  it('refuses a non-positive tolerance', () => {
    expect(() => new SnapGrid(0)).toThrow(/geometry\/snapGrid/);
  });
});
