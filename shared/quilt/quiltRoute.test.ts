import { beforeAll, describe, expect, it } from 'vitest';
import { designSchema, type Design } from '../design/design.schema.ts';
import type { LpSolver } from '../route/exact/lpSolver.ts';
import { loadHighsSolver } from '../route/exact/highsSolver.ts';
import { archRowsDesign, patchFillDesign } from '../testing/multiPieceDesigns.ts';
import { chainBlocksOf, linkLength, planChain } from './chain.ts';
import { placeCornerCosts } from './cornerMap.ts';
import { buildCornerCosts, costTableOf } from './cornerCosts.ts';
import { CornerCostCache } from './cornerCostCache.ts';
import { blockCorners } from './finishedSize.ts';
import { quiltSchema, type Quilt } from './quilt.schema.ts';
import { checkQuiltDesigns, finishQuiltRoute, fits, pairsToProve, planQuiltRoute, type QuiltDesign } from './quiltRoute.ts';

let solver: LpSolver;
beforeAll(async () => {
  solver = await loadHighsSolver();
});

const oneLine: Design = designSchema.parse({ version: 1, units: 'in', width: 12, height: 12, seams: [], lines: [[[0, 6], [12, 6]]] });
const designs = new Map<string, QuiltDesign>([
  ['fill', { design: patchFillDesign(3, 2, 2), revision: '1' }],
  ['arches', { design: archRowsDesign(4, 2, 3), revision: '1' }],
  ['line', { design: oneLine, revision: '1' }],
]);

const quilt: Quilt = quiltSchema.parse({
  version: 1,
  units: 'in',
  rows: 2,
  columns: 2,
  block: { width: 12, height: 12 },
  placements: [
    [{ designId: 'fill' }, { designId: 'line', rotation: 90 }],
    [{ designId: 'arches', mirror: true }, { designId: 'fill', rotation: 180 }],
  ],
  sashing: 2,
  borders: [3],
  order: { kind: 'serpentine' },
});

