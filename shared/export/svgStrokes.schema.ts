// Route strokes read from outside (e.g. a stored template version) before the SVG builder draws them. The builder
// writes a stroke's kind and pass number into attributes, so only these shapes may reach it.
import { z } from 'zod';
import { pointSchema } from '../design/design.schema.ts';

export const svgStrokesSchema = z.array(
  z.object({
    pass: z.number().int().min(0),
    kind: z.enum(['stitch', 'retrace', 'ditch', 'edge']),
    points: z.array(pointSchema).min(1),
  }),
);
