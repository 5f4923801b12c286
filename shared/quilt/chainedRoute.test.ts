import { beforeAll, describe, expect, it } from 'vitest';
import { designSchema, type Design } from '../design/design.schema.ts';
import type { LpSolver } from '../route/exact/lpSolver.ts';
import { loadHighsSolver } from '../route/exact/highsSolver.ts';
import { archRowsDesign, patchFillDesign } from '../testing/multiPieceDesigns.ts';
import type { LinkMetric } from './chain.ts';
import { placeChainedRoute, planPlacedPair, type ChainedBlockRoute } from './chainedRoute.ts';
import { CornerCostCache } from './cornerCostCache.ts';
import { blockRect, finishedSize } from './finishedSize.ts';
import { quiltSchema, type Quilt } from './quilt.schema.ts';
import { planQuiltRoute, type QuiltDesign } from './quiltRoute.ts';

let solver: LpSolver;
beforeAll(async () => {
  solver = await loadHighsSolver();
});

const oneLine: Design = designSchema.parse({ version: 1, units: 'in', width: 12, height: 12, seams: [], lines: [[[0, 6], [12, 6]]] });
// The same 12 in fill drawn in centimetres, to check the unit conversion on the map.
const fill = patchFillDesign(3, 2, 2);
const fillCm: Design = { ...fill, units: 'cm', width: 30.48, height: 30.48, lines: fill.lines.map((l) => l.map(([x, y]) => [x * 2.54, y * 2.54] as const)), seams: fill.seams.map((l) => l.map(([x, y]) => [x * 2.54, y * 2.54] as const)) };
const designs = new Map<string, QuiltDesign>([
  ['fill', { design: fillCm, revision: '1' }],
  ['arches', { design: archRowsDesign(4, 2, 3), revision: '1' }],
  ['line', { design: oneLine, revision: '1' }],
]);
const quilt: Quilt = quiltSchema.parse({
  version: 1,
  units: 'in',
  rows: 2,
  columns: 3,
  block: { width: 12, height: 12 },
  placements: [
    [{ designId: 'fill' }, { designId: 'line', rotation: 90 }, { designId: 'arches', rotation: 270 }],
    [{ designId: 'arches', mirror: true }, { designId: 'fill', rotation: 180, mirror: true }, { designId: 'line' }],
  ],
  sashing: 1.5,
  borders: [2, 1],
  order: { kind: 'serpentine' },
});

describe('placeChainedRoute', () => {
  for (const metric of ['straight', 'along-seams'] as LinkMetric[]) {
    it(`draws one unbroken thread per pass across the quilt, with the chain's travel (${metric} links)`, () => {
      const planned = planQuiltRoute(quilt, designs, new CornerCostCache(), { solver, metric });
      if (!planned.ok) throw new Error(planned.error.message);
      const { chain, budget } = planned.value;
      const blocks: ChainedBlockRoute[] = chain.steps.map((s) => {
        const placement = quilt.placements[s.cell.row]![s.cell.column]!;
        const design = designs.get(placement.designId)!.design;
        const plan = planPlacedPair(design, placement, s.entry, s.exit, { solver });
        if (!plan.ok) throw new Error(plan.error.message);
        expect(plan.value.optimal).toBe(true);
        return { design, orientation: placement, plan: plan.value };
      });
      const strokes = placeChainedRoute(quilt, chain, blocks, metric);
      // Geometry, independent of the DP: within a pass each stroke starts where the last one ended.
      for (let k = 1; k < strokes.length; k++) {
        if (strokes[k]!.pass !== strokes[k - 1]!.pass) continue;
        const end = strokes[k - 1]!.points.at(-1)!;
        const start = strokes[k]!.points[0]!;
        expect(Math.hypot(end[0] - start[0], end[1] - start[1])).toBeLessThan(1e-6);
      }
      // Every block stroke stays on its block; everything stays on the quilt.
      const size = finishedSize(quilt);
      for (const s of strokes) {
        for (const [x, y] of s.points) {
          expect(x).toBeGreaterThanOrEqual(-1e-9);
          expect(y).toBeLessThanOrEqual(size.height + 1e-9);
          if (s.kind === 'link') continue;
          const r = blockRect(quilt, chain.steps[s.step - 1]!.cell);
          expect(x).toBeGreaterThanOrEqual(r.x - 1e-6);
          expect(x).toBeLessThanOrEqual(r.x + r.width + 1e-6);
          expect(y).toBeGreaterThanOrEqual(r.y - 1e-6);
          expect(y).toBeLessThanOrEqual(r.y + r.height + 1e-6);
        }
      }
      // Travel drawn = the chain's total (proven pairs, equal weights); stitching and passes = the budget's.
      const travel = strokes.filter((s) => s.kind !== 'stitch').reduce((t, s) => t + s.length, 0);
      expect(travel).toBeCloseTo(chain.total, 6);
      expect(strokes.filter((s) => s.kind === 'stitch').reduce((t, s) => t + s.length, 0)).toBeCloseTo(budget.stitchLength, 6);
      expect(Math.max(...strokes.map((s) => s.pass))).toBe(budget.passes);
      expect(strokes.filter((s) => s.kind === 'link')).toHaveLength(chain.steps.length - 1);
    });
  }

  it('refuses routes that do not match the chain', () => {
    const planned = planQuiltRoute(quilt, designs, new CornerCostCache(), { solver });
    if (!planned.ok) throw new Error(planned.error.message);
    expect(() => placeChainedRoute(quilt, planned.value.chain, [])).toThrow(/quilt\/chainedRoute/);
  });
});
