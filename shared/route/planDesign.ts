import type { Design } from '../design/design.schema.ts';
import type { DesignProblem } from '../graph/designProblem.ts';
import { buildPlanarGraph } from '../graph/planarGraph.ts';
import type { PlanarGraph } from '../graph/planarGraph.types.ts';
import { ok, type Result } from '../result.ts';
import { planRoute, type RoutePlan } from './planRoute.ts';
import { computeThreadBudget, type ThreadBudget } from './threadBudget.ts';
import type { TravelWeights } from './travelGraph.ts';

/** The planner's answer for a design, in the design's units. */
export interface DesignPlan extends RoutePlan {
  readonly units: Design['units'];
  readonly threadBudget: ThreadBudget;
  readonly graph: PlanarGraph;
}

export interface DesignPlanOptions {
  readonly weights?: TravelWeights;
  readonly clock?: () => number;
}

/**
 * Plans a design: planar graph (graph/planarGraph), then planRoute with the design's `start`, `end` and `edgeTravel`,
 * then the thread budget of the planned route (stitching plus travel is all sewn).
 */
export function planDesign(design: Design, options: DesignPlanOptions = {}): Result<DesignPlan, DesignProblem> {
  const built = buildPlanarGraph(design);
  if (!built.ok) return built;
  const graph = built.value;
  const plan = planRoute(graph, {
    edgeTravel: design.edgeTravel,
    ...(design.start ? { start: design.start } : {}),
    ...(design.end ? { end: design.end } : {}),
    ...(options.weights ? { weights: options.weights } : {}),
    ...(options.clock ? { clock: options.clock } : {}),
  });
  const threadBudget = computeThreadBudget(plan.stitchLength + plan.travelLength, plan.passes, design.units, design.thread);
  return ok({ ...plan, units: design.units, threadBudget, graph });
}
