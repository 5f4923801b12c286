import { describe, expect, it } from 'vitest';
import { closestParameter, pointSegmentDistance } from './distance.ts';

describe('geometry/distance', () => {
  it('measures to the interior, the ends and a degenerate segment', () => {
    expect(pointSegmentDistance([5, 3], [0, 0], [10, 0])).toBe(3);
    expect(pointSegmentDistance([-3, 4], [0, 0], [10, 0])).toBe(5);
    expect(pointSegmentDistance([13, 4], [0, 0], [10, 0])).toBe(5);
    expect(pointSegmentDistance([3, 4], [0, 0], [0, 0])).toBe(5);
  });
  it('finds the distance from the origin to the line x + y = 2 as √2 (analytic |c|/√(a²+b²))', () => {
    expect(pointSegmentDistance([0, 0], [2, 0], [0, 2])).toBeCloseTo(Math.SQRT2, 15);
    expect(closestParameter([0, 0], [2, 0], [0, 2])).toBeCloseTo(0.5, 15);
  });
  it('clamps the parameter', () => {
    expect(closestParameter([-1, 0], [0, 0], [1, 0])).toBe(0);
    expect(closestParameter([9, 9], [0, 0], [1, 0])).toBe(1);
    expect(closestParameter([9, 9], [1, 1], [1, 1])).toBe(0);
  });
});
