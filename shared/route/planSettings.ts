import { z } from 'zod';
import { MAX_EXTRA_STOPS } from './stopsTable.ts';

/** Default time for the exact search per plan (ms): a 12 in block with up to 40 pieces proves itself well within it. */
export const DEFAULT_TIME_BUDGET_MS = 2_000;
/** Longest a request may ask for: the engine pool stops a job at 8 s, and planning needs time besides the search. */
export const MAX_TIME_BUDGET_MS = 6_000;

/**
 * What a quilter (or a script) may set per plan request:
 * - `timeBudgetMs`: how long the exact search may run before the best route found so far is returned with its bound;
 * - `extraStops`: stops allowed beyond the fewest passes (0–3), where each saves travel;
 * - `hiddenEndAllowance`: how much more travel (design units) one thread end on a seam or at the edge may cost
 *   instead of one in the open middle of a patch (0: only among routes of equal travel).
 */
export const planSettingsSchema = z
  .object({
    timeBudgetMs: z
      .number()
      .int('Give the time budget in whole milliseconds.')
      .min(100, 'Allow the planner at least 100 ms.')
      .max(MAX_TIME_BUDGET_MS, `Allow the planner at most ${MAX_TIME_BUDGET_MS} ms.`)
      .default(DEFAULT_TIME_BUDGET_MS),
    extraStops: z
      .number()
      .int('Give extra stops as a whole number.')
      .min(0, 'Extra stops cannot be negative.')
      .max(MAX_EXTRA_STOPS, `At most ${MAX_EXTRA_STOPS} extra stops.`)
      .default(0),
    hiddenEndAllowance: z.number().finite().min(0, 'The allowance cannot be negative.').max(100, 'Keep the allowance to at most 100 (design units).').default(0),
  })
  .strict();
export type PlanSettings = z.output<typeof planSettingsSchema>;
export type PlanSettingsInput = z.input<typeof planSettingsSchema>;

export const DEFAULT_PLAN_SETTINGS: PlanSettings = planSettingsSchema.parse({});
