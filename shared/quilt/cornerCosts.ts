import { z } from 'zod';
import { bindingBandOf, inchesPerUnit, unitsSchema, type Design, type Units } from '../design/design.schema.ts';
import type { Point } from '../geometry/point.ts';
import type { DesignProblem } from '../graph/designProblem.ts';
import { buildPlanarGraph } from '../graph/planarGraph.ts';
import { ok, type Result } from '../result.ts';
import type { LpSolver } from '../route/exact/lpSolver.ts';
import { DEFAULT_PLAN_SETTINGS, type PlanSettings } from '../route/planSettings.ts';
import { planRoute } from '../route/planRoute.ts';
import type { TravelWeights } from '../route/travelGraph.ts';
import { designCorner, type Corner, type CornerCosts } from './cornerMap.ts';
import type { Orientation } from './quilt.schema.ts';

/** The block planner's answer for one (entry corner, exit corner) pair, in design units. */
export interface CornerPairPlan {
  /** What the chain weighs: the route's travel cost plus any straight step from a corner to where the route begins or ends. */
  readonly cost: number;
  /** Travel sewn (retrace, ditch, edge) plus those steps; stitched length of the quilting lines. */
  readonly travelLength: number;
  readonly stitchLength: number;
  readonly passes: number;
  /** True when the planner proved the travel least for this pair. */
  readonly optimal: boolean;
  readonly travelLowerBound: number;
  /** True when the exact search was given this pair (a solver was passed); false for the heuristic alone. */
  readonly searched: boolean;
  /** Straight distance from the entry and exit corners to the route's first and last point (0 when the corners are on it). */
  readonly cornerSteps: number;
}

/** All 16 pairs of a design, in the design's own corners and units: `pairs[entry][exit]`. */
export interface DesignCornerCosts {
  readonly units: Units;
  readonly pairs: readonly (readonly CornerPairPlan[])[];
}

const length = z.number().finite().min(0);
const pairPlanSchema = z
  .object({ cost: length, travelLength: length, stitchLength: length, passes: z.number().int().min(0), optimal: z.boolean(), travelLowerBound: length, searched: z.boolean(), cornerSteps: length })
  .strict();
const fourOf = <T extends z.ZodType>(item: T) => z.array(item).length(4);

/**
 * A design's corner-pair table as it comes back from a worker or from storage (unknown until this accepts it):
 * 4 × 4 pair plans of finite lengths, and every pair equal to its reverse (the table is built that way).
 */
export const designCornerCostsSchema = z
  .object({ units: unitsSchema, pairs: fourOf(fourOf(pairPlanSchema)) })
  .strict()
  .refine((t) => t.pairs.every((row, a) => row.every((p, b) => p.cost === t.pairs[b]?.[a]?.cost)), { message: 'corner-pair costs must be the same both ways', path: ['pairs'] });

export interface CornerCostOptions {
  readonly solver?: LpSolver | null;
  readonly settings?: PlanSettings;
  readonly weights?: TravelWeights;
  readonly clock?: () => number;
  /** Called after each of the `PLANS_PER_DESIGN` plans with the number done, for a progress bar. */
  readonly onPlanned?: (done: number) => void;
}

/**
 * The 16 (entry corner, exit corner) costs of a design, from the block planner's own fixed start and end
 * (planRoute's `start`/`end`): the thread enters at one corner, quilts every line and leaves at the other, with the
 * same edge travel, binding band, stops and time budget (per plan) as a plan of the design alone.
 *
 * - A route sewn backwards is a route from its end to its start with the same travel (the first of two runs over a
 *   quilting line is the stitch, the other the retrace, either way round), the same passes and the same set of
 *   thread ends; so cost(b, a) = cost(a, b) and only the 10 pairs a ≤ b are planned (4 closed, 6 open).
 * - The planar graph keeps a vertex only where lines end, meet or change kind, so a block corner is usually inside an
 *   outline edge and planRoute would start at the nearest vertex instead. The design's `start`/`end` points are
 *   kept as vertices where they lie on a line (buildPlanarGraph), so each pair's graph is built with `start: a,
 *   end: b`. With edge travel on, every corner is then a vertex and the plan starts and ends exactly there.
 * - With edge travel off, a corner may lie on no line at all: the route begins at the nearest vertex travel can
 *   reach, and the straight step from the corner to it is added to the cost and reported as `cornerSteps` (a
 *   visible line the quilter would have to sew or avoid).
 */
