import { z } from 'zod';
import { assertNever } from '../assertNever.ts';
import { err, ok, type Result } from '../result.ts';
import type { Cell } from './quilt.schema.ts';

/** A calendar day as `YYYY-MM-DD` (Gregorian), a day that exists (no 2027-02-30). */
export const calendarDateSchema = z
  .string()
  .regex(/^\d{4}-\d{2}-\d{2}$/, 'Give the date as YYYY-MM-DD.')
  .refine((s) => parseDate(s) !== null, 'That day does not exist.');
export type CalendarDate = z.infer<typeof calendarDateSchema>;

/** One block a month from `start` (the same day of the month, or the month's last day), or one per dated lesson. */
export const cadenceSchema = z.discriminatedUnion('kind', [
  z.object({ kind: z.literal('monthly'), start: calendarDateSchema }).strict(),
  z.object({ kind: z.literal('lessons'), dates: z.array(calendarDateSchema).max(400) }).strict(),
]);
export type Cadence = z.infer<typeof cadenceSchema>;

export interface ScheduledBlock {
  /** 1 for the first block quilted. */
  readonly step: number;
  readonly cell: Cell;
  readonly date: CalendarDate;
  /** `next`: the first block in the order not yet finished; `later`: the others not finished. */
  readonly status: 'done' | 'next' | 'later';
}

export type ScheduleProblem = { readonly kind: 'too-few-lessons'; readonly blocks: number; readonly lessons: number; readonly message: string };

/**
 * The quilt's schedule: the blocks in quilting order, one per month or per lesson, with what is finished and what
 * comes next. `finished` holds cells the quilter has marked done, in any order. Pure: no clock is read.
 */
export function scheduleBlocks(order: readonly Cell[], cadence: Cadence, finished: readonly Cell[]): Result<ScheduledBlock[], ScheduleProblem> {
  let dates: CalendarDate[];
  switch (cadence.kind) {
    case 'monthly':
      dates = order.map((_, i) => addMonths(cadence.start, i));
      break;
    case 'lessons':
      if (cadence.dates.length < order.length) {
        return err({ kind: 'too-few-lessons', blocks: order.length, lessons: cadence.dates.length, message: `The quilt has ${order.length} blocks but the class has ${cadence.dates.length} dated lessons.` });
      }
      dates = cadence.dates.slice(0, order.length);
      break;
    default:
      return assertNever(cadence);
  }
  const done = new Set(finished.map((c) => `${c.row}:${c.column}`));
  let nextGiven = false;
  return ok(
    order.map((cell, i): ScheduledBlock => {
      const isDone = done.has(`${cell.row}:${cell.column}`);
      const status = isDone ? 'done' : nextGiven ? 'later' : 'next';
      if (status === 'next') nextGiven = true;
      return { step: i + 1, cell, date: dates[i]!, status };
    }),
  );
}

/** The same day `months` months on; a day past the month's end becomes its last day (31 January + 1 → 28/29 February). */
export function addMonths(date: CalendarDate, months: number): CalendarDate {
  const parsed = parseDate(date);
  if (!parsed) throw new Error(`quilt/schedule: ${date} is not a calendar date`);
  const index = parsed.month - 1 + months;
  const year = parsed.year + Math.floor(index / 12);
  const month = (((index % 12) + 12) % 12) + 1;
  const day = Math.min(parsed.day, daysInMonth(year, month));
  return `${String(year).padStart(4, '0')}-${String(month).padStart(2, '0')}-${String(day).padStart(2, '0')}`;
}

/** Gregorian: a leap year is divisible by 4, except centuries not divisible by 400. */
export function daysInMonth(year: number, month: number): number {
  if (month === 2) return year % 4 === 0 && (year % 100 !== 0 || year % 400 === 0) ? 29 : 28;
  return [4, 6, 9, 11].includes(month) ? 30 : 31;
}

function parseDate(s: string): { year: number; month: number; day: number } | null {
  const m = /^(\d{4})-(\d{2})-(\d{2})$/.exec(s);
  if (!m) return null;
  const [year, month, day] = [Number(m[1]), Number(m[2]), Number(m[3])];
  if (month < 1 || month > 12 || day < 1 || day > daysInMonth(year, month)) return null;
  return { year, month, day };
}
