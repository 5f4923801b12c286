import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import type { Point } from '../geometry/point.ts';
import { chainBlocksOf, planChain, type LinkMetric } from './chain.ts';
import { buildChainOverview } from './chainOverview.ts';
import { placeCornerCosts, type CornerCosts } from './cornerMap.ts';
import { rowOrder } from './order.ts';
import { makeQuilt, randomQuilt } from './testQuilts.ts';

const pathLength = (pts: readonly Point[]) => pts.slice(1).reduce((s, p, i) => s + Math.hypot(p[0] - pts[i]![0], p[1] - pts[i]![1]), 0);

describe('the chained route on the quilt map', () => {
  it('worked example: two 12 in blocks side by side with 2 in sashing, out at the top right, in at the next top left', () => {
    // Analytic: block 1 spans x 0–12, block 2 x 14–26; the link is the 2 in of sashing (as tests/api/quiltPlan.test.ts).
    const quilt = makeQuilt({ rows: 1, columns: 2, block: { width: 12, height: 12 }, sashing: 2 });
    const legs = buildChainOverview(quilt, [{ cell: { row: 0, column: 0 }, entry: 0, exit: 1 }, { cell: { row: 0, column: 1 }, entry: 0, exit: 1 }], 'straight');
    expect(legs.map((l) => [l.entry, l.exit])).toEqual([[[0, 0], [12, 0]], [[14, 0], [26, 0]]]);
    expect(legs[0]!.link).toEqual([]);
    expect(legs[1]!.link).toEqual([[12, 0], [14, 0]]);
    expect(legs[1]!.linkLength).toBe(2);
  });

  it('along the seams a link turns once, horizontally then vertically: 6 across and 6 down is 12, not 6√2', () => {
    const quilt = makeQuilt({ rows: 2, columns: 2, block: { width: 3, height: 3 } });
    const steps = [{ cell: { row: 0, column: 0 }, entry: 0 as const, exit: 0 as const }, { cell: { row: 1, column: 1 }, entry: 2 as const, exit: 2 as const }];
    // Exit (0, 0); entry at the bottom right of the 3 in block at (3, 3): (6, 6) — |dx| + |dy| = 12, straight 6√2.
    const seams = buildChainOverview(quilt, steps, 'along-seams');
    expect(seams[1]!.link).toEqual([[0, 0], [6, 0], [6, 6]]);
    expect(seams[1]!.linkLength).toBe(12);
    expect(buildChainOverview(quilt, steps, 'straight')[1]!.linkLength).toBeCloseTo(6 * Math.SQRT2, 12);
  });

  it('on random quilts the drawn links add up to the chain planner’s link travel, and each drawn path is as long as its link', () => {
    const table: CornerCosts = [
      [3, 1, 4, 1],
      [5, 9, 2, 6],
      [5, 3, 5, 8],
      [9, 7, 9, 3],
    ];
    fc.assert(
      fc.property(fc.integer(), fc.constantFrom<LinkMetric>('straight', 'along-seams'), (seed, metric) => {
        const quilt = randomQuilt(seed, 3, 3);
        const cells = rowOrder(quilt);
        const chain = planChain(chainBlocksOf(quilt, cells, (p) => placeCornerCosts(table, p)), metric);
        const legs = buildChainOverview(quilt, chain.steps, metric);
        expect(legs.reduce((s, l) => s + l.linkLength, 0)).toBeCloseTo(chain.linkTravel, 9);
        legs.forEach((l, i) => {
          expect(l.linkLength).toBeCloseTo(chain.steps[i]!.linkBefore, 9);
          expect(pathLength(l.link)).toBeCloseTo(l.linkLength, 9);
        });
      }),
      { numRuns: 60 },
    );
  });
});
