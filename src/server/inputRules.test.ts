import { describe, expect, it } from 'vitest';
import { calendarDate, daysInMonth, isoInstant, parseVersionText, pgInt, PG_INT_MAX } from './inputRules.ts';

describe('daysInMonth (Gregorian leap-year rule)', () => {
  it('gives February 29 days in 2028 and 2000, 28 in 2027 and 1900; 30 for April, June, September, November', () => {
    expect([2028, 2000, 2027, 1900].map((y) => daysInMonth(y, 2))).toEqual([29, 29, 28, 28]);
    expect([1, 3, 4, 6, 9, 11, 12].map((m) => daysInMonth(2027, m))).toEqual([31, 31, 30, 30, 30, 30, 31]);
  });
});

describe('calendarDate', () => {
  it('accepts days that exist and refuses those that do not', () => {
    for (const ok of ['2027-01-15', '2028-02-29', '2000-02-29', '2027-12-31', '9999-12-31']) expect(calendarDate.safeParse(ok).success, ok).toBe(true);
    for (const bad of ['2027-02-30', '2027-02-29', '1900-02-29', '2027-04-31', '2027-13-01', '2027-00-10', '2027-01-00', '0000-01-01', '1899-12-31', '2027-1-5', '+02027-01-01', 20270115]) {
      expect(calendarDate.safeParse(bad).success, String(bad)).toBe(false);
    }
  });
});

describe('isoInstant', () => {
  it('needs a zone and a real day in a four-digit year from 1900', () => {
    expect(isoInstant.safeParse('2027-01-15T09:00:00Z').success).toBe(true);
    expect(isoInstant.safeParse('2027-01-15T09:00:00+13:00').success).toBe(true);
    for (const bad of ['2027-02-30T09:00:00Z', '2027-01-15T09:00:00', '0000-01-01T00:00:00Z', '2027-01-15', 'tomorrow', 5]) expect(isoInstant.safeParse(bad).success, String(bad)).toBe(false);
  });
});

describe('pgInt and parseVersionText', () => {
  it('stop at 2^31 − 1, the largest PostgreSQL integer', () => {
    expect(pgInt().safeParse(PG_INT_MAX).success).toBe(true);
    for (const bad of [PG_INT_MAX + 1, 1e300, 0, 1.5, Number.NaN, '1']) expect(pgInt().safeParse(bad).success, String(bad)).toBe(false);
    expect(parseVersionText('3')).toBe(3);
    expect(parseVersionText(String(PG_INT_MAX))).toBe(PG_INT_MAX);
    for (const bad of [null, undefined, '', '0', '01', '-1', '1.0', '1e3', '2147483648', '99999999999', ' 1', 'abc']) expect(parseVersionText(bad), String(bad)).toBeNull();
  });
});
