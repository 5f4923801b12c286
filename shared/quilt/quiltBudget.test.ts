import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { computeThreadBudget, THREAD_DEFAULTS } from '../route/threadBudget.ts';
import type { QuiltChain } from './chain.ts';
import { planQuiltBudget, type BlockFigures } from './quiltBudget.ts';

const cell = (i: number) => ({ row: 0, column: i });
const chainOf = (links: number[]): QuiltChain => ({
  steps: links.map((j, i) => ({ cell: cell(i), entry: 0, exit: 1, blockCost: 0, linkBefore: j })),
  blockTravel: 0,
  linkTravel: links.reduce((s, j) => s + j, 0),
  total: links.reduce((s, j) => s + j, 0),
});

const figuresArb = fc.array(
  fc.record({ stitch: fc.integer({ min: 10, max: 400 }), travel: fc.integer({ min: 0, max: 60 }), passes: fc.integer({ min: 1, max: 4 }), cm: fc.boolean() }),
  { minLength: 1, maxLength: 12 },
);
const toFigures = (list: fc.Infer<typeof figuresArb>): BlockFigures[] =>
  list.map((f, i) => ({ cell: cell(i), units: f.cm ? 'cm' : 'in', stitchLength: f.cm ? f.stitch * 2.54 : f.stitch, travelLength: f.cm ? f.travel * 2.54 : f.travel, passes: f.passes }));

describe('planQuiltBudget', () => {
  it('quilt-as-you-go: the quilt is the blocks summed (passes, lengths, thread to stitch rounding)', () => {
    fc.assert(
      fc.property(figuresArb, (list) => {
        const blocks = toFigures(list);
        const q = planQuiltBudget('in', blocks, null);
        expect(q.passes).toBe(list.reduce((s, f) => s + f.passes, 0));
        expect(q.stitchLength).toBeCloseTo(list.reduce((s, f) => s + f.stitch, 0), 9);
        const sum = q.blocks.reduce((s, b) => s + b.budget.topThreadYards, 0);
        // Each block's stitch count is rounded on its own: at most half a stitch each, times the sandwich thickness.
        const rounding = (list.length * 0.5 * THREAD_DEFAULTS.sandwichThickness.value) / 36;
        expect(Math.abs(q.total.topThreadYards - sum)).toBeLessThanOrEqual(rounding + 1e-9);
        expect(Math.abs(q.total.stitchCount - q.blocks.reduce((s, b) => s + b.budget.stitchCount, 0))).toBeLessThanOrEqual(list.length / 2 + 1);
      }),
    );
  });

  it('chained: the links are added as sewn travel and each link saves one tie-off at each end of the thread', () => {
    fc.assert(
      fc.property(figuresArb, fc.array(fc.integer({ min: 0, max: 40 }), { minLength: 12, maxLength: 12 }), (list, lengths) => {
        const blocks = toFigures(list);
        const links = lengths.slice(0, list.length).map((j, i) => (i === 0 ? 0 : j));
        const alone = planQuiltBudget('in', blocks, null, { tieOffTail: 4 });
        const q = planQuiltBudget('in', blocks, chainOf(links), { tieOffTail: 4 });
        const linkTotal = links.reduce((s, j) => s + j, 0);
        expect(q.passes).toBe(alone.passes - (list.length - 1));
        expect(q.stops).toBe(q.passes - 1);
        expect(q.travelLength).toBeCloseTo(alone.travelLength + linkTotal, 9);
        const linkYards = computeThreadBudget(linkTotal, 0, 'in', { tieOffTail: 4 }).topThreadYards;
        const savedYards = ((list.length - 1) * 2 * 4) / 36;
        const rounding = ((list.length + 1) * 0.5 * THREAD_DEFAULTS.sandwichThickness.value) / 36;
        expect(Math.abs(q.total.topThreadYards - (alone.total.topThreadYards + linkYards - savedYards))).toBeLessThanOrEqual(rounding + 1e-9);
      }),
    );
  });

  it('worked by hand: two 12 in blocks, 100 in stitched + 10 in travel each, one 2 in link, 10 SPI, no tails', () => {
    // Sewn: 2 × 110 + 2 = 222 in → 2,220 stitches; thread per side 222 + 2,220 × 1/16 = 360.75 in = 10.02 yd.
    const blocks: BlockFigures[] = [0, 1].map((i) => ({ cell: cell(i), units: 'in', stitchLength: 100, travelLength: 10, passes: 1 }));
    const q = planQuiltBudget('in', blocks, chainOf([0, 2]), { spi: 10, tieOffTail: 0 });
    expect(q.total.stitchCount).toBe(2220);
    expect(q.total.topThreadYards).toBeCloseTo(360.75 / 36, 12);
    expect(q.passes).toBe(1);
    expect(q.total.assumptions.find((a) => a.setting === 'model')!.source).toMatch(/geometric derivation/);
    expect(q.linkModel).toMatch(/^ours/);
  });

  it('refuses a chain that does not match the blocks', () => {
    const blocks: BlockFigures[] = [{ cell: cell(0), units: 'in', stitchLength: 1, travelLength: 0, passes: 1 }];
    expect(() => planQuiltBudget('in', blocks, chainOf([0, 1]))).toThrow(/quilt\/quiltBudget/);
  });
});
