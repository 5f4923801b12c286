import { assertNever } from '../assertNever.ts';
import type { Cell } from './quilt.schema.ts';
import { addMonths, scheduleBlocks, type CalendarDate } from './schedule.ts';

/** One dated lesson of the class the quilt belongs to, in date order, with whether it counts as done. */
export interface ScheduleLesson {
  readonly date: CalendarDate;
  /** Null when the viewer may not see it yet (a student, before the lesson is released). */
  readonly title: string | null;
  readonly done: boolean;
  /** For the class's teacher: how many students have finished the lesson; otherwise null. */
  readonly finishedBy: number | null;
}

/**
 * Where the dates come from: one block a month from `start` (a block whose date is before `today` counts as done),
 * or the class's dated lessons, one block per lesson, done as each lesson says.
 */
export type ScheduleSource =
  | { readonly kind: 'monthly'; readonly start: CalendarDate; readonly today: CalendarDate }
  | { readonly kind: 'lessons'; readonly lessons: readonly ScheduleLesson[] };

export interface ScheduleRow {
  /** 1 for the first block quilted. */
  readonly step: number;
  readonly cell: Cell;
  /** Null for a block beyond the class's last lesson. */
  readonly date: CalendarDate | null;
  /** `next`: the first block in the order not yet done; `no-lesson`: the class has no lesson for it yet. */
  readonly status: 'done' | 'next' | 'later' | 'no-lesson';
  readonly lessonTitle: string | null;
  readonly finishedBy: number | null;
}

/**
 * The quilt's schedule: its blocks in quilting order (`order`), each with its date and whether it is done, and the
 * first not done marked next (schedule.ts `scheduleBlocks`). Blocks beyond the class's lessons are listed without a
 * date. Pure: `today` is passed in.
 */
export function buildQuiltSchedule(order: readonly Cell[], source: ScheduleSource): ScheduleRow[] {
  switch (source.kind) {
    case 'monthly': {
      const finished = order.filter((_, i) => addMonths(source.start, i) < source.today);
      return rowsOf(scheduleBlocks(order, { kind: 'monthly', start: source.start }, finished), () => ({ lessonTitle: null, finishedBy: null }));
    }
    case 'lessons': {
      const k = Math.min(order.length, source.lessons.length);
      const lessons = source.lessons.slice(0, k);
      const dated = order.slice(0, k);
      const finished = dated.filter((_, i) => lessons[i]!.done);
      const rows = rowsOf(scheduleBlocks(dated, { kind: 'lessons', dates: lessons.map((l) => l.date) }, finished), (i) => ({ lessonTitle: lessons[i]!.title, finishedBy: lessons[i]!.finishedBy }));
      const beyond = order.slice(k).map((cell, j): ScheduleRow => ({ step: k + j + 1, cell, date: null, status: 'no-lesson', lessonTitle: null, finishedBy: null }));
      return [...rows, ...beyond];
    }
    default:
      return assertNever(source);
  }
}

function rowsOf(result: ReturnType<typeof scheduleBlocks>, extra: (i: number) => Pick<ScheduleRow, 'lessonTitle' | 'finishedBy'>): ScheduleRow[] {
  // Both callers give as many dates as blocks, the only way scheduleBlocks refuses.
  if (!result.ok) throw new Error(`quilt/quiltSchedule: ${result.error.message}`);
  return result.value.map((b, i) => ({ ...b, ...extra(i) }));
}
