// PUT /api/lessons/:id/progress is idempotent on re-sent progress (issue 14 item 10): the walkthrough queues moves
// made offline and sends them when the connection is back, possibly twice (an answer lost after the save committed)
// or late (behind a newer save from another tab). Each save carries `at`, when the move was made; the server keeps
// the newest and answers with what it holds. Also: the offline worker script is served as a script.
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { closeTestDb } from '../helpers/db.ts';
import { testEnv } from '../helpers/env.ts';
import { buildWorld, expectStatus, type World } from './teachingWorld.ts';

let w: World;
beforeAll(async () => {
  w = await buildWorld();
});
afterAll(async () => {
  await closeTestDb();
});

const put = (body: Record<string, unknown>) => w.student.client.put(`/api/lessons/${w.releasedLessonId}/progress`, body);

describe('re-sent walkthrough progress', () => {
  it('keeps the newest move whatever order the saves arrive in, and a repeat changes nothing', async () => {
    const newer = await expectStatus(put({ stepIndex: 6, totalSteps: 9, at: '2027-01-05T10:00:05.000Z' }), 200);
    expect(newer).toMatchObject({ stepIndex: 6, clientAt: '2027-01-05T10:00:05.000Z' });
    // An older save arriving late (queued offline, retried by the network): ignored, the answer says what is held.
    expect(await expectStatus(put({ stepIndex: 2, totalSteps: 9, at: '2027-01-05T10:00:01.000Z' }), 200)).toMatchObject({ stepIndex: 6 });
    // The same save twice (its first answer was lost): the same place, finished stamped once.
    const done = await expectStatus(put({ stepIndex: 8, totalSteps: 9, finished: true, at: '2027-01-05T10:00:09.000Z' }), 200);
    const again = await expectStatus(put({ stepIndex: 8, totalSteps: 9, finished: true, at: '2027-01-05T10:00:09.000Z' }), 200);
    expect(again).toMatchObject({ stepIndex: 8, finished: true });
    expect(again.finishedAt).toBe(done.finishedAt);
    const roster = await expectStatus(w.teacher.client.get(`/api/classes/${w.classId}/roster`), 200);
    expect(roster.students.find((s: { studentId: string }) => s.studentId === w.student.id)).toMatchObject({ lessonsFinished: 1 });
    // A save without `at` (an older client) still applies.
    expect(await expectStatus(put({ stepIndex: 3, totalSteps: 9 }), 200)).toMatchObject({ stepIndex: 3, clientAt: null, finished: false });
  });

  it('refuses an `at` that is not an instant', async () => {
    const res = await put({ stepIndex: 1, totalSteps: 9, at: 'yesterday' });
    expect(res.status).toBe(400);
    expect(res.body.error.fields).toHaveProperty('at');
  });

  it('serves the offline worker as a script from the site itself', async () => {
    const res = await fetch(new URL('/lesson-sw.js', testEnv.appUrl));
    expect(res.status).toBe(200);
    expect(res.headers.get('content-type')).toMatch(/javascript/);
    expect(await res.text()).toContain("addEventListener('fetch'");
  });
});
