import { describe, expect, it } from 'vitest';
import { buildQuiltSchedule, type ScheduleLesson } from './quiltSchedule.ts';

const cells = [0, 1, 2, 3].map((column) => ({ row: 0, column }));
const lesson = (date: string, done: boolean, title: string | null = `Lesson on ${date}`, finishedBy: number | null = null): ScheduleLesson => ({ date, done, title, finishedBy });

describe('the quilt schedule', () => {
  it('one block a month from the start date; blocks dated before today are done, the first other one is next', () => {
    // Gregorian calendar: 2028 is a leap year (divisible by 4, not a century), so 31 January + 1 month → 29 February.
    const rows = buildQuiltSchedule(cells, { kind: 'monthly', start: '2028-01-31', today: '2028-03-15' });
    expect(rows.map((r) => [r.date, r.status])).toEqual([
      ['2028-01-31', 'done'],
      ['2028-02-29', 'done'],
      ['2028-03-31', 'next'],
      ['2028-04-30', 'later'],
    ]);
  });

  it('tied to a class: one block per dated lesson, done as the lesson says, and what comes next', () => {
    const rows = buildQuiltSchedule(cells, { kind: 'lessons', lessons: [lesson('2027-01-05', true), lesson('2027-01-12', false), lesson('2027-01-19', true), lesson('2027-01-26', false, null), lesson('2027-02-02', false)] });
    expect(rows.map((r) => [r.step, r.date, r.status, r.lessonTitle])).toEqual([
      [1, '2027-01-05', 'done', 'Lesson on 2027-01-05'],
      [2, '2027-01-12', 'next', 'Lesson on 2027-01-12'],
      [3, '2027-01-19', 'done', 'Lesson on 2027-01-19'],
      [4, '2027-01-26', 'later', null],
    ]);
  });

  it('a class with fewer lessons than blocks dates what it can and lists the rest without a lesson', () => {
    const rows = buildQuiltSchedule(cells, { kind: 'lessons', lessons: [lesson('2027-01-05', true, 'One', 3), lesson('2027-01-12', true, 'Two', 1)] });
    expect(rows.map((r) => [r.step, r.date, r.status, r.finishedBy])).toEqual([
      [1, '2027-01-05', 'done', 3],
      [2, '2027-01-12', 'done', 1],
      [3, null, 'no-lesson', null],
      [4, null, 'no-lesson', null],
    ]);
    expect(rows[2]!.cell).toEqual({ row: 0, column: 2 });
    expect(buildQuiltSchedule([], { kind: 'lessons', lessons: [] })).toEqual([]);
  });
});
