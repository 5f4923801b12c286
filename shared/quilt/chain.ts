import type { Point } from '../geometry/point.ts';
import { checkCornerCosts, type Corner, type CornerCosts } from './cornerMap.ts';
import { blockCorners, type QuiltFrame } from './finishedSize.ts';
import type { Cell, Placement } from './quilt.schema.ts';

/**
 * How the thread gets from one block's exit corner to the next block's entry corner, in quilt units:
 * `straight` is the straight-line distance; `along-seams` runs along the seam grid between blocks, horizontally
 * then vertically (|dx| + |dy|), which assumes the seams it follows run through (e.g. sashing with cornerstones).
 */
export type LinkMetric = 'straight' | 'along-seams';

/** One block of the chain: where its corners lie in the quilt and what each (entry, exit) pair costs inside it. */
export interface ChainBlock {
  readonly cell: Cell;
  /** Corners in quilt coordinates, clockwise from the top left (as `blockCorners`). */
  readonly corners: readonly [Point, Point, Point, Point];
  /** Placed corner-pair costs in quilt units: `costs[entry][exit]` (cornerMap.ts `placeCornerCosts`). */
  readonly costs: CornerCosts;
}

export interface ChainStep {
  readonly cell: Cell;
  readonly entry: Corner;
  readonly exit: Corner;
  /** The block's cost for this entry and exit. */
  readonly blockCost: number;
  /** Travel from the previous block's exit to this entry (0 for the first block). */
  readonly linkBefore: number;
}

/** The chosen corners for the whole quilt, with the breakdown. All in quilt units. */
export interface QuiltChain {
  readonly steps: readonly ChainStep[];
  /** Σ block costs. */
  readonly blockTravel: number;
  /** Σ links between consecutive blocks. */
  readonly linkTravel: number;
  /** blockTravel + linkTravel: the least possible over all corner choices. */
  readonly total: number;
}

export function linkLength(a: Point, b: Point, metric: LinkMetric): number {
  const dx = Math.abs(a[0] - b[0]);
  const dy = Math.abs(a[1] - b[1]);
  return metric === 'straight' ? Math.hypot(dx, dy) : dx + dy;
}

/**
 * Picks each block's entry and exit corner so that blocks quilted in the given order, with the thread running on
 * from one block to the next, cost the least in all: Σ cost_i(entry_i, exit_i) + Σ link(exit_{i−1}, entry_i).
 *
 * Dynamic programming over blocks × exit corner (docs/engine.md, "Whole quilt"):
 *   best_1(x) = min_e cost_1(e, x)
 *   best_i(x) = min_{x', e} best_{i−1}(x') + link(x', e) + cost_i(e, x)
 * and the answer is min_x best_n(x), traced back. 64 terms per block, so any quilt is instant. Ties go to the lower
 * corner number (top-left first), so the answer is deterministic.
 */
export function planChain(blocks: readonly ChainBlock[], metric: LinkMetric = 'straight'): QuiltChain {
  if (blocks.length === 0) return { steps: [], blockTravel: 0, linkTravel: 0, total: 0 };
  for (const b of blocks) checkCornerCosts(b.costs);
  // from[i][x] = [entry, previous exit] that reached best_i(x).
  const from: [Corner, Corner][][] = [];
  let best = [0, 1, 2, 3].map((x) => {
    let value = Infinity;
    let entry: Corner = 0;
    for (let e = 0; e < 4; e++) {
      const c = blocks[0]!.costs[e]![x]!;
      if (c < value) [value, entry] = [c, e as Corner];
    }
    return { value, entry };
  });
  from.push(best.map((b) => [b.entry, 0]));
  for (let i = 1; i < blocks.length; i++) {
    const prev = blocks[i - 1]!;
    const block = blocks[i]!;
    const here: { value: number; entry: Corner; prevExit: Corner }[] = [];
    for (let x = 0; x < 4; x++) {
      let cell = { value: Infinity, entry: 0 as Corner, prevExit: 0 as Corner };
      for (let px = 0; px < 4; px++) {
        for (let e = 0; e < 4; e++) {
          const v = best[px]!.value + linkLength(prev.corners[px]!, block.corners[e]!, metric) + block.costs[e]![x]!;
          if (v < cell.value) cell = { value: v, entry: e as Corner, prevExit: px as Corner };
        }
      }
      here.push(cell);
    }
    from.push(here.map((h) => [h.entry, h.prevExit]));
    best = here;
  }
  let exit: Corner = 0;
  for (let x = 1; x < 4; x++) if (best[x]!.value < best[exit]!.value) exit = x as Corner;
  const exits: Corner[] = new Array(blocks.length);
  const entries: Corner[] = new Array(blocks.length);
  for (let i = blocks.length - 1; i >= 0; i--) {
    exits[i] = exit;
    const [entry, prevExit] = from[i]![exit]!;
    entries[i] = entry;
    exit = prevExit;
  }
  return chainOf(blocks, entries, exits, metric);
}

/** The chain with the given corners and its breakdown (the DP's answer, or any other choice to compare with). */
export function chainOf(blocks: readonly ChainBlock[], entries: readonly Corner[], exits: readonly Corner[], metric: LinkMetric): QuiltChain {
  const steps: ChainStep[] = blocks.map((b, i) => ({
    cell: b.cell,
    entry: entries[i]!,
    exit: exits[i]!,
    blockCost: b.costs[entries[i]!]![exits[i]!]!,
    linkBefore: i === 0 ? 0 : linkLength(blocks[i - 1]!.corners[exits[i - 1]!]!, b.corners[entries[i]!]!, metric),
  }));
  const blockTravel = steps.reduce((s, t) => s + t.blockCost, 0);
  const linkTravel = steps.reduce((s, t) => s + t.linkBefore, 0);
  return { steps, blockTravel, linkTravel, total: blockTravel + linkTravel };
}

/**
 * The chain's blocks for a quilt's filled cells in quilting order, with each placement's placed costs (quilt units)
 * from `placedCosts` (typically a `CornerCostCache`).
 */
export function chainBlocksOf(quilt: QuiltFrame & { readonly placements: readonly (readonly (Placement | null)[])[] }, cells: readonly Cell[], placedCosts: (placement: Placement, cell: Cell) => CornerCosts): ChainBlock[] {
  return cells.map((cell) => {
    const placement = quilt.placements[cell.row]?.[cell.column];
    if (!placement) throw new Error(`quilt/chain: no block at row ${cell.row + 1}, column ${cell.column + 1}`);
    return { cell, corners: blockCorners(quilt, cell), costs: placedCosts(placement, cell) };
  });
}
