// The route check answer (POST /api/designs/:id/check, and the `check` of a save with ?check=1): the design's
// odd points and pieces, the planner's figures and thread budget, the quilter's own route measured, the gap check.
import { z } from 'zod';
import { pointSchema, unitsSchema } from '../design/design.schema.ts';
import { planFiguresSchema, routeFiguresSchema, threadBudgetSchema } from './figures.ts';
import type { Wire } from './wire.ts';

/** A measured figure; zod 4 numbers refuse NaN and ±Infinity, so an answer that JSON turned into null fails. */
const figure = z.number();

/** Route check of the drawing itself (before any route): Euler's condition per piece. */
export const designCheckReportSchema = z.object({
  units: unitsSchema,
  pieces: figure,
  pieceDetails: z.array(z.object({ length: figure, oddPoints: figure })),
  oddPoints: z.object({ count: figure, points: z.array(pointSchema) }),
  onePassWithoutTravel: z.boolean(),
  passesWithoutTravel: figure,
  passesWithTravel: figure,
  stitchLength: figure,
});
export type DesignCheckReport = Wire<z.infer<typeof designCheckReportSchema>>;

export const ROUTE_WARNING_KINDS = ['outside-block', 'edge-travel-outside-band', 'edge-travel-off', 'off-line'] as const;
export const STROKE_DIRECTIONS = ['away', 'toward', 'left', 'right', 'curved'] as const;

/** Route check of the quilter's own stitching order (`design.route`). */
export const ownRouteCheckSchema = routeFiguresSchema.extend({
  units: unitsSchema,
  /** Stitching that follows no design line and is not edge travel. */
  offLineLength: figure,
  unstitched: z.object({
    count: figure,
    length: figure,
    lines: z.array(z.object({ edge: figure, source: figure, length: figure, points: z.array(pointSchema) })),
  }),
  strokes: z.array(z.object({ index: figure, pass: figure, length: figure, direction: z.enum(STROKE_DIRECTIONS) })),
  warnings: z.array(
    z.object({ kind: z.enum(ROUTE_WARNING_KINDS), stroke: figure, message: z.string(), point: pointSchema.optional(), length: figure.optional() }),
  ),
  threadBudget: threadBudgetSchema,
});
export type OwnRouteCheck = Wire<z.infer<typeof ownRouteCheckSchema>>;

/** The widest empty disc and its diameter against the batting's spacing limit (gapCheck.ts). */
export const gapCheckSchema = z.object({
  radius: figure,
  center: pointSchema,
  precision: figure,
  /** Diameter of the empty disc, design units. */
  widestGap: figure,
  /** The batting's spacing limit in design units, when the design states one. */
  limit: figure.nullable(),
  status: z.enum(['within', 'over', 'at-limit', 'no-limit']),
});
export type GapCheckAnswer = Wire<z.infer<typeof gapCheckSchema>>;

/** What the engine's check gives: the four parts above, the planner's figures and its thread budget. */
export const checkResultSchema = z.object({
  check: designCheckReportSchema,
  /** The planned route's figures (what the planner would achieve). */
  plan: planFiguresSchema,
  threadBudget: threadBudgetSchema,
  /** Null when the design has no own route. */
  ownRoute: ownRouteCheckSchema.nullable(),
  /** Null when the gap search refused the design. */
  gap: gapCheckSchema.nullable(),
});
export type CheckResult = Wire<z.infer<typeof checkResultSchema>>;

/** POST /api/designs/:id/check → the check of the saved version (`draft: false`) or of the draft it was sent. */
export const checkAnswerSchema = checkResultSchema.extend({ designVersion: z.number().int().positive(), draft: z.boolean() });
export type CheckAnswer = Wire<z.infer<typeof checkAnswerSchema>>;