describe('planQuiltRoute', () => {
  it('plans each design once, chains the blocks in the quilt order and totals the quilt from the chosen pairs', () => {
    const cache = new CornerCostCache();
    const progress: [number, number][] = [];
    const r = planQuiltRoute(quilt, designs, cache, { solver, onProgress: (d, t) => progress.push([d, t]) });
    if (!r.ok) throw new Error(r.error.message);
    const { order, chain, budget } = r.value;
    expect(order).toEqual([{ row: 0, column: 0 }, { row: 0, column: 1 }, { row: 1, column: 1 }, { row: 1, column: 0 }]);
    // Three designs × 10 pairs from the heuristic first, then the pairs the exact search proves, one at a time.
    expect(progress[29]).toEqual([30, 30]);
    progress.forEach(([d], k) => expect(d).toBe(k + 1));
    expect(progress.at(-1)![0]).toBe(progress.at(-1)![1]);
    expect(r.value.lowerBound).toBeCloseTo(chain.total, 9);
    // Links recomputed from the chosen corners and the quilt map.
    let links = 0;
    for (let i = 1; i < chain.steps.length; i++) {
      links += linkLength(blockCorners(quilt, chain.steps[i - 1]!.cell)[chain.steps[i - 1]!.exit]!, blockCorners(quilt, chain.steps[i]!.cell)[chain.steps[i]!.entry]!, 'straight');
    }
    expect(chain.linkTravel).toBeCloseTo(links, 9);
    // The chain runs the thread on: the blocks' passes less one per link.
    const passesOf = (cell: { row: number; column: number }): number => {
      const p = quilt.placements[cell.row]![cell.column]!;
      const own = cache.design(p.designId, '1', () => {
        throw new Error('should be cached');
      });
      return own.ok ? own.value.pairs[0]![0]!.passes : NaN;
    };
    expect(budget.passes).toBe(order.reduce((s, c) => s + passesOf(c), 0) - 3);
    expect(budget.linkLength).toBeCloseTo(chain.linkTravel, 9);
    expect(budget.travelLength).toBeCloseTo(chain.total, 6); // equal travel weights: cost = length
    // Re-planning from the cache plans nothing.
    const again: number[] = [];
    const second = planQuiltRoute(quilt, designs, cache, { solver, onProgress: (d) => again.push(d) });
    expect(again).toEqual([]);
    expect(second.ok && second.value.chain.total).toBeCloseTo(chain.total, 12);
  });

  it('proves only the pairs the chain needs, and finds the same least total as fully proven tables', () => {
    const cache = new CornerCostCache();
    let plans = 0;
    const r = planQuiltRoute(quilt, designs, cache, { solver, onProgress: () => plans++ });
    if (!r.ok) throw new Error(r.error.message);
    // Reference: every design's 10 pairs planned exactly, the chain over those tables.
    const full = new Map([...designs].map(([id, d]) => {
      const t = buildCornerCosts(d.design, { solver });
      if (!t.ok) throw new Error(t.error.message);
      expect(t.value.pairs.every((row) => row.every((p) => p.optimal))).toBe(true);
      return [id, t.value] as const;
    }));
    const reference = planChain(chainBlocksOf(quilt, r.value.order, (p) => placeCornerCosts(costTableOf(full.get(p.designId)!), p)));
    expect(r.value.chain.total).toBeCloseTo(reference.total, 9);
    expect(r.value.lowerBound).toBeCloseTo(reference.total, 9);
    const searched = [...designs.keys()].flatMap((id) => {
      const t = cache.design(id, '1', () => {
        throw new Error('should be cached');
      });
      return t.ok ? t.value.pairs.flat() : [];
    });
    expect(plans - 30).toBe(new Set(searched.filter((p) => p.searched)).size);
  });

  it('step by step (as a worker pool would run it): no pair is left to prove once every table is proven', () => {
    const cache = new CornerCostCache();
    const checked = checkQuiltDesigns(quilt, designs);
    if (!checked.ok) throw new Error(checked.error.message);
    for (const [id, d] of designs) cache.design(id, d.revision, () => buildCornerCosts(d.design, { solver }));
    const tableOf = (id: string) => {
      const t = cache.design(id, '1', () => {
        throw new Error('should be cached');
      });
      if (!t.ok) throw new Error('unexpected');
      return t.value;
    };
    const round = pairsToProve(quilt, checked.value, tableOf, 'straight');
    expect(round.pairs).toEqual([]);
    const route = finishQuiltRoute(quilt, checked.value, designs, cache, 'straight', round.bound);
    expect(route.chain.total).toBeCloseTo(round.bound.total, 9);
    expect(route.lowerBound).toBe(round.bound.total);
  });

  it('refuses a design that does not fill its cell, a missing design, and a broken hand order', () => {
    const cache = new CornerCostCache();
    const small = new Map(designs).set('line', { design: { ...oneLine, width: 10 }, revision: '1' });
    const kind = (q: Quilt, d: ReadonlyMap<string, QuiltDesign>) => {
      const r = planQuiltRoute(q, d, cache);
      return r.ok ? 'ok' : r.error.kind;
    };
    expect(kind(quilt, small)).toBe('block-size');
    const missing = new Map(designs);
    missing.delete('arches');
    expect(kind(quilt, missing)).toBe('missing-design');
    expect(kind({ ...quilt, order: { kind: 'hand', cells: [{ row: 0, column: 0 }] } }, designs)).toBe('order');
  });

  it('fits: a 30.48 cm block fills a 12 in cell; a 12 × 10 in block fits a 10 × 12 cell only turned a quarter', () => {
    expect(fits({ units: 'in', block: { width: 12, height: 12 } }, { units: 'cm', width: 30.48, height: 30.48 }, { rotation: 0, mirror: false })).toBe(true);
    const cell = { units: 'in' as const, block: { width: 10, height: 12 } };
    expect(fits(cell, { units: 'in', width: 12, height: 10 }, { rotation: 0, mirror: false })).toBe(false);
    expect(fits(cell, { units: 'in', width: 12, height: 10 }, { rotation: 270, mirror: true })).toBe(true);
  });
});
