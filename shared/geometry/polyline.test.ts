import { describe, expect, it } from 'vitest';
import { dropRepeatedPoints, polylineLength, reversePolyline } from './polyline.ts';

describe('geometry/polyline', () => {
  it('measures a 12 in square outline as 48 (perimeter 4a, analytic)', () => {
    expect(polylineLength([[0, 0], [12, 0], [12, 12], [0, 12], [0, 0]])).toBe(48);
  });
  it('measures a unit-step staircase and a 3-4-5 leg', () => {
    expect(polylineLength([[0, 0], [3, 4], [3, 4], [6, 8]])).toBe(10);
    expect(polylineLength([[0, 0]])).toBe(0);
  });
  it('drops repeats and reverses', () => {
    expect(dropRepeatedPoints([[0, 0], [0, 0], [1, 0], [1, 0], [0, 0]])).toEqual([[0, 0], [1, 0], [0, 0]]);
    expect(reversePolyline([[0, 0], [1, 2]])).toEqual([[1, 2], [0, 0]]);
  });
});