export function buildCornerCosts(design: Design, options: CornerCostOptions = {}): Result<DesignCornerCosts, DesignProblem> {
  const pairs: CornerPairPlan[][] = [[], [], [], []];
  let done = 0;
  for (let a = 0; a < 4; a++) {
    for (let b = a; b < 4; b++) {
      const pair = planCornerPair(design, a as Corner, b as Corner, options);
      if (!pair.ok) return pair;
      pairs[a]![b] = pair.value;
      pairs[b]![a] = pair.value;
      options.onPlanned?.(++done);
    }
  }
  return ok({ units: design.units, pairs });
}

/** One corner pair of a design (design corners), planned as `buildCornerCosts` does; with a solver, exactly. */
export function planCornerPair(design: Design, a: Corner, b: Corner, options: Omit<CornerCostOptions, 'onPlanned'> = {}): Result<CornerPairPlan, DesignProblem> {
  const settings = options.settings ?? DEFAULT_PLAN_SETTINGS;
  const corners: readonly Point[] = [[0, 0], [design.width, 0], [design.width, design.height], [0, design.height]];
  const built = buildPlanarGraph({ ...design, start: corners[a]!, end: corners[b]! });
  if (!built.ok) return built;
  const graph = built.value;
  const plan = planRoute(graph, {
    edgeTravel: design.edgeTravel,
    frame: { width: design.width, height: design.height, band: bindingBandOf(design) },
    extraStops: settings.extraStops,
    hiddenEndAllowance: settings.hiddenEndAllowance,
    start: corners[a]!,
    end: corners[b]!,
    ...(options.weights ? { weights: options.weights } : {}),
    ...(options.clock ? { clock: options.clock } : {}),
    ...(options.solver ? { exact: { solver: options.solver, timeBudgetMs: settings.timeBudgetMs } } : {}),
  });
  const step = (p: Point, v: number | null): number => (v === null ? 0 : Math.hypot(p[0] - graph.vertices[v]![0], p[1] - graph.vertices[v]![1]));
  const cornerSteps = step(corners[a]!, plan.startVertex) + step(corners[b]!, plan.endVertex);
  return ok({
    cost: plan.travelCost + cornerSteps,
    travelLength: plan.travelLength + cornerSteps,
    stitchLength: plan.stitchLength,
    passes: plan.passes,
    optimal: plan.optimal,
    travelLowerBound: plan.travelLowerBound + cornerSteps,
    searched: Boolean(options.solver),
    cornerSteps,
  });
}

/** Plans per design: the 10 corner pairs a ≤ b (the other 6 are the same routes sewn backwards). */
export const PLANS_PER_DESIGN = 10;

/** The design's 4 × 4 cost table (design corners, design units). */
export function costTableOf(costs: DesignCornerCosts): CornerCosts {
  return costs.pairs.map((row) => row.map((p) => p.cost));
}

/** The least each pair can cost: its cost where proven, else the planner's lower bound. */
export function lowerTableOf(costs: DesignCornerCosts): CornerCosts {
  return costs.pairs.map((row) => row.map((p) => (p.optimal ? p.cost : p.travelLowerBound)));
}

/** Factor from a design's units to the quilt's. */
export function unitScale(from: Units, to: Units): number {
  return inchesPerUnit(from) / inchesPerUnit(to);
}

/** The plan behind a placed pair: placed corners are read back to the design's own corners. */
export function pairPlanOf(costs: DesignCornerCosts, entry: Corner, exit: Corner, o: Orientation): CornerPairPlan {
  return costs.pairs[designCorner(entry, o)]![designCorner(exit, o)]!;
}

