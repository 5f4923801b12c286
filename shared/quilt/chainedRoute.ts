import { bindingBandOf, type Design } from '../design/design.schema.ts';
import type { Point } from '../geometry/point.ts';
import type { DesignProblem } from '../graph/designProblem.ts';
import { buildPlanarGraph } from '../graph/planarGraph.ts';
import { ok, type Result } from '../result.ts';
import { DEFAULT_PLAN_SETTINGS } from '../route/planSettings.ts';
import { planRoute, type RoutePlan } from '../route/planRoute.ts';
import type { StrokeKind } from '../contract/strokes.ts';
import { linkLength, type LinkMetric, type QuiltChain } from './chain.ts';
import { designCorner, placePoint, type Corner } from './cornerMap.ts';
import type { CornerCostOptions } from './cornerCosts.ts';
import { unitScale } from './cornerCosts.ts';
import { blockCorners, blockRect, type QuiltFrame } from './finishedSize.ts';
import type { Orientation, Quilt } from './quilt.schema.ts';

/**
 * A stroke of the chained route on the quilt map, in quilt coordinates and units. `link` carries the thread from one
 * block's exit corner to the next block's entry corner; `corner-step` is the straight step between a corner and a
 * route that does not reach it (edge travel off, cornerCosts.ts).
 */
export interface MapStroke {
  /** The block's place in the quilting order, from 1; a link belongs to the block it leads into. */
  readonly step: number;
  /** Pass number across the whole quilt: links run the thread on, so a block's first pass continues the last one. */
  readonly pass: number;
  readonly kind: StrokeKind | 'link' | 'corner-step';
  readonly points: readonly Point[];
  readonly length: number;
}

/** One chained block for drawing: its design, how it is placed, and its route planned from entry to exit corner. */
export interface ChainedBlockRoute {
  readonly design: Pick<Design, 'width' | 'height' | 'units'>;
  readonly orientation: Orientation;
  readonly plan: Pick<RoutePlan, 'route' | 'passes'>;
}

/**
 * Plans one placed block's route from its placed entry corner to its placed exit corner, in the design's own frame
 * (the placed corners are read back through the corner map). One plan per block, for drawing the chained route.
 */
export function planPlacedPair(design: Design, o: Orientation, entry: Corner, exit: Corner, options: Omit<CornerCostOptions, 'onPlanned'> = {}): Result<RoutePlan, DesignProblem> {
  const corners: readonly Point[] = [[0, 0], [design.width, 0], [design.width, design.height], [0, design.height]];
  const start = corners[designCorner(entry, o)]!;
  const end = corners[designCorner(exit, o)]!;
  const built = buildPlanarGraph({ ...design, start, end });
  if (!built.ok) return built;
  const settings = options.settings ?? DEFAULT_PLAN_SETTINGS;
  return ok(
    planRoute(built.value, {
      edgeTravel: design.edgeTravel,
      frame: { width: design.width, height: design.height, band: bindingBandOf(design) },
      extraStops: settings.extraStops,
      hiddenEndAllowance: settings.hiddenEndAllowance,
      start,
      end,
      ...(options.weights ? { weights: options.weights } : {}),
      ...(options.clock ? { clock: options.clock } : {}),
      ...(options.solver ? { exact: { solver: options.solver, timeBudgetMs: settings.timeBudgetMs } } : {}),
    }),
  );
}

/**
 * The chained route on the quilt map: each block's strokes turned and mirrored as placed, scaled to the quilt's
 * units and moved to the block's place, joined by links from exit corner to entry corner (straight, or along the
 * seams horizontally then vertically). `blocks[i]` is the route of `chain.steps[i]`.
 */
export function placeChainedRoute(quilt: QuiltFrame & Pick<Quilt, 'units'>, chain: QuiltChain, blocks: readonly ChainedBlockRoute[], metric: LinkMetric = 'straight'): MapStroke[] {
  if (blocks.length !== chain.steps.length) throw new Error(`quilt/chainedRoute: ${blocks.length} block routes for ${chain.steps.length} chain steps`);
  const out: MapStroke[] = [];
  let passOffset = 0;
  chain.steps.forEach((step, i) => {
    const block = blocks[i]!;
    const rect = blockRect(quilt, step.cell);
    const scale = unitScale(block.design.units, quilt.units);
    const toQuilt = (p: Point): Point => {
      const q = placePoint(p, block.design.width, block.design.height, block.orientation);
      return [rect.x + q[0] * scale, rect.y + q[1] * scale];
    };
    const corners = blockCorners(quilt, step.cell);
    const entry = corners[step.entry]!;
    const exit = corners[step.exit]!;
    const pass = passOffset + 1;
    if (i > 0) {
      const from = blockCorners(quilt, chain.steps[i - 1]!.cell)[chain.steps[i - 1]!.exit]!;
      out.push({ step: i + 1, pass, kind: 'link', points: linkPath(from, entry, metric), length: linkLength(from, entry, metric) });
    }
    const strokes = block.plan.route.map((s) => ({ step: i + 1, pass: passOffset + s.pass, kind: s.kind, points: s.points.map(toQuilt), length: s.length * scale }));
    const first = strokes[0]?.points[0];
    const last = strokes.at(-1)?.points.at(-1);
    if (first && !same(first, entry)) out.push({ step: i + 1, pass, kind: 'corner-step', points: [entry, first], length: distance(entry, first) });
    out.push(...strokes);
    if (last && !same(last, exit)) out.push({ step: i + 1, pass: passOffset + block.plan.passes, kind: 'corner-step', points: [last, exit], length: distance(last, exit) });
    // The next block's first pass continues this block's last one.
    passOffset += Math.max(1, block.plan.passes) - 1;
  });
  return out;
}

/**
 * The path of a link from one block's exit corner to the next block's entry corner: straight, or along the seams
 * horizontally then vertically (chain.ts `LinkMetric`); its length is `linkLength`. Repeated points are dropped.
 */
export function linkPath(from: Point, to: Point, metric: LinkMetric): Point[] {
  return dedupe(metric === 'straight' ? [from, to] : [from, [to[0], from[1]], to]);
}

const SAME = 1e-9;
const same = (a: Point, b: Point): boolean => Math.abs(a[0] - b[0]) <= SAME && Math.abs(a[1] - b[1]) <= SAME;
const distance = (a: Point, b: Point): number => Math.hypot(a[0] - b[0], a[1] - b[1]);

function dedupe(points: readonly Point[]): Point[] {
  return points.filter((p, k) => k === 0 || !same(p, points[k - 1]!));
}
