// A route's strokes as the API sends them, design_route stores them, templates keep them and the walkthrough and
// the print SVG read them. This is the only declaration of the stroke kinds: every other module uses these.
import { z } from 'zod';
import { pointSchema } from '../design/design.schema.ts';
import type { Wire } from './wire.ts';

/** What the needle does along a stroke: stitch a quilting line, or travel over one (retrace), a seam (ditch) or the
 * block edge inside the binding band (edge). */
export const STROKE_KINDS = ['stitch', 'retrace', 'ditch', 'edge'] as const;
export const strokeKindSchema = z.enum(STROKE_KINDS);
export type StrokeKind = z.infer<typeof strokeKindSchema>;

/** The most strokes one route may have (a design caps its points at 200,000; a stroke has at least two). */
export const MAX_ROUTE_STROKES = 200_000;

/**
 * One stroke: a run of one kind within one pass (passes count from 1), its polyline in stitching order (design
 * units) and its length. Consecutive strokes of a pass share their end and start point.
 */
export const strokePathSchema = z.object({
  pass: z.number().int().positive(),
  kind: strokeKindSchema,
  points: z.array(pointSchema).min(2),
  length: z.number().min(0),
});
export type StrokePath = Wire<z.infer<typeof strokePathSchema>>;

/** A whole route: strokes in stitching order. */
export const strokePathsSchema = z.array(strokePathSchema).max(MAX_ROUTE_STROKES);
