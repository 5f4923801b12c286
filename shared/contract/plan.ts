// The planner's answer (POST /api/designs/:id/plan): the route, its figures and the proof of its travel, the
// stops-vs-travel table and where every thread end sits.
import { z } from 'zod';
import { pointSchema, unitsSchema } from '../design/design.schema.ts';
import { planSettingsSchema } from '../route/planSettings.ts';
import { planFiguresSchema, threadBudgetSchema } from './figures.ts';
import { strokePathsSchema } from './strokes.ts';
import type { Wire } from './wire.ts';

/** A measured figure; zod 4 numbers refuse NaN and ±Infinity, so an answer that JSON turned into null fails. */
const figure = z.number();

/** One row of the stops-vs-travel table: the least travel with up to `extraStops` stops beyond the fewest passes. */
export const stopsTableRowSchema = z.object({
  extraStops: figure,
  passes: figure,
  stops: figure,
  travelLength: figure,
  travelCost: figure,
  travelLowerBound: figure,
  optimal: z.boolean(),
  gapPercent: figure,
});
export type StopsTableRowAnswer = Wire<z.infer<typeof stopsTableRowSchema>>;

/** A pass's start or tie-off: where it sits (edge, seam, open) and why (threadEnds.ts). */
export const threadEndSchema = z.object({
  pass: z.number().int().positive(),
  end: z.enum(['start', 'tie-off']),
  vertex: figure,
  point: pointSchema,
  place: z.enum(['edge', 'seam', 'open']),
  reason: z.enum(['fixed', 'hidden', 'no-hidden-place']),
});
export type ThreadEndAnswer = Wire<z.infer<typeof threadEndSchema>>;

/** The plan itself: figures, strokes and everything the route panel shows about it. */
export const planResultSchema = planFiguresSchema.extend({
  units: unitsSchema,
  route: strokePathsSchema,
  threadBudget: threadBudgetSchema,
  /** The same bound as `travelLowerBound` (design units), under the name the planner's answer uses. */
  lowerBound: figure,
  /** (travel − lower bound) / travel in percent: 0 when proven. */
  gapPercent: figure,
  /** Least travel for 0–3 extra stops. */
  stopsTable: z.array(stopsTableRowSchema),
  threadEnds: z.array(threadEndSchema),
  /** The settings the plan was made with (defaults filled in). */
  settings: planSettingsSchema,
  /** The exact search's figures; null when it was not needed. */
  exactSearch: z.object({ keptVertices: figure, ms: figure }).nullable(),
});
export type PlanResult = Wire<z.infer<typeof planResultSchema>>;

/** POST /api/designs/:id/plan → the plan of the saved version (`draft: false`) or of the draft it was sent. */
export const planAnswerSchema = z.object({ designVersion: z.number().int().positive(), draft: z.boolean(), plan: planResultSchema });
export type PlanAnswer = Wire<z.infer<typeof planAnswerSchema>>;
