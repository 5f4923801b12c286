// The date rules for classes and lessons, on a fixed clock (2026-12-05 10:00 UTC). The limits are our own choice,
// documented in DEVELOPERS.md ("Teaching dates"): common practice, no source.
import { describe, expect, it } from 'vitest';
import { checkClassStart, checkLessonRelease } from './teachingDates.ts';

const now = new Date('2026-12-05T10:00:00Z');
const kind = (r: { ok: boolean; error?: { kind: string } }) => (r.ok ? 'ok' : r.error!.kind);

describe('class start dates', () => {
  it('accepts today, yesterday (a teacher west of UTC) and the future; asks about the past; refuses a year ago or 5 years ahead', () => {
    expect(kind(checkClassStart('2026-12-05', now, false))).toBe('ok');
    expect(kind(checkClassStart('2026-12-04', now, false))).toBe('ok');
    expect(kind(checkClassStart('2027-01-05', now, false))).toBe('ok');
    expect(kind(checkClassStart('2026-12-03', now, false))).toBe('confirm');
    expect(kind(checkClassStart('2026-12-03', now, true))).toBe('ok');
    expect(kind(checkClassStart('1999-01-05', now, true))).toBe('refused');
    expect(kind(checkClassStart('2025-12-01', now, true))).toBe('refused');
    expect(kind(checkClassStart('2207-01-05', now, true))).toBe('refused');
  });

  it('names the date and says what to check', () => {
    const r = checkClassStart('1999-01-05', now, false);
    expect(r.ok).toBe(false);
    if (!r.ok) expect(r.error).toEqual({ kind: 'refused', field: 'startsOn', message: 'The start date 5 Jan 1999 is more than a year ago. Check the year.' });
  });
});

describe('lesson release dates', () => {
  it('asks about a release in the past (beyond five minutes) and one before the class starts; confirmed, both pass', () => {
    expect(kind(checkLessonRelease('2026-12-05T09:58:00Z', '2026-12-01', now, false))).toBe('ok');
    expect(kind(checkLessonRelease('2026-12-04T10:00:00Z', '2026-12-01', now, false))).toBe('confirm');
    expect(kind(checkLessonRelease('2026-12-04T10:00:00Z', '2026-12-01', now, true))).toBe('ok');
    expect(kind(checkLessonRelease('2026-12-20T10:00:00Z', '2027-01-05', now, false))).toBe('confirm');
    expect(kind(checkLessonRelease('2027-01-04T18:00:00Z', '2027-01-05', now, false))).toBe('ok');
    expect(kind(checkLessonRelease('2026-12-20T10:00:00Z', '2027-01-05', now, true))).toBe('ok');
  });

  it('refuses the issue\'s 1999 class with a 2001 release, confirmed or not', () => {
    expect(kind(checkLessonRelease('2001-03-01T09:00:00Z', '1999-01-05', now, true))).toBe('refused');
    expect(kind(checkLessonRelease('2033-03-01T09:00:00Z', '2027-01-05', now, true))).toBe('refused');
  });
});
