import { describe, expect, it } from 'vitest';
import { orientOwnRoute, pickLine } from './pickLine.ts';

describe('editor/pickLine: picking lines', () => {
  const design = { seams: [[[0, 6], [12, 6]] as const], lines: [[[0, 0], [12, 12]] as const, [[1, 6.1], [11, 6.1]] as const] };

  it('finds the nearest line within the radius, with the foot of the perpendicular', () => {
    // Distance from (6, 5) to the diagonal y = x is |6 − 5| / √2 (point–line distance formula).
    const hit = pickLine(design, [6, 5], 1)!;
    expect(hit.target).toBe('lines');
    expect(hit.index).toBe(0);
    expect(hit.distance).toBeCloseTo(1 / Math.SQRT2, 12);
    expect(hit.point[0]).toBeCloseTo(5.5, 12);
    expect(pickLine(design, [6, 5], 0.5)).toBeNull();
  });

  it('prefers the nearer of a quilting line and a seam', () => {
    expect(pickLine(design, [2, 6.02], 0.5)!.target).toBe('seams');
    expect(pickLine(design, [2, 6.08], 0.5)!.target).toBe('lines');
    expect(pickLine(design, [2, 6.02], 0.5, ['lines'])!.index).toBe(1);
  });
});

describe('editor/pickLine: own stitching order', () => {
  it('runs each line from the end nearest the previous line', () => {
    const route = orientOwnRoute([
      [[0, 0], [4, 0]],
      [[4, 4], [4, 0]],
      [[0, 4], [4, 4]],
    ]);
    expect(route).toEqual([
      [[0, 0], [4, 0]],
      [[4, 0], [4, 4]],
      [[4, 4], [0, 4]],
    ]);
  });

  it('turns the first line round when the second starts at its start', () => {
    expect(orientOwnRoute([[[4, 0], [0, 0]], [[4, 0], [4, 4]]])[0]).toEqual([[0, 0], [4, 0]]);
  });
});
