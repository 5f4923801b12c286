import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { addMonths, calendarDateSchema, daysInMonth, scheduleBlocks } from './schedule.ts';

const cells = [0, 1, 2, 3].map((column) => ({ row: 0, column }));

describe('addMonths and daysInMonth', () => {
  it('agree with the ECMAScript calendar (Date.UTC, proleptic Gregorian) for every month 1900–2400', () => {
    // Outside reference: the JavaScript engine's own date arithmetic (ECMA-262 §21.4.1, MakeDay).
    for (let year = 1900; year <= 2400; year++) {
      for (let month = 1; month <= 12; month++) expect(daysInMonth(year, month)).toBe(new Date(Date.UTC(year, month, 0)).getUTCDate());
    }
  });

  it('clamps to the last day of a shorter month, and otherwise lands on the same day as Date.UTC', () => {
    expect(addMonths('2026-01-31', 1)).toBe('2026-02-28');
    expect(addMonths('2028-01-31', 1)).toBe('2028-02-29');
    expect(addMonths('2026-12-15', 2)).toBe('2027-02-15');
    fc.assert(
      fc.property(fc.integer({ min: 1950, max: 2150 }), fc.integer({ min: 1, max: 12 }), fc.integer({ min: 1, max: 28 }), fc.integer({ min: 0, max: 60 }), (y, m, d, k) => {
        const start = `${y}-${String(m).padStart(2, '0')}-${String(d).padStart(2, '0')}`;
        expect(addMonths(start, k)).toBe(new Date(Date.UTC(y, m - 1 + k, d)).toISOString().slice(0, 10));
      }),
    );
  });

  it('refuses days that do not exist', () => {
    expect(calendarDateSchema.safeParse('2027-02-29').success).toBe(false);
    expect(calendarDateSchema.safeParse('2028-02-29').success).toBe(true);
    expect(calendarDateSchema.safeParse('2027-13-01').success).toBe(false);
  });
});

describe('scheduleBlocks', () => {
  it('one block a month from the start, with the first unfinished block next', () => {
    const r = scheduleBlocks(cells, { kind: 'monthly', start: '2027-01-31' }, [cells[0]!, cells[2]!]);
    expect(r.ok && r.value.map((b) => [b.step, b.date, b.status])).toEqual([
      [1, '2027-01-31', 'done'],
      [2, '2027-02-28', 'next'],
      [3, '2027-03-31', 'done'],
      [4, '2027-04-30', 'later'],
    ]);
  });

  it('one block per dated lesson, extra lessons unused; too few lessons is refused', () => {
    const dates = ['2027-03-02', '2027-03-09', '2027-03-16', '2027-03-23', '2027-03-30'];
    const r = scheduleBlocks(cells, { kind: 'lessons', dates }, []);
    expect(r.ok && r.value.map((b) => b.date)).toEqual(dates.slice(0, 4));
    const short = scheduleBlocks(cells, { kind: 'lessons', dates: dates.slice(0, 3) }, []);
    expect(!short.ok && short.error).toMatchObject({ kind: 'too-few-lessons', blocks: 4, lessons: 3 });
  });

  it('exactly one block is next unless all are done', () => {
    fc.assert(
      fc.property(fc.subarray(cells), (finished) => {
        const r = scheduleBlocks(cells, { kind: 'monthly', start: '2027-05-01' }, finished);
        if (!r.ok) throw new Error('unexpected');
        expect(r.value.filter((b) => b.status === 'next')).toHaveLength(finished.length === cells.length ? 0 : 1);
        expect(r.value.filter((b) => b.status === 'done')).toHaveLength(finished.length);
      }),
    );
  });
});
