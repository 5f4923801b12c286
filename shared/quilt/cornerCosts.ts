import { bindingBandOf, inchesPerUnit, type Design, type Units } from '../design/design.schema.ts';
import type { Point } from '../geometry/point.ts';
import type { DesignProblem } from '../graph/designProblem.ts';
import { buildPlanarGraph } from '../graph/planarGraph.ts';
import { ok, type Result } from '../result.ts';
import type { MipSolver } from '../route/exact/mipSolver.ts';
import { DEFAULT_PLAN_SETTINGS, type PlanSettings } from '../route/planSettings.ts';
import { planRoute } from '../route/planRoute.ts';
import type { TravelWeights } from '../route/travelGraph.ts';
import { designCorner, placeCornerCosts, type Corner, type CornerCosts } from './cornerMap.ts';
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
  /** Straight distance from the entry and exit corners to the route's first and last point (0 when the corners are on it). */
  readonly cornerSteps: number;
}

/** All 16 pairs of a design, in the design's own corners and units: `pairs[entry][exit]`. */
export interface DesignCornerCosts {
  readonly units: Units;
  readonly pairs: readonly (readonly CornerPairPlan[])[];
}

export interface CornerCostOptions {
  readonly solver?: MipSolver | null;
  readonly settings?: PlanSettings;
  readonly weights?: TravelWeights;
  readonly clock?: () => number;
  /** Called after each of the 16 plans with the number done, for a progress bar. */
  readonly onPlanned?: (done: number) => void;
}

/**
 * Plans the design 16 times, once per (entry corner, exit corner) pair, with the block planner's own fixed start
 * and end (planRoute's `start`/`end`): the thread enters at one corner, quilts every line and leaves at the other,
 * with the same edge travel, binding band, stops and time budget (per plan) as a plan of the design alone.
 *
 * The planar graph keeps a vertex only where lines end, meet or change kind, so a block corner is usually inside an
 * outline edge; planRoute would then start at the nearest vertex instead. The design's `start`/`end` points are
 * kept as vertices where they lie on a line (buildPlanarGraph), so each unordered pair {a, b} gets its own graph
 * with `start: a, end: b`, planned a → b and b → a: 10 graphs, 16 plans. With edge travel on, every corner is then
 * a vertex and the plan starts and ends exactly there. With edge travel off, a corner may lie on no line at all:
 * the route begins at the nearest vertex travel can reach, and the straight step from the corner to it is added to
 * the cost and reported as `cornerSteps` (a visible line the quilter would have to sew or avoid).
 */
export function buildCornerCosts(design: Design, options: CornerCostOptions = {}): Result<DesignCornerCosts, DesignProblem> {
  const settings = options.settings ?? DEFAULT_PLAN_SETTINGS;
  const corners: readonly Point[] = [[0, 0], [design.width, 0], [design.width, design.height], [0, design.height]];
  const pairs: CornerPairPlan[][] = corners.map(() => []);
  let done = 0;
  for (let a = 0; a < 4; a++) {
    for (let b = a; b < 4; b++) {
      const built = buildPlanarGraph({ ...design, start: corners[a]!, end: corners[b]! });
      if (!built.ok) return built;
      const graph = built.value;
      for (const [entry, exit] of a === b ? [[a, a]] : [[a, b], [b, a]]) {
        const plan = planRoute(graph, {
          edgeTravel: design.edgeTravel,
          frame: { width: design.width, height: design.height, band: bindingBandOf(design) },
          extraStops: settings.extraStops,
          hiddenEndAllowance: settings.hiddenEndAllowance,
          start: corners[entry!]!,
          end: corners[exit!]!,
          ...(options.weights ? { weights: options.weights } : {}),
          ...(options.clock ? { clock: options.clock } : {}),
          ...(options.solver ? { exact: { solver: options.solver, timeBudgetMs: settings.timeBudgetMs } } : {}),
        });
        const step = (p: Point, v: number | null): number => (v === null ? 0 : Math.hypot(p[0] - graph.vertices[v]![0], p[1] - graph.vertices[v]![1]));
        const cornerSteps = step(corners[entry!]!, plan.startVertex) + step(corners[exit!]!, plan.endVertex);
        pairs[entry!]![exit!] = {
          cost: plan.travelCost + cornerSteps,
          travelLength: plan.travelLength + cornerSteps,
          stitchLength: plan.stitchLength,
          passes: plan.passes,
          optimal: plan.optimal,
          travelLowerBound: plan.travelLowerBound + cornerSteps,
          cornerSteps,
        };
        options.onPlanned?.(++done);
      }
    }
  }
  return ok({ units: design.units, pairs });
}

/** The design's 4 × 4 cost table (design corners, design units). */
export function costTableOf(costs: DesignCornerCosts): CornerCosts {
  return costs.pairs.map((row) => row.map((p) => p.cost));
}

/** Factor from a design's units to the quilt's. */
export function unitScale(from: Units, to: Units): number {
  return inchesPerUnit(from) / inchesPerUnit(to);
}

/** The plan behind a placed pair: placed corners are read back to the design's own corners. */
export function pairPlanOf(costs: DesignCornerCosts, entry: Corner, exit: Corner, o: Orientation): CornerPairPlan {
  return costs.pairs[designCorner(entry, o)]![designCorner(exit, o)]!;
}

/**
 * Remembers corner-pair costs so a re-plan of the quilt costs only the dynamic programme. The design's own table is
 * planned once per design and revision (turning and mirroring keep lengths, so all eight orientations share it);
 * each placed table is kept under design, revision and orientation (`cornerCostKey`). A design the planner refuses
 * is not remembered.
 */
export class CornerCostCache {
  private readonly designs = new Map<string, DesignCornerCosts>();
  private readonly placed = new Map<string, CornerCosts>();

  /** Whether this design revision's table is known already. */
  has(designId: string, revision: string): boolean {
    return this.designs.has(`${designId}@${revision}`);
  }

  /** The design's table, computed by `compute` the first time this design revision is asked for. */
  design<E>(designId: string, revision: string, compute: () => Result<DesignCornerCosts, E>): Result<DesignCornerCosts, E> {
    const key = `${designId}@${revision}`;
    const found = this.designs.get(key);
    if (found) return ok(found);
    const computed = compute();
    if (computed.ok) this.designs.set(key, computed.value);
    return computed;
  }

  /** The placed table in quilt units (`quiltUnits`), from the design's table. */
  placedCosts<E>(designId: string, revision: string, o: Orientation, quiltUnits: Units, compute: () => Result<DesignCornerCosts, E>): Result<CornerCosts, E> {
    const key = `${cornerCostKey(designId, revision, o)}:${quiltUnits}`;
    const found = this.placed.get(key);
    if (found) return ok(found);
    const own = this.design(designId, revision, compute);
    if (!own.ok) return own;
    const table = placeCornerCosts(costTableOf(own.value), o, unitScale(own.value.units, quiltUnits));
    this.placed.set(key, table);
    return ok(table);
  }

  /** How many design tables have been planned (each is 16 plans). */
  get plannedDesigns(): number {
    return this.designs.size;
  }
}

/** Cache key of a placed design: id, revision and orientation ("r90m" = mirrored, then a quarter turn). */
export function cornerCostKey(designId: string, revision: string, o: Orientation): string {
  return `${designId}@${revision}/r${o.rotation}${o.mirror ? 'm' : ''}`;
}
