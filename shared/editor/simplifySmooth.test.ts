import { execFileSync } from 'node:child_process';
import { describe, expect, it } from 'vitest';
import type { Point } from '../geometry/point.ts';
import { simplifyPolyline } from './simplify.ts';
import { catmullRomCurve, chaikinSmooth } from './smooth.ts';

describe('editor/simplify: Ramer–Douglas–Peucker', () => {
  it('agrees with Shapely simplify(preserve_topology=False), i.e. GEOS DouglasPeuckerSimplifier', () => {
    // A wobbly stroke (deterministic formula, not random).
    const stroke: Point[] = Array.from({ length: 300 }, (_, i) => [i * 0.02, Math.sin(i * 0.07) * 0.8 + Math.sin(i * 0.9) * 0.03] as const);
    for (const tolerance of [0.01, 0.05, 0.2]) {
      const script = `
import json, sys
from shapely.geometry import LineString
d = json.load(sys.stdin)
print(json.dumps(list(LineString(d['points']).simplify(d['tol'], preserve_topology=False).coords)))`;
      const input = JSON.stringify({ points: stroke, tol: tolerance });
      const reference = JSON.parse(execFileSync('/usr/bin/python3', ['-c', script], { input }).toString()) as number[][];
      expect(simplifyPolyline(stroke, tolerance)).toEqual(reference);
    }
  });
});

describe('editor/smooth', () => {
  it('Chaikin cuts each segment at 1/4 and 3/4 and keeps the ends (Chaikin 1974)', () => {
    expect(chaikinSmooth([[0, 0], [4, 0], [4, 4]], 1)).toEqual([[0, 0], [1, 0], [3, 0], [4, 1], [4, 3], [4, 4]]);
  });

  it('Catmull–Rom passes through its points and reproduces a parabola (quadratic precision, from memory)', () => {
    const parabola: Point[] = [0, 1, 2, 3, 4].map((x) => [x, x * x] as const);
    const curve = catmullRomCurve(parabola, 4);
    parabola.forEach((p) => expect(curve).toContainEqual(p));
    // The middle span (1 → 2), evaluated at t = 1/2, lies on y = x² exactly: (1.5, 2.25).
    const mid = curve[4 + 2]!;
    expect(mid[0]).toBeCloseTo(1.5, 12);
    expect(mid[1]).toBeCloseTo(2.25, 12);
  });
});
