import { z } from 'zod';
import { routeFiguresSchema } from './routeCheckView.ts';

const strokeSchema = z.object({
  pass: z.number().int(),
  kind: z.enum(['stitch', 'retrace', 'ditch', 'edge']),
  points: z.array(z.tuple([z.number(), z.number()])).min(2),
});

/** POST /api/designs/:id/plan → { plan: figures + route }. */
export const planAnswerSchema = z.object({
  plan: routeFiguresSchema.extend({ route: z.array(strokeSchema) }),
});
export type PlanAnswer = z.infer<typeof planAnswerSchema>['plan'];

/** GET/PUT /api/designs/:id/route → { route: saved route | null }. */
export const savedRouteAnswerSchema = z.object({
  route: z
    .object({
      kind: z.enum(['planned', 'own']),
      designVersion: z.number().int(),
      current: z.boolean(),
      strokes: z.array(strokeSchema),
    })
    .nullable(),
});
export type SavedRoute = NonNullable<z.infer<typeof savedRouteAnswerSchema>['route']>;
