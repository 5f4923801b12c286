import { describe, expect, it } from 'vitest';
import blossomFixed from 'edmonds-blossom-fixed';
import { findMinCostPerfectMatching } from './minWeightMatching.ts';
import { seededRandom as makeRandom } from '../seededRandom.ts';

/**
 * Independent exact oracle: bitmask DP over subsets, f(mask) = min_j c(i,j) + f(mask∖{i,j}) with i the lowest
 * unmatched vertex (docs/engine.md §3.2, the independent oracle). O(2^k·k); k ≤ 20.
 */
function dpMinPerfectMatching(k: number, c: (i: number, j: number) => number): number {
  const full = (1 << k) - 1;
  const f = new Float64Array(1 << k).fill(Infinity);
  f[0] = 0;
  for (let mask = 1; mask <= full; mask++) {
    if (bitCount(mask) % 2 === 1) continue;
    const i = 31 - Math.clz32(mask & -mask);
    const rest = mask & ~(1 << i);
    let best = Infinity;
    for (let j = i + 1; j < k; j++) {
      if (rest & (1 << j)) best = Math.min(best, c(i, j) + f[rest & ~(1 << j)]!);
    }
    f[mask] = best;
  }
  return f[full]!;
}

function bitCount(x: number): number {
  let c = 0;
  for (let y = x; y; y &= y - 1) c++;
  return c;
}

function completeGraph(k: number, c: (i: number, j: number) => number) {
  const eu: number[] = [];
  const ev: number[] = [];
  const w: number[] = [];
  for (let i = 0; i < k; i++) for (let j = i + 1; j < k; j++) {
    eu.push(i);
    ev.push(j);
    w.push(c(i, j));
  }
  return { eu: Int32Array.from(eu), ev: Int32Array.from(ev), w: Float64Array.from(w) };
}

type Kind = 'ties' | 'euclid' | 'wide';
function randomCosts(k: number, kind: Kind, rnd: () => number): (i: number, j: number) => number {
  const xs = Array.from({ length: k }, () => [rnd() * 12, rnd() * 12] as const);
  const table = new Map<number, number>();
  return (i, j) => {
    const [a, b] = i < j ? [i, j] : [j, i];
    const key = a * k + b;
    let v = table.get(key);
    if (v === undefined) {
      if (kind === 'ties') v = 1 + Math.floor(rnd() * 5);
      else if (kind === 'wide') v = Math.floor(rnd() * 1e6);
      else v = Math.round(1e6 * Math.hypot(xs[a]![0] - xs[b]![0], xs[a]![1] - xs[b]![1]));
      table.set(key, v);
    }
    return v;
  };
}

describe('findMinCostPerfectMatching', () => {
  it('equals the bitmask-DP oracle on 600 seeded complete graphs (k = 2..16, ties, Euclidean, wide integers)', () => {
    const rnd = makeRandom(20240601);
    for (let trial = 0; trial < 600; trial++) {
      const k = 2 * (1 + Math.floor(rnd() * 8));
      const kind = (['ties', 'euclid', 'wide'] as const)[trial % 3]!;
      const c = randomCosts(k, kind, rnd);
      const g = completeGraph(k, c);
      const m = findMinCostPerfectMatching(k, g.eu, g.ev, g.w);
      expect(m).not.toBeNull();
      expect(m!.cost).toBe(dpMinPerfectMatching(k, c));
      for (let v = 0; v < k; v++) expect(m!.mate[m!.mate[v]!]).toBe(v);
    }
  });

  it('equals edmonds-blossom-fixed 1.0.1 (a JS port of the same Van Rantwijk code) on larger graphs', () => {
    const rnd = makeRandom(7);
    for (let trial = 0; trial < 30; trial++) {
      const k = 20 + 2 * Math.floor(rnd() * 30);
      const c = randomCosts(k, trial % 2 ? 'ties' : 'euclid', rnd);
      const g = completeGraph(k, c);
      const big = Math.max(...g.w) + 1;
      const edges = Array.from(g.w, (w, e) => [g.eu[e]!, g.ev[e]!, big - w]);
      const mate: number[] = blossomFixed(edges, true);
      let ref = 0;
      for (let v = 0; v < k; v++) if (mate[v]! > v) ref += c(v, mate[v]!);
      expect(findMinCostPerfectMatching(k, g.eu, g.ev, g.w)!.cost).toBe(ref);
    }
  });

  it('returns null when a sparse graph has no perfect matching (a star on 4 vertices)', () => {
    const m = findMinCostPerfectMatching(4, Int32Array.of(0, 0, 0), Int32Array.of(1, 2, 3), Float64Array.of(1, 1, 1));
    expect(m).toBeNull();
  });

  it('prices every pair of a complete graph at or below its cost (dual feasibility, LP duality)', () => {
    const rnd = makeRandom(99);
    for (let trial = 0; trial < 50; trial++) {
      const k = 2 * (2 + Math.floor(rnd() * 10));
      const c = randomCosts(k, trial % 2 ? 'ties' : 'euclid', rnd);
      const g = completeGraph(k, c);
      const m = findMinCostPerfectMatching(k, g.eu, g.ev, g.w)!;
      for (let i = 0; i < k; i++) for (let j = i + 1; j < k; j++) {
        expect(m.priceOf(i, j)).toBeLessThanOrEqual(c(i, j) + 1e-9);
        if (m.mate[i] === j) expect(m.priceOf(i, j)).toBeCloseTo(c(i, j), 9);
      }
    }
  });
});
