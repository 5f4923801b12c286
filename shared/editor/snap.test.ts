import { describe, expect, it } from 'vitest';
import { collectSnapTargets, snapPoint } from './snap.ts';
import { extensionGuide, halfwayGuide, projectOntoGuide } from './guides.ts';

// A nine-patch's seams on a 12 in block plus one quilting diagonal.
const design = {
  width: 12, height: 12,
  seams: [[[4, 0], [4, 12]], [[8, 0], [8, 12]], [[0, 4], [12, 4]], [[0, 8], [12, 8]]] as const,
  lines: [[[0, 0], [12, 12]]] as const,
};

describe('editor/snap', () => {
  const targets = collectSnapTargets(design);

  it('finds seam crossings, seam ends, and midpoints', () => {
    const crossings = targets.filter((t) => t.kind === 'crossing').map((t) => t.point);
    // Four seam crossings; the diagonal y = x meets the seams only at (4,4) and (8,8).
    expect(crossings).toContainEqual([4, 8]);
    expect(crossings).toContainEqual([8, 4]);
    expect(crossings.filter((p) => p[0] === 4 && p[1] === 4).length).toBeGreaterThanOrEqual(1);
    expect(targets).toContainEqual({ point: [4, 6], kind: 'midpoint' });
  });

  it('snaps to the nearest target within the radius, else to the grid, else not at all', () => {
    expect(snapPoint([4.05, 7.97], targets, { radius: 0.1 })).toEqual({ point: [4, 8], kind: 'crossing' });
    // The diagonal's end coincides with the block corner; a line end ranks first.
    expect(snapPoint([0.02, 0.01], targets, { radius: 0.1 })).toEqual({ point: [0, 0], kind: 'end' });
    expect(snapPoint([11.98, 0.01], targets, { radius: 0.1 })).toEqual({ point: [12, 0], kind: 'corner' });
    expect(snapPoint([2.3, 5.2], targets, { radius: 0.1, gridPitch: 0.125 })).toEqual({ point: [2.25, 5.25], kind: 'grid' });
    expect(snapPoint([2.3, 5.2], targets, { radius: 0.1 })).toEqual({ point: [2.3, 5.2], kind: 'none' });
  });
});

describe('editor/guides', () => {
  it('puts the halfway guide on the centre line of two parallel seams, whatever their direction', () => {
    expect(halfwayGuide([[4, 0], [4, 12]], [[8, 12], [8, 0]])).toEqual([[6, 0], [6, 12]]);
  });

  it('extends a seam across the block', () => {
    const g = extensionGuide([[4, 4], [5, 5]], 12, 12)!;
    expect(g[0][0]).toBeCloseTo(0, 12);
    expect(g[1][0]).toBeCloseTo(12, 12);
    expect(g[1][1]).toBeCloseTo(12, 12);
    expect(extensionGuide([[4, 4], [4, 4]], 12, 12)).toBeNull();
    expect(projectOntoGuide([0, 2], [[0, 0], [2, 2]])).toEqual([1, 1]);
  });
});
