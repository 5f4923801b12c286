// What the quilt page and the printed plan show from a quilt map and its designs' stored figures: the
// quilt-as-you-go trim table and the block-by-block budget. Pure.
import type { DesignSummary } from '../contract/figures.ts';
import { bindingAllowanceOf, type Quilt } from './quilt.schema.ts';
import { planQuiltBudget, type BlockFigures, type QuiltBudget } from './quiltBudget.ts';
import { planTrim, type BlockTrim, type TrimAssumption } from './trim.ts';
import { buildTrimTable, type TrimTableRow } from './trimTable.ts';

/** The quilt-as-you-go trim table, or the reason there is none (e.g. a margin too small for the shrinkage). */
export function trimTableOf(quilt: Quilt): { rows: TrimTableRow[]; assumptions: readonly TrimAssumption[] } | { problem: string } {
  const plan = planTrim(quilt, bindingAllowanceOf(quilt), quilt.trim);
  return plan.ok ? { rows: buildTrimTable(plan.value), assumptions: plan.value.assumptions } : { problem: plan.error.message };
}

/** Each placed block's trim by its position (for drawing on the map), or [] when the trim plan has a problem. */
export function trimBlocksOf(quilt: Quilt): readonly BlockTrim[] {
  const plan = planTrim(quilt, bindingAllowanceOf(quilt), quilt.trim);
  return plan.ok ? plan.value.blocks : [];
}

/**
 * The quilt budget from the placed designs' stored figures, each block quilted on its own (quilt-as-you-go; the
 * chained route is planned separately). Null until every placed design has figures; `missing` counts those without.
 */
export function budgetOf(quilt: Quilt, summaries: ReadonlyMap<string, DesignSummary | null>): { budget: QuiltBudget | null; missing: number } {
  const blocks: BlockFigures[] = [];
  let missing = 0;
  quilt.placements.forEach((cells, row) =>
    cells.forEach((p, column) => {
      if (!p) return;
      const s = summaries.get(p.designId);
      if (!s) {
        missing++;
        return;
      }
      blocks.push({ cell: { row, column }, units: s.units, stitchLength: s.stitchLength, travelLength: s.travelLength, passes: s.passes });
    }),
  );
  if (missing > 0 || blocks.length === 0) return { budget: null, missing };
  return { budget: planQuiltBudget(quilt.units, blocks, null, quilt.thread ?? {}), missing };
}
