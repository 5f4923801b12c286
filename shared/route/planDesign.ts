import { clipLinesToBlock } from '../design/blockBounds.ts';
import { bindingBandOf, type Design } from '../design/design.schema.ts';
import type { DesignProblem } from '../graph/designProblem.ts';
import { buildPlanarGraph } from '../graph/planarGraph.ts';
import type { PlanarGraph } from '../graph/planarGraph.types.ts';
import { ok, type Result } from '../result.ts';
import type { LpSolver } from './exact/lpSolver.ts';
import { DEFAULT_PLAN_SETTINGS, type PlanSettings } from './planSettings.ts';
import { planRoute, type RoutePlan } from './planRoute.ts';
import { computeThreadBudget, type ThreadBudget } from './threadBudget.ts';
import type { TravelWeights } from './travelGraph.ts';

/** The planner's answer for a design, in the design's units. */
export interface DesignPlan extends RoutePlan {
  readonly units: Design['units'];
  readonly threadBudget: ThreadBudget;
  readonly graph: PlanarGraph;
  /** The settings the plan was made with. */
  readonly settings: PlanSettings;
}

export interface DesignPlanOptions {
  readonly weights?: TravelWeights;
  readonly clock?: () => number;
  /** The exact search's solver; without one, multi-piece designs get the heuristic's route and bound. */
  readonly solver?: LpSolver | null;
  readonly settings?: PlanSettings;
  /** Also compute the stops-vs-travel table. */
  readonly stopsTable?: boolean;
}

/**
 * Plans a design: planar graph (graph/planarGraph), then planRoute with the design's `start`, `end`, `edgeTravel`
 * and binding band (thread ends within it hide under the binding), then the thread budget of the planned route
 * (stitching plus travel is all sewn).
 */
export function planDesign(design: Design, options: DesignPlanOptions = {}): Result<DesignPlan, DesignProblem> {
  // Lines outside the block are never sewn: an older drawing or a draft with some is planned as clipped to it.
  const built = buildPlanarGraph(clipLinesToBlock(design));
  if (!built.ok) return built;
  const graph = built.value;
  const settings = options.settings ?? DEFAULT_PLAN_SETTINGS;
  const plan = planRoute(graph, {
    edgeTravel: design.edgeTravel,
    frame: { width: design.width, height: design.height, band: bindingBandOf(design) },
    extraStops: settings.extraStops,
    hiddenEndAllowance: settings.hiddenEndAllowance,
    ...(design.start ? { start: design.start } : {}),
    ...(design.end ? { end: design.end } : {}),
    ...(options.weights ? { weights: options.weights } : {}),
    ...(options.clock ? { clock: options.clock } : {}),
    ...(options.solver ? { exact: { solver: options.solver, timeBudgetMs: settings.timeBudgetMs } } : {}),
    ...(options.stopsTable ? { stopsTable: true } : {}),
  });
  const threadBudget = computeThreadBudget(plan.stitchLength + plan.travelLength, plan.passes, design.units, design.thread);
  return ok({ ...plan, units: design.units, threadBudget, graph, settings });
}
