import { describe, expect, it } from 'vitest';
import { bboxesOverlap, bboxOfPoints, expandBBox } from './bbox.ts';

describe('geometry/bbox', () => {
  it('bounds points', () => {
    expect(bboxOfPoints([[1, 5], [-2, 3], [4, -1]])).toEqual({ minX: -2, minY: -1, maxX: 4, maxY: 5 });
    expect(() => bboxOfPoints([])).toThrow(/geometry\/bbox/);
  });
  it('expands and tests overlap (closed boxes touch)', () => {
    const a = bboxOfPoints([[0, 0], [1, 1]]);
    expect(expandBBox(a, 0.5)).toEqual({ minX: -0.5, minY: -0.5, maxX: 1.5, maxY: 1.5 });
    expect(bboxesOverlap(a, bboxOfPoints([[1, 1], [2, 2]]))).toBe(true);
    expect(bboxesOverlap(a, bboxOfPoints([[1.01, 0], [2, 2]]))).toBe(false);
  });
});
