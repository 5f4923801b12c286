import type { Design } from '../design/design.schema.ts';
import type { DesignProblem } from '../graph/designProblem.ts';
import { err, ok, type Result } from '../result.ts';
import { chainBlocksOf, planChain, type LinkMetric, type QuiltChain } from './chain.ts';
import type { CornerCostCache } from './cornerCostCache.ts';
import { designCorner, placeCornerCosts, placedSize, type Corner } from './cornerMap.ts';
import { buildCornerCosts, lowerTableOf, pairPlanOf, planCornerPair, PLANS_PER_DESIGN, unitScale, type CornerCostOptions, type DesignCornerCosts } from './cornerCosts.ts';
import { orderCells, type HandOrderProblem } from './order.ts';
import type { Cell, Orientation, Quilt } from './quilt.schema.ts';
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
 * order (planChain), and the whole quilt's budget from the chosen corner pairs' plans plus the links.
 *
 * Corner pairs are proved only where the chain needs them (docs/engine.md §11.3): each design revision not in the
 * cache first gets its 10 pairs from the heuristic alone; then, with a solver, `pairsToProve` names the pairs of
 * the chain over lower bounds that the exact search has not seen, they are planned exactly into the cache, and
 * again until none is left. The answer is then the least total over all corner pairs. The same three steps
 * (`checkQuiltDesigns`, `pairsToProve`, `finishQuiltRoute`) let a worker pool run the plans of each round side by
 * side; this function runs them one after the other.
 */
export function planQuiltRoute(quilt: Quilt, designs: ReadonlyMap<string, QuiltDesign>, cache: CornerCostCache, options: QuiltRouteOptions = {}): Result<QuiltRoute, QuiltRouteProblem> {
  const checked = checkQuiltDesigns(quilt, designs);
  if (!checked.ok) return checked;
  const order = checked.value;
  const { metric = quilt.linkMetric, onProgress, solver, ...planOptions } = options;
  const ids = [...new Set(order.map((c) => quilt.placements[c.row]![c.column]!.designId))];
  let total = PLANS_PER_DESIGN * ids.filter((id) => !cache.has(id, designs.get(id)!.revision)).length;
  let done = 0;
  for (const id of ids) {
    const { design, revision } = designs.get(id)!;
    const r = cache.design(id, revision, () => buildCornerCosts(design, { ...planOptions, onPlanned: () => onProgress?.(++done, total) }));
    if (!r.ok) {
      const cell = order.find((c) => quilt.placements[c.row]![c.column]!.designId === id)!;
      return err({ kind: 'design', cell, designId: id, problem: r.error, message: `The design at ${where(cell)}: ${r.error.message}` });
    }
  }
  const tableOf = (id: string): DesignCornerCosts => knownTable(cache, id, designs.get(id)!.revision);
  let round = pairsToProve(quilt, order, tableOf, metric);
  while (solver && round.pairs.length > 0) {
    total += round.pairs.length;
    for (const { designId, a, b } of round.pairs) {
      const { design, revision } = designs.get(designId)!;
      const plan = planCornerPair(design, a, b, { ...planOptions, solver });
      if (!plan.ok) throw new Error('quilt/quiltRoute: a design planned before was refused');
      cache.refinePair(designId, revision, a, b, plan.value);
      onProgress?.(++done, total);
    }
    round = pairsToProve(quilt, order, tableOf, metric);
  }
  return ok(finishQuiltRoute(quilt, order, designs, cache, metric, round.bound));
}

/**
 * Step 1: the quilting order, once every placed design is there and fills its cell (its size, turned as placed and
 * in the quilt's units, equals the quilt's block size within 1/64 in).
 */
export function checkQuiltDesigns(quilt: Quilt, designs: ReadonlyMap<string, { readonly design: Pick<Design, 'units' | 'width' | 'height'> }>): Result<Cell[], QuiltRouteProblem> {
  const ordered = orderCells(quilt, quilt.order);
  if (!ordered.ok) return err({ kind: 'order', problem: ordered.error, message: ordered.error.message });
  for (const cell of ordered.value) {
    const placement = quilt.placements[cell.row]![cell.column]!;
    const found = designs.get(placement.designId);
    if (!found) return err({ kind: 'missing-design', cell, designId: placement.designId, message: `The design at ${where(cell)} is not available.` });
    if (!fits(quilt, found.design, placement)) {
      return err({ kind: 'block-size', cell, designId: placement.designId, message: `The design at ${where(cell)} is not ${quilt.block.width} × ${quilt.block.height} ${quilt.units} as placed.` });
    }
  }
  return ok(ordered.value);
}

