import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { chainBlocksOf, chainOf, linkLength, planChain, type ChainBlock, type LinkMetric } from './chain.ts';
import { placeCornerCosts, type Corner, type CornerCosts } from './cornerMap.ts';
import { rowOrder, serpentineOrder } from './order.ts';
import { quiltArb, makeQuilt } from './testQuilts.ts';

/**
 * Brute force, the outside check for the DP: every choice of (entry, exit) for every block, 16^n chains, summed
 * directly as Σ block costs + Σ straight or along-seam links. Exhaustive depth-first enumeration, no pruning.
 */
function bruteForce(blocks: readonly ChainBlock[], metric: LinkMetric): number {
  let best = Infinity;
  const walk = (i: number, prevExit: Corner | null, sum: number): void => {
    if (i === blocks.length) {
      if (sum < best) best = sum;
      return;
    }
    const b = blocks[i]!;
    for (let e = 0; e < 4; e++) {
      const link = prevExit === null ? 0 : linkLength(blocks[i - 1]!.corners[prevExit]!, b.corners[e]!, metric);
      for (let x = 0; x < 4; x++) walk(i + 1, x as Corner, sum + link + b.costs[e]![x]!);
    }
  };
  walk(0, null, 0);
  return best;
}

const costTableArb: fc.Arbitrary<CornerCosts> = fc.array(fc.array(fc.integer({ min: 0, max: 400 }).map((k) => k / 8), { minLength: 4, maxLength: 4 }), { minLength: 4, maxLength: 4 });

/** Random quilts up to 2 × 3 with random order (rows or serpentine) and a random cost table per design. */
const caseArb = fc.record({
  quilt: quiltArb(2, 3),
  tables: fc.array(costTableArb, { minLength: 6, maxLength: 6 }),
  serpentine: fc.boolean(),
  metric: fc.constantFrom<LinkMetric>('straight', 'along-seams'),
});

function blocksOf(c: fc.Infer<typeof caseArb>): ChainBlock[] {
  const cells = c.serpentine ? serpentineOrder(c.quilt) : rowOrder(c.quilt);
  return chainBlocksOf(c.quilt, cells, (p, cell) => placeCornerCosts(c.tables[cell.row * 3 + cell.column]!, p));
}

describe('planChain', () => {
  it('equals brute force over all corner choices on random quilts up to 2 × 3', () => {
    fc.assert(
      fc.property(caseArb, (c) => {
        const blocks = blocksOf(c);
        expect(planChain(blocks, c.metric).total).toBeCloseTo(bruteForce(blocks, c.metric), 9);
      }),
      { numRuns: 60 },
    );
  });

  it('its total is the chosen block costs plus the links, recomputed from the corners', () => {
    fc.assert(
      fc.property(caseArb, (c) => {
        const blocks = blocksOf(c);
        const chain = planChain(blocks, c.metric);
        const again = chainOf(blocks, chain.steps.map((s) => s.entry), chain.steps.map((s) => s.exit), c.metric);
        const sum = chain.steps.reduce((s, t, i) => s + blocks[i]!.costs[t.entry]![t.exit]! + (i === 0 ? 0 : linkLength(blocks[i - 1]!.corners[chain.steps[i - 1]!.exit]!, blocks[i]!.corners[t.entry]!, c.metric)), 0);
        expect(chain.total).toBeCloseTo(sum, 9);
        expect(chain.total).toBeCloseTo(again.total, 9);
        expect(chain.blockTravel + chain.linkTravel).toBeCloseTo(chain.total, 9);
      }),
    );
  });

  it('worked by hand: two 12 in blocks side by side with 2 in sashing, each cheap only from its left to its right edge', () => {
    // Cost 0 from top-left to top-right, 100 otherwise. The best chain enters block 1 top-left, leaves top-right,
    // crosses the 2 in sashing to block 2's top-left and leaves at its top-right: total = 2 (one link).
    const table = [0, 1, 2, 3].map((e) => [0, 1, 2, 3].map((x) => (e === 0 && x === 1 ? 0 : 100)));
    const q = makeQuilt({ rows: 1, columns: 2, sashing: 2 });
    const chain = planChain(chainBlocksOf(q, rowOrder(q), () => table));
    expect(chain.steps.map((s) => [s.entry, s.exit])).toEqual([[0, 1], [0, 1]]);
    expect(chain.total).toBe(2);
    expect(chain.linkTravel).toBe(2);
  });

  it('a turned placement is read through the corner map: a half-turned block is cheap from bottom-right to bottom-left', () => {
    const table = [0, 1, 2, 3].map((e) => [0, 1, 2, 3].map((x) => (e === 0 && x === 1 ? 0 : 100)));
    const q = makeQuilt({ rows: 1, columns: 1 });
    const chain = planChain(chainBlocksOf(q, rowOrder(q), () => placeCornerCosts(table, { rotation: 180, mirror: false })));
    expect(chain.steps.map((s) => [s.entry, s.exit])).toEqual([[2, 3]]);
    expect(chain.total).toBe(0);
  });

  it('an empty quilt has an empty chain; a broken table throws', () => {
    expect(planChain([]).total).toBe(0);
    const q = makeQuilt({ rows: 1, columns: 1 });
    expect(() => planChain(chainBlocksOf(q, rowOrder(q), () => [[1]]))).toThrow(/quilt\/cornerMap/);
  });
});
