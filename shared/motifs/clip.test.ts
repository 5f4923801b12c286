import { execFileSync } from 'node:child_process';
import { describe, expect, it } from 'vitest';
import { polylineLength } from '../geometry/polyline.ts';
import type { Point, Polyline } from '../geometry/point.ts';
import { clipPolyline } from './clip.ts';

const square: Point[] = [[0, 0], [4, 0], [4, 4], [0, 4]];
// An L-shaped (non-convex) patch.
const ell: Point[] = [[0, 0], [4, 0], [4, 1], [1, 1], [1, 4], [0, 4]];

describe('motifs/clip: worked examples', () => {
  it('cuts a line crossing a square at the outline', () => {
    expect(clipPolyline([[-1, 2], [5, 2]], square)).toEqual([[[0, 2], [4, 2]]]);
  });

  it('keeps a line inside whole, drops one outside', () => {
    const inside: Polyline = [[1, 1], [2, 3], [3, 1]];
    expect(clipPolyline(inside, square)).toEqual([inside]);
    expect(clipPolyline([[5, 5], [6, 7]], square)).toEqual([]);
  });

  it('keeps a piece along the outline (closed set)', () => {
    expect(clipPolyline([[-1, 0], [5, 0]], square)).toEqual([[[0, 0], [4, 0]]]);
  });

  it('splits a line that leaves and re-enters a non-convex patch', () => {
    // The horizontal y = 2 meets the L only in its upright arm, x ∈ [0, 1].
    expect(clipPolyline([[-1, 2], [5, 2]], ell)).toEqual([[[0, 2], [1, 2]]]);
    // The diagonal x + y = 3.5 crosses the upright arm, leaves through the notch, and crosses the foot.
    const pieces = clipPolyline([[-0.5, 4], [4, -0.5]], ell);
    expect(pieces.length).toBe(2);
    const near = (a: Polyline, b: Polyline) => a.every((p, i) => Math.hypot(p[0] - b[i]![0], p[1] - b[i]![1]) < 1e-12);
    expect(near(pieces[0]!, [[0, 3.5], [1, 2.5]])).toBe(true);
    expect(near(pieces[1]!, [[2.5, 1], [3.5, 0]])).toBe(true);
  });
});

describe('motifs/clip against Shapely (independent reference library)', () => {
  it('gives the same clipped lengths as Shapely LineString ∩ Polygon', () => {
    const cases: { line: Polyline; polygon: Point[] }[] = [];
    for (let i = 0; i < 40; i++) {
      const a = (i * 0.37) % 5;
      cases.push({ line: [[-1, a], [2.5, 5 - a], [4.5, a / 2], [0.3, 0.2 + a / 3]], polygon: ell });
      cases.push({ line: [[a - 0.5, -0.5], [4.5 - a / 2, 4.5]], polygon: [[0, 0], [4, 1], [3, 4], [2, 2], [0.5, 3]] });
    }
    const script = `
import json, sys
from shapely.geometry import Polygon, LineString
print(json.dumps([Polygon(c['polygon']).intersection(LineString(c['line'])).length for c in json.load(sys.stdin)]))`;
    const expected = JSON.parse(execFileSync('/usr/bin/python3', ['-c', script], { input: JSON.stringify(cases) }).toString()) as number[];
    cases.forEach((c, i) => {
      const ours = clipPolyline(c.line, c.polygon).reduce((s, piece) => s + polylineLength(piece), 0);
      expect(ours).toBeCloseTo(expected[i]!, 9);
    });
  });
});
