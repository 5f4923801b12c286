import type { PlanarGraph } from '../graph/planarGraph.types.ts';
import type { Budget } from './exact/budget.ts';
import type { LpSolver } from './exact/lpSolver.ts';
import { planGroupExact, type ExactStats } from './exact/planGroupExact.ts';
import type { PlannerStats } from './minTJoin.ts';
import { planGroup, type GroupPlan } from './planGroup.ts';
import type { RouteGroup } from './routeGroups.ts';
import type { PathSearch } from './shortestPaths.ts';
import type { EndCosts, EndPlace } from './threadEnds.ts';
import type { TravelGraph } from './travelGraph.ts';

/** A group's plan for some number of extra stops, and the exact search's figures when it ran. */
export interface PlannedGroup {
  readonly plan: GroupPlan;
  readonly exact: ExactStats | null;
  /** Proven least objective (travel + end costs) for this many stops. */
  readonly proven: boolean;
}

export interface GroupSetting {
  readonly group: RouteGroup;
  readonly start: number;
  readonly end: number;
}

/**
 * Plans groups on demand and remembers them: the heuristic first (exact for one piece, and whenever its min T-join
 * joins the pieces); when that is not proven and a solver is given, the exact search within its share of the budget.
 */
export class GroupPlans {
  private readonly cache = new Map<string, PlannedGroup>();

  constructor(
    private readonly graph: PlanarGraph,
    private readonly travel: TravelGraph,
    private readonly search: PathSearch,
    private readonly groups: readonly GroupSetting[],
    private readonly places: readonly EndPlace[],
    private readonly costs: EndCosts,
    private readonly exact: { readonly solver: LpSolver; readonly budget: Budget; readonly always: boolean } | null,
    private readonly stats: PlannerStats,
  ) {}

  has(g: number, k: number): boolean {
    return this.cache.has(`${g}:${k}`);
  }

  /** Group g with up to k extra stops; `limitMs` bounds its exact search (0: heuristic only). */
  get(g: number, k: number, limitMs: number): PlannedGroup {
    const key = `${g}:${k}`;
    const known = this.cache.get(key);
    if (known) return known;
    const { group, start, end } = this.groups[g]!;
    const ends = { extraStops: k, places: this.places, costs: this.costs };
    const heuristic = planGroup(this.graph, this.search, group, start, end, ends, this.stats);
    let out: PlannedGroup = { plan: heuristic, exact: null, proven: isProven(heuristic) };
    if (this.exact && (!out.proven || this.exact.always) && limitMs > 0) {
      const found = planGroupExact(this.graph, this.travel, group, start, end, ends, heuristic, this.exact.solver, this.exact.budget, limitMs);
      out = { plan: found.plan, exact: found.stats, proven: isProven(found.plan) };
    }
    this.cache.set(key, out);
    return out;
  }
}

export function isProven(plan: GroupPlan): boolean {
  return plan.lowerBound >= plan.travelCost + plan.endCost;
}
