import { z } from 'zod';

const point = z.tuple([z.number(), z.number()]);

/** Route figures (planned or own), lengths in design units. Mirrors the API's answer; unknown keys are dropped. */
export const routeFiguresSchema = z.object({
  passes: z.number(),
  stops: z.number(),
  pieces: z.number(),
  oddPoints: z.number(),
  stitchLength: z.number(),
  travelLength: z.number(),
  retraceLength: z.number(),
  ditchLength: z.number(),
  edgeLength: z.number(),
  optimal: z.boolean().optional(),
});
export type RouteFigures = z.infer<typeof routeFiguresSchema>;

export const threadBudgetSchema = z.object({
  stitchCount: z.number(),
  topThreadYards: z.number(),
  bobbinThreadYards: z.number(),
  topThreadMeters: z.number(),
  bobbinThreadMeters: z.number(),
  bobbins: z.number(),
  sewingMinutes: z.number(),
  assumptions: z.array(z.object({ setting: z.string(), value: z.union([z.number(), z.string()]), source: z.string() })),
});
export type ThreadBudgetView = z.infer<typeof threadBudgetSchema>;

/** The gap check: the largest empty disc (centre, radius) and its diameter against the batting's limit. */
export const gapViewSchema = z.object({
  center: point,
  radius: z.number(),
  /** Diameter of the empty disc, design units. */
  widestGap: z.number(),
  /** The batting's spacing limit in design units, when the design states one. */
  limit: z.number().nullable(),
  status: z.enum(['within', 'over', 'at-limit', 'no-limit']),
});
export type GapView = z.infer<typeof gapViewSchema>;

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

const ownRouteSchema = routeFiguresSchema.extend({
  threadBudget: threadBudgetSchema,
  unstitched: z.object({ count: z.number(), length: z.number() }),
  warnings: z.array(z.object({ kind: z.string(), message: z.string() })),
});

const checkAnswerSchema = z.object({
  check: z.object({
    oddPoints: z.object({ count: z.number(), points: z.array(point) }),
    passesWithoutTravel: z.number(),
  }),
  plan: routeFiguresSchema,
  threadBudget: threadBudgetSchema,
  ownRoute: ownRouteSchema.nullable(),
  gap: gapViewSchema.nullable(),
});

/** The check card's model from the API's check answer; null when the answer has another shape. */
export function parseCheckAnswer(body: unknown): RouteCheckView | null {
  const parsed = checkAnswerSchema.safeParse(body);
  if (!parsed.success) return null;
  const a = parsed.data;
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
