import { describe, expect, it } from 'vitest';
import { allocateStops } from './allocateStops.ts';

describe('allocateStops (sharing extra stops among groups, worked by hand)', () => {
  it('gives each stop where it saves the most, never more stops than allowed', () => {
    // Group A saves 5 with its first stop and 1 with its second; group B saves 3 with its first.
    const cost = [
      [10, 5, 4, 4],
      [7, 4, 4, 4],
    ];
    expect(allocateStops(cost, 0)).toEqual({ stops: [0, 0], total: 17 });
    expect(allocateStops(cost, 1)).toEqual({ stops: [1, 0], total: 12 });
    expect(allocateStops(cost, 2)).toEqual({ stops: [1, 1], total: 9 });
    expect(allocateStops(cost, 3)).toEqual({ stops: [2, 1], total: 8 });
  });

  it('does not spend a stop that saves nothing (ties go to fewer stops)', () => {
    expect(allocateStops([[3, 3, 3, 3]], 3)).toEqual({ stops: [0], total: 3 });
  });
});
