import type { ThreadSettings, Units } from '../design/design.schema.ts';
import { computeThreadBudget, type ThreadBudget } from '../route/threadBudget.ts';
import type { QuiltChain } from './chain.ts';
import type { CornerPairPlan } from './cornerCosts.ts';
import { unitScale } from './cornerCosts.ts';
import type { Cell } from './quilt.schema.ts';

/** One block's planned figures, in its design's units (a block plan, or the chosen corner pair's plan). */
export interface BlockFigures {
  readonly cell: Cell;
  readonly units: Units;
  readonly stitchLength: number;
  readonly travelLength: number;
  readonly passes: number;
}

/** The whole quilt's figures and thread budget; lengths in quilt units. */
export interface QuiltBudget {
  readonly units: Units;
  /** Each block's own budget (as if quilted alone, with the quilt's thread settings), in the quilt's units. */
  readonly blocks: readonly { readonly cell: Cell; readonly budget: ThreadBudget }[];
  /** True when the top is quilted in one piece and the thread runs on from block to block along the links. */
  readonly chained: boolean;
  readonly passes: number;
  readonly stops: number;
  readonly stitchLength: number;
  /** Travel inside the blocks plus the links between them. */
  readonly travelLength: number;
  readonly linkLength: number;
  /** Thread, bobbins and time for everything sewn, with the sources of the model and its settings. */
  readonly total: ThreadBudget;
  /** How the links are counted (our own model; the lockstitch model is named in `total.assumptions`). */
  readonly linkModel: string;
}

export const LINK_MODEL = 'ours: each link between blocks is sewn as travel and the thread runs on, so the last pass of one block and the first pass of the next are one pass (one tie-off saved at each end)';

/**
 * Sums block figures into the quilt's: stitched length, travel and passes, plus, when `chain` is given (the top
 * quilted in one piece), the links' travel, with one pass fewer per link. Quilt-as-you-go blocks (`chain` null) are
 * separate pieces: their passes simply add up. The thread budget is threadBudget.ts's lockstitch model over all that
 * is sewn, so it equals the blocks' own budgets summed, plus the links, less the tie-off tails the links save
 * (up to the rounding of stitch counts).
 */
export function planQuiltBudget(units: Units, blocks: readonly BlockFigures[], chain: QuiltChain | null, settings: ThreadSettings = {}): QuiltBudget {
  let stitchLength = 0;
  let travelLength = 0;
  let passes = 0;
  const own = blocks.map((b) => {
    const scale = unitScale(b.units, units);
    stitchLength += b.stitchLength * scale;
    travelLength += b.travelLength * scale;
    passes += b.passes;
    return { cell: b.cell, budget: computeThreadBudget((b.stitchLength + b.travelLength) * scale, b.passes, units, settings) };
  });
  const chained = chain !== null && blocks.length > 0;
  const linkLength = chained ? chain.linkTravel : 0;
  if (chained) {
    if (chain.steps.length !== blocks.length) throw new Error(`quilt/quiltBudget: the chain has ${chain.steps.length} blocks, the figures ${blocks.length}`);
    passes -= blocks.length - 1;
  }
  travelLength += linkLength;
  return {
    units,
    blocks: own,
    chained,
    passes,
    stops: Math.max(0, passes - 1),
    stitchLength,
    travelLength,
    linkLength,
    total: computeThreadBudget(stitchLength + travelLength, passes, units, settings),
    linkModel: LINK_MODEL,
  };
}

/** A chain step's block figures from its chosen corner pair's plan (design units). */
export function figuresOfPair(cell: Cell, units: Units, pair: CornerPairPlan): BlockFigures {
  return { cell, units, stitchLength: pair.stitchLength, travelLength: pair.travelLength, passes: pair.passes };
}
