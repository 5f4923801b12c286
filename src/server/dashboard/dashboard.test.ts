// nextLessons: which lesson a student sees first on the dashboard. Worked cases by hand (no outside source: the
// rule is ours and is stated in dashboard.ts).
import { describe, expect, it } from 'vitest';
import { nextLessons, type LessonWithProgress } from './dashboard.ts';

const day = (d: number) => new Date(Date.UTC(2026, 11, d));
function lesson(classId: string, n: number, over: Partial<LessonWithProgress>): LessonWithProgress {
  return { classId, classTitle: classId, lessonId: `${classId}-${n}`, lessonTitle: `Week ${n}`, releaseAt: day(n), released: true, stepIndex: null, totalSteps: null, finished: false, ...over };
}

describe('nextLessons', () => {
  it('offers the first released lesson not finished, as start or continue', () => {
    const rows = [lesson('a', 1, { finished: true, stepIndex: 9, totalSteps: 9 }), lesson('a', 2, { stepIndex: 3, totalSteps: 9 }), lesson('a', 3, { released: false })];
    expect(nextLessons(rows, 3).map((l) => [l.lessonId, l.kind])).toEqual([['a-2', 'continue']]);
    expect(nextLessons([lesson('a', 1, {})], 3)[0]?.kind).toBe('start');
  });

  it('when every released lesson is finished, names the next one to come', () => {
    const rows = [lesson('a', 1, { finished: true }), lesson('a', 5, { released: false }), lesson('a', 9, { released: false })];
    expect(nextLessons(rows, 3).map((l) => [l.lessonId, l.kind])).toEqual([['a-5', 'coming']]);
  });

  it('gives nothing for a class with every lesson finished, puts work before what is coming, and keeps the limit', () => {
    const rows = [
      lesson('done', 1, { finished: true }),
      lesson('later', 2, { released: false }),
      lesson('now', 4, {}),
      lesson('also', 3, { stepIndex: 1, totalSteps: 5 }),
    ];
    expect(nextLessons(rows, 3).map((l) => l.lessonId)).toEqual(['also-3', 'now-4', 'later-2']);
    expect(nextLessons(rows, 2).map((l) => l.lessonId)).toEqual(['also-3', 'now-4']);
  });
});
