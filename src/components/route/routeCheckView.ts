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

export const gapViewSchema = z.object({
  centre: point,
  radius: z.number(),
  /** The batting's spacing limit in design units, when one is known. */
  limit: z.number().nullable().optional(),
  ok: z.boolean().optional(),
});
export type GapView = z.infer<typeof gapViewSchema>;

/** Everything the route check card and the canvas overlays show. */
export interface RouteCheckView {
  readonly planned: RouteFigures;
  readonly passesWithoutTravel: number;
  readonly oddPointPositions: readonly (readonly [number, number])[];
  readonly thread: ThreadBudgetView;
  readonly own: { readonly figures: RouteFigures; readonly thread: ThreadBudgetView | null } | null;
  readonly gap: GapView | null;
  readonly warnings: readonly string[];
}

const checkAnswerSchema = z.object({
  check: z.object({
    oddPoints: z.object({ count: z.number(), points: z.array(point) }),
    passesWithoutTravel: z.number(),
  }),
  plan: routeFiguresSchema,
  threadBudget: threadBudgetSchema,
  ownRoute: z.object({ figures: routeFiguresSchema, threadBudget: threadBudgetSchema.nullable().optional() }).nullable().optional(),
  gap: gapViewSchema.nullable().optional(),
  warnings: z.array(z.union([z.string(), z.object({ message: z.string() })])).optional(),
});

/** The check card's model from the API's check answer; null when the answer has another shape. */
export function parseCheckAnswer(body: unknown): RouteCheckView | null {
  const parsed = checkAnswerSchema.safeParse(body);
  if (!parsed.success) return null;
  const a = parsed.data;
  return {
    planned: a.plan,
    passesWithoutTravel: a.check.passesWithoutTravel,
    oddPointPositions: a.check.oddPoints.points,
    thread: a.threadBudget,
    own: a.ownRoute ? { figures: a.ownRoute.figures, thread: a.ownRoute.threadBudget ?? null } : null,
    gap: a.gap ?? null,
    warnings: (a.warnings ?? []).map((w) => (typeof w === 'string' ? w : w.message)),
  };
}
