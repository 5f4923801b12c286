// The route check card's model, read from the route contract's check answer (shared/contract/check.ts).
import { checkResultSchema, type CheckResult, type GapCheckAnswer } from '@shared/contract/check.ts';
import type { PlanFigures, RouteFigures as ContractRouteFigures, ThreadBudgetAnswer } from '@shared/contract/figures.ts';

/** Figures the card lists: a route's, with the planner's proof status when it is the planned route. */
export type RouteFigures = ContractRouteFigures & { readonly optimal?: PlanFigures['optimal'] };
export type ThreadBudgetView = ThreadBudgetAnswer;
export type GapView = GapCheckAnswer;

/** Everything the route check card and the canvas overlays show. */
export interface RouteCheckView {
  readonly planned: RouteFigures;
  readonly passesWithoutTravel: number;
  readonly oddPointPositions: readonly (readonly [number, number])[];
  readonly thread: ThreadBudgetView;
  /** The quilter's own stitching order, when the design has one: its figures and what it leaves unstitched. */
  readonly own: { readonly figures: RouteFigures; readonly thread: ThreadBudgetView; readonly unstitchedCount: number } | null;
  readonly gap: GapView | null;
  readonly warnings: readonly string[];
}

/** The check card's model from the API's check answer; null when the answer has another shape. */
export function parseCheckAnswer(body: unknown): RouteCheckView | null {
  const parsed = checkResultSchema.safeParse(body);
  return parsed.success ? toCheckView(parsed.data) : null;
}

/** The check card's model from a check the contract already accepted (e.g. the `check` of a save answer). */
export function toCheckView(a: CheckResult): RouteCheckView {
  const own = a.ownRoute;
  const warnings = own ? own.warnings.map((w) => w.message) : [];
  if (own && own.unstitched.count > 0) warnings.push(`${own.unstitched.count} quilting line part${own.unstitched.count === 1 ? ' is' : 's are'} not in your stitching order yet.`);
  return {
    planned: a.plan,
    passesWithoutTravel: a.check.passesWithoutTravel,
    oddPointPositions: a.check.oddPoints.points,
    thread: a.threadBudget,
    own: own ? { figures: own, thread: own.threadBudget, unstitchedCount: own.unstitched.count } : null,
    gap: a.gap,
    warnings,
  };
}
