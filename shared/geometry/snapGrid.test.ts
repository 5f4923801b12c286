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
  it('agrees with a brute-force nearest search on 5,000 clustered points (growth and hash collisions)', () => {
    const g = new SnapGrid(0.01);
    let seed = 12345;
    const rnd = (): number => ((seed = (seed * 1103515245 + 12345) % 2147483648) / 2147483648);
    const pts: [number, number][] = [];
    for (let k = 0; k < 5000; k++) pts.push([Math.floor(rnd() * 40) * 0.013 + rnd() * 0.004, Math.floor(rnd() * 40) * 0.013 + rnd() * 0.004]);
    for (const [x, y] of pts) {
      let best = -1;
      let bestD = 1e-4;
      for (let id = 0; id < g.size; id++) {
        const d = (g.xs[id]! - x) ** 2 + (g.ys[id]! - y) ** 2;
        if (d < bestD || (d === bestD && id < best)) [best, bestD] = [id, d];
      }
      expect(g.snap(x, y)).toBe(best >= 0 ? best : g.size - 1);
    }
    let closest = Infinity;
    for (let a = 0; a < g.size; a++) for (let b = a + 1; b < g.size; b++) closest = Math.min(closest, Math.hypot(g.xs[a]! - g.xs[b]!, g.ys[a]! - g.ys[b]!));
    expect(closest).toBeGreaterThan(0.01);
  });
  it('refuses a non-positive tolerance', () => {
    expect(() => new SnapGrid(0)).toThrow(/geometry\/snapGrid/);
  });
});
