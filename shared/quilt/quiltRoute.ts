import type { Design } from '../design/design.schema.ts';
import type { DesignProblem } from '../graph/designProblem.ts';
import { err, ok, type Result } from '../result.ts';
import { chainBlocksOf, planChain, type LinkMetric, type QuiltChain } from './chain.ts';
import { placedSize } from './cornerMap.ts';
import { buildCornerCosts, pairPlanOf, unitScale, type CornerCostCache, type CornerCostOptions } from './cornerCosts.ts';
import { orderCells, type HandOrderProblem } from './order.ts';
import type { Cell, Orientation, Placement, Quilt } from './quilt.schema.ts';
import { figuresOfPair, planQuiltBudget, type QuiltBudget } from './quiltBudget.ts';

/** A placed design as the server hands it over: the validated design and the revision its cached costs belong to. */
export interface QuiltDesign {
  readonly design: Design;
  readonly revision: string;
}

export type QuiltRouteProblem =
  | { readonly kind: 'order'; readonly problem: HandOrderProblem; readonly message: string }
  | { readonly kind: 'missing-design'; readonly cell: Cell; readonly designId: string; readonly message: string }
  | { readonly kind: 'block-size'; readonly cell: Cell; readonly designId: string; readonly message: string }
  | { readonly kind: 'design'; readonly cell: Cell; readonly designId: string; readonly problem: DesignProblem; readonly message: string };

export interface QuiltRoute {
  readonly order: readonly Cell[];
  readonly chain: QuiltChain;
  readonly budget: QuiltBudget;
}

export interface QuiltRouteOptions extends Omit<CornerCostOptions, 'onPlanned'> {
  readonly metric?: LinkMetric;
  /** Corner-pair plans done and to do (16 per design revision not in the cache yet), for a progress bar. */
  readonly onProgress?: (done: number, total: number) => void;
}

/** How far a design's placed size may differ from the quilt's block size: 1/64 in (the trim check's tolerance). */
export const FIT_TOLERANCE_IN = 1 / 64;

/**
 * Plans a quilt's chained route: the quilting order, each placed design's 16 corner-pair costs (from the cache, or
 * planned once per design revision), the chain over the order (planChain), and the whole quilt's budget from the
 * chosen corner pairs' plans plus the links. Every placed design must fill its cell: its size, turned as placed and
 * in the quilt's units, equals the quilt's block size within 1/64 in.
 */
export function planQuiltRoute(quilt: Quilt, designs: ReadonlyMap<string, QuiltDesign>, cache: CornerCostCache, options: QuiltRouteOptions = {}): Result<QuiltRoute, QuiltRouteProblem> {
  const ordered = orderCells(quilt, quilt.order);
  if (!ordered.ok) return err({ kind: 'order', problem: ordered.error, message: ordered.error.message });
  const order = ordered.value;
  const placements = order.map((cell) => ({ cell, placement: quilt.placements[cell.row]![cell.column]! }));
  for (const { cell, placement } of placements) {
    const found = designs.get(placement.designId);
    if (!found) return err({ kind: 'missing-design', cell, designId: placement.designId, message: `The design at ${where(cell)} is not available.` });
    if (!fits(quilt, found.design, placement)) {
      return err({ kind: 'block-size', cell, designId: placement.designId, message: `The design at ${where(cell)} is not ${quilt.block.width} × ${quilt.block.height} ${quilt.units} as placed.` });
    }
  }
  const uncached = new Set(placements.map((p) => p.placement.designId).filter((id) => !cache.has(id, designs.get(id)!.revision)));
  const total = 16 * uncached.size;
  let done = 0;
  const { metric, onProgress, ...planOptions } = options;
  const costOf = (placement: Placement) => {
    const { design, revision } = designs.get(placement.designId)!;
    return cache.placedCosts(placement.designId, revision, placement, quilt.units, () =>
      buildCornerCosts(design, {
        ...planOptions,
        onPlanned: () => onProgress?.(++done, total),
      }),
    );
  };
  for (const { cell, placement } of placements) {
    const r = costOf(placement);
    if (!r.ok) return err({ kind: 'design', cell, designId: placement.designId, problem: r.error, message: `The design at ${where(cell)}: ${r.error.message}` });
  }
  const chain = planChain(
    chainBlocksOf(quilt, order, (placement) => {
      const r = costOf(placement);
      if (!r.ok) throw new Error('quilt/quiltRoute: a cached table went missing');
      return r.value;
    }),
    metric ?? 'straight',
  );
  const figures = chain.steps.map((step) => {
    const placement = quilt.placements[step.cell.row]![step.cell.column]!;
    const { design, revision } = designs.get(placement.designId)!;
    const own = cache.design(placement.designId, revision, () => buildCornerCosts(design, planOptions));
    if (!own.ok) throw new Error('quilt/quiltRoute: a cached table went missing');
    return figuresOfPair(step.cell, own.value.units, pairPlanOf(own.value, step.entry, step.exit, placement));
  });
  return ok({ order, chain, budget: planQuiltBudget(quilt.units, figures, chain, quilt.thread ?? {}) });
}

/** Whether the design, turned as placed and in the quilt's units, is the quilt's block size within 1/64 in. */
export function fits(quilt: Pick<Quilt, 'units' | 'block'>, design: Pick<Design, 'units' | 'width' | 'height'>, o: Orientation): boolean {
  const scale = unitScale(design.units, quilt.units);
  const size = placedSize(design.width * scale, design.height * scale, o);
  const tolerance = FIT_TOLERANCE_IN * unitScale('in', quilt.units);
  return Math.abs(size.width - quilt.block.width) <= tolerance && Math.abs(size.height - quilt.block.height) <= tolerance;
}

const where = (c: Cell): string => `row ${c.row + 1}, column ${c.column + 1}`;
