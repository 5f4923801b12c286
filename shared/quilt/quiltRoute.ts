import type { Design } from '../design/design.schema.ts';
import type { DesignProblem } from '../graph/designProblem.ts';
import { err, ok, type Result } from '../result.ts';
import { chainBlocksOf, planChain, type LinkMetric, type QuiltChain } from './chain.ts';
import type { CornerCostCache } from './cornerCostCache.ts';
import { designCorner, placeCornerCosts, placedSize, type Corner } from './cornerMap.ts';
import { buildCornerCosts, lowerTableOf, pairPlanOf, planCornerPair, PLANS_PER_DESIGN, unitScale, type CornerCostOptions, type DesignCornerCosts } from './cornerCosts.ts';
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
  /** No choice of corners costs less than this (quilt units); equal to `chain.total` when the chain is proven least. */
  readonly lowerBound: number;
  readonly budget: QuiltBudget;
}

export interface QuiltRouteOptions extends Omit<CornerCostOptions, 'onPlanned'> {
  /** Overrides the quilt's own `linkMetric`. */
  readonly metric?: LinkMetric;
  /**
   * Corner-pair plans done and to do, for a progress bar: `PLANS_PER_DESIGN` per design revision not in the cache
   * yet, then the pairs the exact search proves (the total grows by each round's pairs).
   */
  readonly onProgress?: (done: number, total: number) => void;
}

/** How far a design's placed size may differ from the quilt's block size: 1/64 in (the trim check's tolerance). */
export const FIT_TOLERANCE_IN = 1 / 64;

/**
 * Plans a quilt's chained route: the quilting order, each placed design's corner-pair costs, the chain over the
 * order (planChain), and the whole quilt's budget from the chosen corner pairs' plans plus the links. Every placed
 * design must fill its cell: its size, turned as placed and in the quilt's units, equals the quilt's block size
 * within 1/64 in.
 *
 * Corner pairs are proved only where the chain needs them (docs/engine.md §11.3). Each design revision not in the
 * cache first gets its 10 pairs from the heuristic alone (fast), each with its cost and a lower bound. With a
 * solver, the chain is then planned over the lower bounds; every pair that chain uses and the exact search has not
 * seen is planned exactly and put in the cache; and again, until the lower-bound chain uses only searched pairs.
 * Its value is then a lower bound on every chain, and the chain over the costs, which is never dearer than that
 * chain's own costs, meets it when those pairs are proven: the answer is the least total over all corner pairs,
 * without proving pairs that cannot matter.
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
  const { metric = quilt.linkMetric, onProgress, solver, ...planOptions } = options;
  const uncached = new Set(placements.map((p) => p.placement.designId).filter((id) => !cache.has(id, designs.get(id)!.revision)));
  let total = PLANS_PER_DESIGN * uncached.size;
  let done = 0;
  const tableOf = (placement: Placement) => {
    const { design, revision } = designs.get(placement.designId)!;
    return cache.design(placement.designId, revision, () => buildCornerCosts(design, { ...planOptions, onPlanned: () => onProgress?.(++done, total) }));
  };
  for (const { cell, placement } of placements) {
    const r = tableOf(placement);
    if (!r.ok) return err({ kind: 'design', cell, designId: placement.designId, problem: r.error, message: `The design at ${where(cell)}: ${r.error.message}` });
  }
  const known = (placement: Placement): DesignCornerCosts => {
    const r = tableOf(placement);
    if (!r.ok) throw new Error('quilt/quiltRoute: a cached table went missing');
    return r.value;
  };
  const scaleOf = (placement: Placement): number => unitScale(known(placement).units, quilt.units);
  const lowerChain = (): QuiltChain => planChain(chainBlocksOf(quilt, order, (p) => placeCornerCosts(lowerTableOf(known(p)), p, scaleOf(p))), metric);
  let bound = lowerChain();
  for (;;) {
    if (!solver) break;
    const todo = new Map<string, { placement: Placement; a: Corner; b: Corner }>();
    for (const step of bound.steps) {
      const placement = quilt.placements[step.cell.row]![step.cell.column]!;
      const e = designCorner(step.entry, placement);
      const x = designCorner(step.exit, placement);
      const [a, b] = e <= x ? [e, x] : [x, e];
      const pair = known(placement).pairs[a]![b]!;
      if (!pair.searched && !pair.optimal) todo.set(`${placement.designId}:${a}:${b}`, { placement, a, b });
    }
    if (todo.size === 0) break;
    total += todo.size;
    for (const { placement, a, b } of todo.values()) {
      const { design, revision } = designs.get(placement.designId)!;
      const plan = planCornerPair(design, a, b, { ...planOptions, solver });
      if (!plan.ok) throw new Error('quilt/quiltRoute: a design planned before was refused');
      cache.refinePair(placement.designId, revision, a, b, plan.value);
      onProgress?.(++done, total);
    }
    bound = lowerChain();
  }
  // The costs' chain reads the placed tables the cache keeps under design, revision and orientation.
  const chain = planChain(
    chainBlocksOf(quilt, order, (p) => {
      const r = cache.placedCosts(p.designId, designs.get(p.designId)!.revision, p, quilt.units, () => tableOf(p));
      if (!r.ok) throw new Error('quilt/quiltRoute: a cached table went missing');
      return r.value;
    }),
    metric,
  );
  const figures = chain.steps.map((step) => {
    const placement = quilt.placements[step.cell.row]![step.cell.column]!;
    const own = known(placement);
    return figuresOfPair(step.cell, own.units, pairPlanOf(own, step.entry, step.exit, placement));
  });
  return ok({ order, chain, lowerBound: bound.total, budget: planQuiltBudget(quilt.units, figures, chain, quilt.thread ?? {}) });
}

/** Whether the design, turned as placed and in the quilt's units, is the quilt's block size within 1/64 in. */
export function fits(quilt: Pick<Quilt, 'units' | 'block'>, design: Pick<Design, 'units' | 'width' | 'height'>, o: Orientation): boolean {
  const scale = unitScale(design.units, quilt.units);
  const size = placedSize(design.width * scale, design.height * scale, o);
  const tolerance = FIT_TOLERANCE_IN * unitScale('in', quilt.units);
  return Math.abs(size.width - quilt.block.width) <= tolerance && Math.abs(size.height - quilt.block.height) <= tolerance;
}

const where = (c: Cell): string => `row ${c.row + 1}, column ${c.column + 1}`;
