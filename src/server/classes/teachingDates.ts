// Sanity rules for the dates a teacher types: a class start and a lesson release. A date that cannot be meant
// (more than a year ago, more than five years ahead: almost always a mistyped year) is refused; a date that may be
// meant but is easy to get wrong (in the past, or a lesson opening before its class starts) needs the teacher's
// explicit yes (`confirmed: true` in the body, asked by the pages). Only dates that change are checked, so editing
// the title of a lesson released last month asks nothing. Pure: the clock is passed in.
import { formatDate, WITHOUT_VIEWER } from '@shared/format/dates.ts';
import { err, ok, type Result } from '@shared/result.ts';
import { problem } from '../http.ts';

const DAY_MS = 24 * 60 * 60 * 1000;
/** Dates further back than this are refused, not asked about: nobody schedules a class a year ago. */
export const PAST_LIMIT_DAYS = 366;
/** Dates further ahead than this are refused: a typo such as 2207 for 2027. */
export const FUTURE_LIMIT_YEARS = 5;
/** A release this close behind the clock counts as "now" (the release field has minutes, the form takes a moment). */
export const RELEASE_GRACE_MS = 5 * 60 * 1000;

export type DateProblem =
  /** Refused whatever the teacher says. */
  | { kind: 'refused'; field: 'startsOn' | 'releaseAt'; message: string }
  /** Accepted once the teacher confirms. */
  | { kind: 'confirm'; field: 'startsOn' | 'releaseAt'; message: string };

/** "5 Jan 2027" for a day a person reads (the UTC day of the instant, written the one way: shared/format/dates.ts). */
const dayText = (t: number) => formatDate(t, 'day', WITHOUT_VIEWER);
/** "2027-01-05": the UTC calendar day of an instant, for comparing days. */
const dayOf = (t: number) => new Date(t).toISOString().slice(0, 10);
/** Midnight UTC of a "YYYY-MM-DD" calendar date. */
const startOfDay = (date: string) => Date.parse(`${date}T00:00:00Z`);

function farOff(field: 'startsOn' | 'releaseAt', what: string, day: string, t: number, now: number): DateProblem | null {
  if (t < now - PAST_LIMIT_DAYS * DAY_MS) return { kind: 'refused', field, message: `The ${what} ${day} is more than a year ago. Check the year.` };
  if (t > now + FUTURE_LIMIT_YEARS * 365.25 * DAY_MS) return { kind: 'refused', field, message: `The ${what} ${day} is more than ${FUTURE_LIMIT_YEARS} years ahead. Check the year.` };
  return null;
}

/**
 * A new or changed class start date ("YYYY-MM-DD"). Calendar dates carry no time zone, so "in the past" allows a
 * day: a teacher west of UTC may still be on yesterday's date.
 */
export function checkClassStart(startsOn: string, now: Date, confirmed: boolean): Result<void, DateProblem> {
  const t = startOfDay(startsOn);
  const far = farOff('startsOn', 'start date', dayText(t), t, now.getTime());
  if (far) return err(far);
  if (!confirmed && t < startOfDay(dayOf(now.getTime())) - DAY_MS) {
    return err({ kind: 'confirm', field: 'startsOn', message: `The start date ${dayText(t)} is in the past. Keep it?` });
  }
  return ok(undefined);
}

/**
 * A new or changed lesson release instant (ISO). A release in the past opens the lesson to students at once; a
 * release more than a day before the class's start date (`classStartsOn`) is allowed (a welcome lesson) but asked.
 */
export function checkLessonRelease(releaseAt: string, classStartsOn: string, now: Date, confirmed: boolean): Result<void, DateProblem> {
  const t = Date.parse(releaseAt);
  const day = dayText(t);
  const far = farOff('releaseAt', 'release date', day, t, now.getTime());
  if (far) return err(far);
  if (confirmed) return ok(undefined);
  if (t < now.getTime() - RELEASE_GRACE_MS) {
    return err({ kind: 'confirm', field: 'releaseAt', message: `The release date ${day} is in the past: students can open the lesson as soon as you save. Keep it?` });
  }
  if (t < startOfDay(classStartsOn) - DAY_MS) {
    return err({ kind: 'confirm', field: 'releaseAt', message: `This lesson opens on ${day}, before the class starts on ${dayText(startOfDay(classStartsOn))}. Keep it?` });
  }
  return ok(undefined);
}

/** 400 naming the field for a refused date; 409 `needs_confirmation` (ask, then send again with confirmed) otherwise. */
export function dateProblemResponse(p: DateProblem): Response {
  return p.kind === 'refused'
    ? problem(400, 'invalid_input', p.message, { [p.field]: p.message })
    : problem(409, 'needs_confirmation', p.message, { [p.field]: p.message });
}
