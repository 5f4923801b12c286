// The saved route and its figures as a template keeps them. The strokes are the planner's (shared/route/
// routeStrokes.ts); the figures are the route check summary the design endpoints stored with the route.
// Both are parsed when read from jsonb, and unknown figure keys are kept (the summary may grow).
import { z } from 'zod';
import { pointSchema } from '@shared/design/design.schema.ts';

export const strokeSchema = z.object({
  pass: z.number().int().min(0),
  kind: z.enum(['stitch', 'retrace', 'ditch', 'edge']),
  points: z.array(pointSchema).min(2),
  length: z.number().finite().min(0).optional(),
});
export const routeStrokesSchema = z.array(strokeSchema).max(200_000);
export type RouteStroke = z.infer<typeof strokeSchema>;

export const routeFiguresSchema = z.looseObject({
  passes: z.number().optional(),
  stops: z.number().optional(),
  stitchLength: z.number().optional(),
  retraceLength: z.number().optional(),
  ditchLength: z.number().optional(),
  edgeLength: z.number().optional(),
  travelLength: z.number().optional(),
});
export type RouteFigures = z.infer<typeof routeFiguresSchema>;
