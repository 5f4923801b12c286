// Figures cut from the planner's answer, for the designs table and saved routes (no strokes, no graph).
import type { ThreadBudget } from '@shared/route/threadBudget.ts';
import type { DesignSummary, PlanFigures } from './engine.types.ts';

/** The route figures of a plan (any object carrying them, e.g. DesignPlan or PlanAnswer). */
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
export function threadSummaryOf(b: ThreadBudget): DesignSummary['thread'] {
  return {
    totalYards: b.topThreadYards + b.bobbinThreadYards,
    topYards: b.topThreadYards,
    bobbinYards: b.bobbinThreadYards,
    bobbins: b.bobbins,
    stitches: b.stitchCount,
    minutes: b.sewingMinutes,
  };
}

export function summaryOf(plan: PlanFigures & { readonly units: DesignSummary['units']; readonly threadBudget: ThreadBudget }): DesignSummary {
  return { ...figuresOf(plan), units: plan.units, thread: threadSummaryOf(plan.threadBudget) };
}
