import type { Point } from '../geometry/point.ts';
import { linkLength, type LinkMetric } from './chain.ts';
import { linkPath } from './chainedRoute.ts';
import type { Corner } from './cornerMap.ts';
import { blockCorners, blockRect, type QuiltFrame } from './finishedSize.ts';
import type { Cell } from './quilt.schema.ts';

/** What the quilt plan tells about one block (shared/contract/quiltPlan.ts `steps`): its cell and placed corners. */
export interface PlannedBlock {
  readonly cell: Cell;
  readonly entry: Corner;
  readonly exit: Corner;
}

/**
 * One block of the chained route as the quilt map draws it, in quilt coordinates and units: where the thread comes
 * in and goes out, and the link that brought it from the previous block (empty for the first block).
 */
export interface ChainLeg {
  /** Place in the quilting order, from 1. */
  readonly step: number;
  readonly cell: Cell;
  readonly entry: Point;
  readonly exit: Point;
  /** The block's centre: the map draws the way through the block from entry to exit as a curve bowed toward it. */
  readonly centre: Point;
  readonly link: readonly Point[];
  readonly linkLength: number;
}

/**
 * The chained route at the scale of the quilt map, from the plan's per-block corners: the entry and exit corner of
 * each block and the links between them, drawn the same way the planner measured them (chain.ts `linkLength`), so
 * the links' lengths add up to the plan's link travel.
 */
export function buildChainOverview(quilt: QuiltFrame, steps: readonly PlannedBlock[], metric: LinkMetric): ChainLeg[] {
  let previous: Point | null = null;
  return steps.map((s, i) => {
    const corners = blockCorners(quilt, s.cell);
    const entry = corners[s.entry];
    const exit = corners[s.exit];
    const link = previous ? linkPath(previous, entry, metric) : [];
    const length = previous ? linkLength(previous, entry, metric) : 0;
    previous = exit;
    const r = blockRect(quilt, s.cell);
    return { step: i + 1, cell: s.cell, entry, exit, centre: [r.x + r.width / 2, r.y + r.height / 2], link, linkLength: length };
  });
}