/** A corner pair of a design (design corners, a ≤ b) that the exact search should plan. */
export interface PairToProve {
  readonly designId: string;
  readonly a: Corner;
  readonly b: Corner;
}

/**
 * Step 2, repeated: the chain over the pairs' lower bounds (`bound`, whose total no choice of corners beats) and the
 * pairs it uses that are neither proven nor yet searched. None left: `bound.total` is the least total.
 */
export function pairsToProve(quilt: Quilt, order: readonly Cell[], tableOf: (designId: string) => DesignCornerCosts, metric: LinkMetric): { bound: QuiltChain; pairs: PairToProve[] } {
  const bound = planChain(
    chainBlocksOf(quilt, order, (p) => {
      const own = tableOf(p.designId);
      return placeCornerCosts(lowerTableOf(own), p, unitScale(own.units, quilt.units));
    }),
    metric,
  );
  const pairs = new Map<string, PairToProve>();
  for (const step of bound.steps) {
    const placement = quilt.placements[step.cell.row]![step.cell.column]!;
    const e = designCorner(step.entry, placement);
    const x = designCorner(step.exit, placement);
    const [a, b] = e <= x ? [e, x] : [x, e];
    const pair = tableOf(placement.designId).pairs[a]![b]!;
    if (!pair.searched && !pair.optimal) pairs.set(`${placement.designId}:${a}:${b}`, { designId: placement.designId, a, b });
  }
  return { bound, pairs: [...pairs.values()] };
}

/** Step 3: the chain over the pairs' costs (the placed tables the cache keeps) and the quilt's budget. */
export function finishQuiltRoute(quilt: Quilt, order: readonly Cell[], designs: ReadonlyMap<string, { readonly revision: string }>, cache: CornerCostCache, metric: LinkMetric, bound: QuiltChain): QuiltRoute {
  const revisionOf = (id: string): string => designs.get(id)!.revision;
  const chain = planChain(
    chainBlocksOf(quilt, order, (p) => {
      const r = cache.placedCosts(p.designId, revisionOf(p.designId), p, quilt.units, () => ok(knownTable(cache, p.designId, revisionOf(p.designId))));
      if (!r.ok) throw new Error('quilt/quiltRoute: a cached table went missing');
      return r.value;
    }),
    metric,
  );
  const figures = chain.steps.map((step) => {
    const placement = quilt.placements[step.cell.row]![step.cell.column]!;
    const own = knownTable(cache, placement.designId, revisionOf(placement.designId));
    return figuresOfPair(step.cell, own.units, pairPlanOf(own, step.entry, step.exit, placement));
  });
  return { order, chain, lowerBound: bound.total, budget: planQuiltBudget(quilt.units, figures, chain, quilt.thread ?? {}) };
}

function knownTable(cache: CornerCostCache, designId: string, revision: string): DesignCornerCosts {
  const r = cache.design(designId, revision, () => err(null));
  if (!r.ok) throw new Error(`quilt/quiltRoute: no corner-pair table for ${designId}@${revision}`);
  return r.value;
}

/** Whether the design, turned as placed and in the quilt's units, is the quilt's block size within 1/64 in. */
export function fits(quilt: Pick<Quilt, 'units' | 'block'>, design: Pick<Design, 'units' | 'width' | 'height'>, o: Orientation): boolean {
  const scale = unitScale(design.units, quilt.units);
  const size = placedSize(design.width * scale, design.height * scale, o);
  const tolerance = FIT_TOLERANCE_IN * unitScale('in', quilt.units);
  return Math.abs(size.width - quilt.block.width) <= tolerance && Math.abs(size.height - quilt.block.height) <= tolerance;
}

const where = (c: Cell): string => `row ${c.row + 1}, column ${c.column + 1}`;
