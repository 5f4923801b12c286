// Zod pieces for values that reach PostgreSQL columns with narrower ranges than JavaScript's: whole numbers
// that fit `integer`, calendar dates that exist, instants within four-digit years. Without them a request such as
// startsOn 2027-02-30 or version 99999999999 passed validation and failed in the database (a 500).
import { z } from 'zod';
import { namedMessage } from '@shared/forms/plainMessages.ts';

/** Largest value of a PostgreSQL `integer` (int4): 2^31 − 1 (PostgreSQL manual, "Numeric Types"). */
export const PG_INT_MAX = 2_147_483_647;

/** A whole number an `integer` column holds, from `min`. */
export const pgInt = (min = 1) =>
  z
    .number(namedMessage('must be a whole number.'))
    .int(namedMessage('must be a whole number.'))
    .min(min)
    .max(PG_INT_MAX);

/** Days in a month of the Gregorian calendar: 30 days hath September…; February 29 in years divisible by 4,
 *  except centuries not divisible by 400 (the Gregorian leap-year rule). */
export function daysInMonth(year: number, month: number): number {
  if (month === 2) return (year % 4 === 0 && year % 100 !== 0) || year % 400 === 0 ? 29 : 28;
  return [4, 6, 9, 11].includes(month) ? 30 : 31;
}

const YEARS = { min: 1900, max: 9999 } as const;

/** "YYYY-MM-DD" naming a day that exists, in years 1900–9999. */
export function isCalendarDate(s: string): boolean {
  const m = /^(\d{4})-(\d{2})-(\d{2})$/.exec(s);
  if (!m) return false;
  const [year, month, day] = [Number(m[1]), Number(m[2]), Number(m[3])];
  return year >= YEARS.min && year <= YEARS.max && month >= 1 && month <= 12 && day >= 1 && day <= daysInMonth(year, month);
}

export const calendarDate = z
  .string(namedMessage('must be a date like 2027-01-15.'))
  .regex(/^\d{4}-\d{2}-\d{2}$/, namedMessage('must be a date like 2027-01-15.'))
  .refine(isCalendarDate, namedMessage(`must be a real day (February has no 30th) in a year from ${YEARS.min} to ${YEARS.max}.`));

/** An ISO 8601 date and time with a zone (Z or ±hh:mm), a real day, in years 1900–9999. */
export const isoInstant = z
  .string(namedMessage('must be a date and time, e.g. 2027-01-15T09:00:00Z.'))
  .pipe(z.iso.datetime({ offset: true, ...namedMessage('must be a date and time, e.g. 2027-01-15T09:00:00Z.') }))
  .refine((s) => isCalendarDate(s.slice(0, 10)), namedMessage(`must be in a year from ${YEARS.min} to ${YEARS.max}.`));

/** A version number from a path segment or query string ("3"); null when it is not one a version can have. */
export function parseVersionText(raw: string | null | undefined): number | null {
  if (raw === null || raw === undefined || !/^[1-9]\d{0,9}$/.test(raw)) return null;
  const n = Number(raw);
  return n <= PG_INT_MAX ? n : null;
}
