// GET /api/quilts/:id/schedule and PUT /api/quilts/:id/schedule: the quilt's block schedule (shared/quilt/quiltSchedule.ts)
// — one block per dated lesson of the class it belongs to, or one a month from a start date — with what is done and
// what is next, and the classes the owner may tie it to (ones they teach or are enrolled in).
import { z } from 'zod';
import { cellSchema } from '../quilt/quilt.schema.ts';
import { calendarDateSchema } from '../quilt/schedule.ts';
import type { Wire } from './wire.ts';

const UUID = /^[0-9a-f]{8}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{12}$/i;

/** PUT body: the class (null: none, one block a month) and the monthly start (null: the day the quilt was made). */
export const quiltScheduleSettingsSchema = z.object({ classId: z.string().regex(UUID).nullable(), start: calendarDateSchema.nullable() }).strict();
export type QuiltScheduleSettings = z.infer<typeof quiltScheduleSettingsSchema>;

const standingSchema = z.enum(['teacher', 'student']);

export const quiltScheduleSchema = z.object({
  classId: z.string().nullable(),
  start: z.string().nullable(),
  /** What gives the dates: the class's lessons, or one block a month from `monthlyStart`. */
  source: z.discriminatedUnion('kind', [
    z.object({ kind: z.literal('monthly'), monthlyStart: z.string() }),
    z.object({ kind: z.literal('class'), classTitle: z.string(), standing: standingSchema, lessons: z.number().int().min(0) }),
  ]),
  /** The server's day (UTC) the statuses were worked out on. */
  today: z.string(),
  classes: z.array(z.object({ id: z.string(), title: z.string(), standing: standingSchema })),
  rows: z.array(
    z.object({
      step: z.number().int().positive(),
      cell: cellSchema,
      date: z.string().nullable(),
      status: z.enum(['done', 'next', 'later', 'no-lesson']),
      lessonTitle: z.string().nullable(),
      finishedBy: z.number().int().min(0).nullable(),
    }),
  ),
});
export type QuiltSchedule = Wire<z.infer<typeof quiltScheduleSchema>>;
export const quiltScheduleAnswerSchema = z.object({ schedule: quiltScheduleSchema });
