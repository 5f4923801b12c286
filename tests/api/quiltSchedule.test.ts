// Issue 15: a quilt's schedule. Tied to a class, one block per dated lesson in the quilting order: for the teacher a
// lesson is done once its date has passed (with how many students finished it), for a student once they finished it;
// otherwise one block a month from a start date. Only the owner's own classes may be chosen.
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { closeTestDb } from '../helpers/db.ts';
import { demoGuild, signIn, type TestAccount } from '../helpers/accounts.ts';
import { buildWorld, expectStatus, insertDesignWithRoute, type World } from './teachingWorld.ts';

let w: World;
let teacherQuilt: string;
let studentQuilt: string;

async function makeQuilt(owner: TestAccount, columns: number): Promise<string> {
  const designId = await insertDesignWithRoute(owner, 4);
  const cell = { designId, rotation: 0, mirror: false };
  const body = await expectStatus(
    owner.client.post('/api/quilts', {
      title: 'Quilt-along top',
      quilt: { version: 1, units: 'in', rows: 1, columns, block: { width: 12, height: 12 }, placements: [Array.from({ length: columns }, () => cell)], order: { kind: 'serpentine' } },
    }),
    201,
  );
  return body.quilt.id;
}

/** Today as the server's schedule counts it (UTC). */
const todayUtc = () => new Date().toISOString().slice(0, 10);

beforeAll(async () => {
  w = await buildWorld();
  teacherQuilt = await makeQuilt(w.teacher, 3);
  studentQuilt = await makeQuilt(w.student, 2);
});
afterAll(closeTestDb);

describe('a quilt schedule', () => {
  it('without a class: one block a month from the day the quilt was made, then from the start chosen', async () => {
    const first = await expectStatus(w.teacher.client.get(`/api/quilts/${teacherQuilt}/schedule`), 200);
    expect(first.schedule.source).toEqual({ kind: 'monthly', monthlyStart: todayUtc() });
    expect(first.schedule.rows[0]).toMatchObject({ step: 1, cell: { row: 0, column: 0 }, date: todayUtc(), status: 'next' });
    expect(first.schedule.classes).toEqual([{ id: w.classId, title: 'Tuesday quilt-along', standing: 'teacher' }]);
    // Gregorian calendar: 2025 is not a leap year, so 31 January + 1 month → 28 February; all three dates have passed.
    const set = await expectStatus(w.teacher.client.put(`/api/quilts/${teacherQuilt}/schedule`, { classId: null, start: '2025-01-31' }), 200);
    expect(set.schedule.rows.map((r: { date: string; status: string }) => [r.date, r.status])).toEqual([
      ['2025-01-31', 'done'],
      ['2025-02-28', 'done'],
      ['2025-03-31', 'done'],
    ]);
  });

  it("tied to the teacher's class: one block per dated lesson, done once the date has passed, with students' progress", async () => {
    await expectStatus(w.student.client.put(`/api/lessons/${w.releasedLessonId}/progress`, { stepIndex: 5, totalSteps: 5, finished: true }), 200);
    const { schedule } = await expectStatus(w.teacher.client.put(`/api/quilts/${teacherQuilt}/schedule`, { classId: w.classId, start: null }), 200);
    expect(schedule.source).toEqual({ kind: 'class', classTitle: 'Tuesday quilt-along', standing: 'teacher', lessons: 2 });
    // The world's lessons: one released yesterday, one in 30 days; the quilt has three blocks (serpentine in one row).
    expect(schedule.rows.map((r: { status: string; lessonTitle: string | null; finishedBy: number | null }) => [r.status, r.lessonTitle, r.finishedBy])).toEqual([
      ['done', 'Lesson 1: the first line', 1],
      ['next', 'Lesson 2: not yet', 0],
      ['no-lesson', null, null],
    ]);
    expect(schedule.rows[2].date).toBeNull();
  });

  it("a student's quilt in the class: done from their own progress; a lesson not yet released shows its date only", async () => {
    const { schedule } = await expectStatus(w.student.client.put(`/api/quilts/${studentQuilt}/schedule`, { classId: w.classId, start: null }), 200);
    expect(schedule.source).toMatchObject({ kind: 'class', standing: 'student' });
    expect(schedule.rows.map((r: { status: string; lessonTitle: string | null }) => [r.status, r.lessonTitle])).toEqual([
      ['done', 'Lesson 1: the first line'],
      ['next', null],
    ]);
    expect(schedule.rows[1].date).toMatch(/^\d{4}-\d{2}-\d{2}$/);
  });

  it('refuses a class that is not yours (as one that does not exist), and a day that does not exist; others get 404', async () => {
    const other = await w.teacher.client.put(`/api/quilts/${teacherQuilt}/schedule`, { classId: w.otherClassId, start: null });
    expect(other.status).toBe(400);
    expect(Object.keys(other.body.error.fields)).toEqual(['classId']);
    const unknown = await w.teacher.client.put(`/api/quilts/${teacherQuilt}/schedule`, { classId: '00000000-0000-4000-8000-000000000000', start: null });
    expect(unknown.body).toEqual(other.body);
    expect((await w.teacher.client.put(`/api/quilts/${teacherQuilt}/schedule`, { classId: null, start: '2027-02-30' })).status).toBe(400);
    expect((await w.otherStudent.client.get(`/api/quilts/${teacherQuilt}/schedule`)).status).toBe(404);
    expect((await w.student.client.get(`/api/quilts/${teacherQuilt}/schedule`)).status).toBe(404);
    // Still tied to the class after the refusals.
    const kept = await expectStatus(w.teacher.client.get(`/api/quilts/${teacherQuilt}/schedule`), 200);
    expect(kept.schedule.classId).toBe(w.classId);
  });
});

describe("the demo guild's quilt", () => {
  it("Marigold's quilt-along top is scheduled by her Tuesday quilt-along's dated lessons, one block each", async () => {
    const teacher = demoGuild.byRole('teacher');
    const client = await signIn(teacher.email, demoGuild.password);
    const list = await expectStatus(client.get('/api/quilts'), 200);
    const quilt = (list.quilts as { id: string; title: string }[]).find((q) => q.title === 'Tuesday quilt-along top');
    expect(quilt, 'the seed adds the demo quilt').toBeDefined();
    const { schedule } = await expectStatus(client.get(`/api/quilts/${quilt!.id}/schedule`), 200);
    expect(schedule.source).toMatchObject({ kind: 'class', classTitle: 'Tuesday quilt-along', standing: 'teacher' });
    expect(schedule.rows).toHaveLength(12);
    expect(schedule.rows.filter((r: { date: string | null }) => r.date !== null)).toHaveLength(schedule.source.lessons);
  });
});
