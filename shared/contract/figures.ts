// Route figures and the summaries stored from them: what the designs table, a saved route and a template show.
// Lengths are in the design's units; thread in yards.
import { z } from 'zod';
import { unitsSchema } from '../design/design.schema.ts';
import type { Wire } from './wire.ts';

/** A measured figure; zod 4 numbers refuse NaN and ±Infinity, so an answer that JSON turned into null fails. */
const figure = z.number();

/** Figures of a route, planned or the quilter's own. travelLength = retrace + ditch + edge. */
export const routeFiguresSchema = z.object({
  passes: figure,
  stops: figure,
  pieces: figure,
  oddPoints: figure,
  stitchLength: figure,
  travelLength: figure,
  retraceLength: figure,
  ditchLength: figure,
  edgeLength: figure,
});
export type RouteFigures = Wire<z.infer<typeof routeFiguresSchema>>;

/** The planner's figures: route figures plus the proof of its travel. */
export const planFiguresSchema = routeFiguresSchema.extend({
  /** No route with this many passes has less travel than this (design units). */
  travelLowerBound: figure,
  /** True when the travel is proven least. */
  optimal: z.boolean(),
});
export type PlanFigures = Wire<z.infer<typeof planFiguresSchema>>;

/** How thread is spent on a route, where the number comes from beside it (threadBudget.ts). */
export const threadBudgetSchema = z.object({
  stitchCount: figure,
  topThreadYards: figure,
  bobbinThreadYards: figure,
  topThreadMeters: figure,
  bobbinThreadMeters: figure,
  bobbins: figure,
  sewingMinutes: figure,
  assumptions: z.array(z.object({ setting: z.string(), value: z.union([figure, z.string()]), source: z.string() })),
});
export type ThreadBudgetAnswer = Wire<z.infer<typeof threadBudgetSchema>>;

/** Thread figures for tables: totalYards = top + bobbin. */
export const threadSummarySchema = z.object({ totalYards: figure, topYards: figure, bobbinYards: figure, bobbins: figure, stitches: figure, minutes: figure });
export type ThreadSummary = Wire<z.infer<typeof threadSummarySchema>>;

/** The planner's figures for a drawing, as stored in `design.summary` for the designs table. */
export const designSummarySchema = planFiguresSchema.extend({ units: unitsSchema, thread: threadSummarySchema });
export type DesignSummary = Wire<z.infer<typeof designSummarySchema>>;

/** Figures of a quilter's (or teacher's) own stitching order: nothing is proven, so no lower bound and `optimal: null`. */
export const ownRouteSummarySchema = routeFiguresSchema.extend({ units: unitsSchema, optimal: z.null(), thread: threadSummarySchema });
export type OwnRouteSummary = Wire<z.infer<typeof ownRouteSummarySchema>>;

/**
 * Figures kept with a saved route (design_route.summary) and with a template version: the planner's summary for a
 * planned route, an own-route summary for the quilter's order. `optimal === null` tells them apart.
 */
export const savedRouteSummarySchema = z.union([designSummarySchema, ownRouteSummarySchema]);
export type SavedRouteSummary = Wire<z.infer<typeof savedRouteSummarySchema>>;
