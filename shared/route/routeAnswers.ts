// The engine's results cut to the API's answers (shared/contract): figures, summaries, the check and the plan.
// Pure; the server's engine worker, the demo seed and the contract's property test all build answers here, so an
// answer the server sends is exactly what these functions return.
import type { Design } from '../design/design.schema.ts';
import type { DesignProblem } from '../graph/designProblem.ts';
import { checkGap } from '../gap/gapCheck.ts';
import { err, ok, type Result } from '../result.ts';
import type { CheckResult } from '../contract/check.ts';
import type { DesignSummary, OwnRouteSummary, PlanFigures, ThreadBudgetAnswer, ThreadSummary } from '../contract/figures.ts';
import type { PlanResult } from '../contract/plan.ts';
import type { StrokePath } from '../contract/strokes.ts';
import { checkDesign } from './checkDesign.ts';
import { checkRoute, type RouteCheck } from './checkRoute.ts';
import { buildOwnRouteStrokes } from './ownRouteStrokes.ts';
import type { DesignPlan, DesignPlanOptions } from './planDesign.ts';

/** The route figures and proof status of a plan (any object carrying them), without anything else. */
export function figuresOf(plan: PlanFigures): PlanFigures {
  return {
    passes: plan.passes,
    stops: plan.stops,
    pieces: plan.pieces,
    oddPoints: plan.oddPoints,
    stitchLength: plan.stitchLength,
    travelLength: plan.travelLength,
    retraceLength: plan.retraceLength,
    ditchLength: plan.ditchLength,
    edgeLength: plan.edgeLength,
    travelLowerBound: plan.travelLowerBound,
    optimal: plan.optimal,
  };
}

/** Thread figures for tables: `totalYards` is top + bobbin thread. */
export function threadSummaryOf(b: ThreadBudgetAnswer): ThreadSummary {
  return {
    totalYards: b.topThreadYards + b.bobbinThreadYards,
    topYards: b.topThreadYards,
    bobbinYards: b.bobbinThreadYards,
    bobbins: b.bobbins,
    stitches: b.stitchCount,
    minutes: b.sewingMinutes,
  };
}

/** The designs table's figures (`design.summary`) from a plan. */
export function summaryOf(plan: PlanFigures & { readonly units: Design['units']; readonly threadBudget: ThreadBudgetAnswer }): DesignSummary {
  return { ...figuresOf(plan), units: plan.units, thread: threadSummaryOf(plan.threadBudget) };
}

/** The designs table's figures from a route check answer: the same plan, so the same figures as summaryOf. */
export function summaryOfCheck(check: CheckResult): DesignSummary {
  return { ...figuresOf(check.plan), units: check.check.units, thread: threadSummaryOf(check.threadBudget) };
}

/** Figures kept with a quilter's own route: measured, never proven (`optimal: null`, no lower bound). */
export function ownRouteSummaryOf(check: RouteCheck): OwnRouteSummary {
  return {
    passes: check.passes,
    stops: check.stops,
    pieces: check.pieces,
    oddPoints: check.oddPoints,
    stitchLength: check.stitchLength,
    travelLength: check.travelLength,
    retraceLength: check.retraceLength,
    ditchLength: check.ditchLength,
    edgeLength: check.edgeLength,
    units: check.units,
    optimal: null,
    thread: threadSummaryOf(check.threadBudget),
  };
}

/** A stroke as the API sends it: no planar-graph edge ids (they mean nothing outside one engine run). */
export function strokePathOf(s: StrokePath): StrokePath {
  return { pass: s.pass, kind: s.kind, points: s.points, length: s.length };
}

/** The plan answer from the planner's result (made with the stops table). */
export function toPlanResult(plan: DesignPlan): PlanResult {
  return {
    ...figuresOf(plan),
    units: plan.units,
    route: plan.route.map(strokePathOf),
    threadBudget: plan.threadBudget,
    lowerBound: plan.travelLowerBound,
    gapPercent: plan.gapPercent,
    stopsTable: plan.stopsTable ?? [],
    threadEnds: plan.threadEnds,
    settings: plan.settings,
    exactSearch: plan.exactSearch ? { keptVertices: plan.exactSearch.keptVertices, ms: plan.exactSearch.ms } : null,
  };
}

/**
 * The route check answer of a design: the drawing's check and the planner's figures (one plan), the quilter's own
 * route measured when the design has one, and the gap check (null when the gap search refuses the design).
 */
export function buildCheckResult(design: Design, options: DesignPlanOptions = {}): Result<CheckResult, DesignProblem> {
  const checked = checkDesign(design, options);
  if (!checked.ok) return checked;
  const { plan, ...check } = checked.value;
  let ownRoute: RouteCheck | null = null;
  if (design.route && design.route.length > 0) {
    const own = checkRoute(design);
    if (!own.ok) return own;
    ownRoute = own.value;
  }
  const gap = checkGap(design);
  return ok({ check, plan: figuresOf(plan), threadBudget: plan.threadBudget, ownRoute, gap: gap.ok ? gap.value : null });
}

/** A quilter's own route (`design.route`) measured, with its drawing strokes and the figures a saved route keeps. */
export interface OwnRouteResult {
  readonly check: RouteCheck;
  readonly strokes: readonly StrokePath[];
  readonly summary: OwnRouteSummary;
}

export function buildOwnRouteResult(design: Design): Result<OwnRouteResult, DesignProblem> {
  const own = checkRoute(design);
  if (!own.ok) return own;
  const strokes = buildOwnRouteStrokes(design, own.value);
  if (!strokes.ok) return err(strokes.error);
  return ok({ check: own.value, strokes: strokes.value, summary: ownRouteSummaryOf(own.value) });
}
