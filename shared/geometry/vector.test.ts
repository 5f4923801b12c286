import { describe, expect, it } from 'vitest';
import { add, cross, distance, distanceSquared, dot, isFinitePoint, lerp, scale, subtract } from './vector.ts';

describe('geometry/vector', () => {
  it('does vector arithmetic', () => {
    expect(add([1, 2], [3, 4])).toEqual([4, 6]);
    expect(subtract([1, 2], [3, 5])).toEqual([-2, -3]);
    expect(scale([1, -2], 3)).toEqual([3, -6]);
    expect(dot([1, 2], [3, 4])).toBe(11);
    expect(cross([1, 0], [0, 1])).toBe(1);
    expect(lerp([0, 0], [10, 20], 0.25)).toEqual([2.5, 5]);
  });
  it('measures the 3-4-5 right triangle (Pythagoras)', () => {
    expect(distance([1, 1], [4, 5])).toBe(5);
    expect(distanceSquared([1, 1], [4, 5])).toBe(25);
  });
  it('spots non-finite points', () => {
    expect(isFinitePoint([0, 1])).toBe(true);
    expect(isFinitePoint([Number.NaN, 1])).toBe(false);
    expect(isFinitePoint([0, Number.POSITIVE_INFINITY])).toBe(false);
  });
});
