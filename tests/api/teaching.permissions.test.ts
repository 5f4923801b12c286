// The permission matrix: every teaching endpoint against anonymous, a student of this class, a student of another
// class, the class's teacher, another teacher and an admin. A "no" is 401 for anonymous and 404 for the signed-in
// (the thing's existence is not revealed), and a 404 body never carries the class's data.
import sharp from 'sharp';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { TestClient } from '../helpers/client.ts';
import { closeTestDb } from '../helpers/db.ts';
import { buildWorld, daysAhead, iso, DAY, sendBytes, type World } from './teachingWorld.ts';

type Actor = 'anonymous' | 'student' | 'otherStudent' | 'teacher' | 'otherTeacher' | 'admin';
const ACTORS: Actor[] = ['anonymous', 'student', 'otherStudent', 'teacher', 'otherTeacher', 'admin'];

let w: World;
let photoId: string;
let png: Uint8Array;
const anonymous = new TestClient();
const client = (a: Actor) => (a === 'anonymous' ? anonymous : w[a].client);

beforeAll(async () => {
  w = await buildWorld();
  png = new Uint8Array(await sharp({ create: { width: 64, height: 48, channels: 3, background: '#3d5a80' } }).png().toBuffer());
  const up = await sendBytes(w.student.client, `/api/lessons/${w.releasedLessonId}/photos?side=front`, png, 'image/png');
  expect(up.status).toBe(201);
  photoId = up.body.photo.id;
});
afterAll(closeTestDb);

interface Row {
  name: string;
  call: (c: TestClient, a: Actor) => Promise<{ status: number; text: string }>;
  expect: Record<Actor, number>;
}
// Shorthand for the usual outcomes, in ACTORS order.
const s = (...codes: number[]): Record<Actor, number> => Object.fromEntries(ACTORS.map((a, i) => [a, codes[i]!])) as Record<Actor, number>;

const rows: Row[] = [
  { name: 'GET /api/classes', call: (c) => c.get('/api/classes'), expect: s(401, 200, 200, 200, 200, 200) },
  { name: 'POST /api/classes', call: (c) => c.post('/api/classes', { title: 'New class', startsOn: daysAhead(86) }), expect: s(401, 404, 404, 201, 201, 201) },
  { name: 'GET /api/classes/:id', call: (c) => c.get(`/api/classes/${w.classId}`), expect: s(401, 200, 404, 200, 404, 200) },
  { name: 'PATCH /api/classes/:id', call: (c) => c.patch(`/api/classes/${w.classId}`, { description: 'Monthly blocks, updated' }), expect: s(401, 404, 404, 200, 404, 200) },
  {
    name: 'PATCH /api/classes/:id (start moved into the past, not yet confirmed)',
    call: (c) => c.patch(`/api/classes/${w.classId}`, { startsOn: new Date(Date.now() - 10 * DAY).toISOString().slice(0, 10) }),
    expect: s(401, 404, 404, 409, 404, 409),
  },
  {
    name: 'DELETE /api/classes/:id (a fresh class with a student, for each visitor)',
    call: async (c) => {
      const fresh = await w.teacher.client.post('/api/classes', { title: 'Matrix class', startsOn: daysAhead(117) });
      await w.student.client.post('/api/classes/join', { code: fresh.body.class.joinCode });
      return c.delete(`/api/classes/${fresh.body.class.id}`);
    },
    expect: s(401, 404, 404, 204, 404, 204),
  },
  { name: 'GET /api/classes/:id/lessons', call: (c) => c.get(`/api/classes/${w.classId}/lessons`), expect: s(401, 200, 404, 200, 404, 200) },
  {
    name: 'POST /api/classes/:id/lessons',
    call: (c) => c.post(`/api/classes/${w.classId}/lessons`, { title: 'Extra', releaseAt: iso(60 * DAY), templateVersionId: w.versionId, confirmed: true }),
    expect: s(401, 404, 404, 201, 404, 201),
  },
  { name: 'POST /api/classes/:id/join-code', call: (c) => c.post(`/api/classes/${w.classId}/join-code`), expect: s(401, 404, 404, 200, 404, 200) },
  { name: 'GET /api/classes/:id/invitations', call: (c) => c.get(`/api/classes/${w.classId}/invitations`), expect: s(401, 404, 404, 200, 404, 200) },
  { name: 'POST /api/classes/:id/invitations', call: (c) => c.post(`/api/classes/${w.classId}/invitations`, { emails: ['matrix-invite@guild.test'] }), expect: s(401, 404, 404, 201, 404, 201) },
  { name: 'GET /api/classes/:id/roster', call: (c) => c.get(`/api/classes/${w.classId}/roster`), expect: s(401, 404, 404, 200, 404, 200) },
  { name: 'GET /api/classes/:id/roster.csv', call: (c) => c.get(`/api/classes/${w.classId}/roster.csv`), expect: s(401, 404, 404, 200, 404, 200) },
  { name: 'GET /api/classes/:id/photos', call: (c) => c.get(`/api/classes/${w.classId}/photos`), expect: s(401, 200, 404, 200, 404, 200) },
  { name: 'GET /api/lessons/:released', call: (c) => c.get(`/api/lessons/${w.releasedLessonId}`), expect: s(401, 200, 404, 200, 404, 200) },
  { name: 'GET /api/lessons/:future', call: (c) => c.get(`/api/lessons/${w.futureLessonId}`), expect: s(401, 404, 404, 200, 404, 200) },
  { name: 'PATCH /api/lessons/:id', call: (c) => c.patch(`/api/lessons/${w.releasedLessonId}`, { notes: 'Start at the *left* edge.' }), expect: s(401, 404, 404, 200, 404, 200) },
  {
    name: 'PATCH /api/lessons/:id (release moved into the past, not yet confirmed)',
    call: (c) => c.patch(`/api/lessons/${w.futureLessonId}`, { releaseAt: iso(-DAY) }),
    expect: s(401, 404, 404, 409, 404, 409),
  },
  {
    name: 'DELETE /api/lessons/:id (a fresh lesson for each visitor)',
    call: async (c) => {
      const fresh = await w.teacher.client.post(`/api/classes/${w.classId}/lessons`, { title: 'Matrix lesson', releaseAt: iso(40 * DAY), templateVersionId: w.versionId, confirmed: true });
      return c.delete(`/api/lessons/${fresh.body.lesson.id}`);
    },
    expect: s(401, 404, 404, 204, 404, 204),
  },
  { name: 'GET /api/lessons/:id/progress', call: (c) => c.get(`/api/lessons/${w.releasedLessonId}/progress`), expect: s(401, 200, 404, 404, 404, 404) },
  { name: 'PUT /api/lessons/:id/progress', call: (c) => c.put(`/api/lessons/${w.releasedLessonId}/progress`, { stepIndex: 2, totalSteps: 5 }), expect: s(401, 200, 404, 404, 404, 404) },
  { name: 'PUT /api/lessons/:future/progress', call: (c) => c.put(`/api/lessons/${w.futureLessonId}/progress`, { stepIndex: 0, totalSteps: 5 }), expect: s(401, 404, 404, 404, 404, 404) },
  { name: 'GET /api/lessons/:id/photos', call: (c) => c.get(`/api/lessons/${w.releasedLessonId}/photos`), expect: s(401, 200, 404, 200, 404, 200) },
  {
    name: 'POST /api/lessons/:id/photos',
    call: (c, a) => sendBytes(a === 'anonymous' ? null : c, `/api/lessons/${w.releasedLessonId}/photos?side=back`, png, 'image/png'),
    expect: s(401, 201, 404, 404, 404, 404),
  },
  { name: 'GET /api/photos/:id', call: (c) => c.get(`/api/photos/${photoId}`), expect: s(401, 200, 404, 200, 404, 200) },
  { name: 'GET /api/photos/:id?size=thumb', call: (c) => c.get(`/api/photos/${photoId}?size=thumb`), expect: s(401, 200, 404, 200, 404, 200) },
  { name: 'POST /api/lessons/release-sweep', call: (c) => c.post('/api/lessons/release-sweep'), expect: s(401, 404, 404, 404, 404, 200) },
  { name: 'GET /api/templates/:id (class-only)', call: (c) => c.get(`/api/templates/${w.templateId}`), expect: s(404, 200, 404, 200, 404, 200) },
  { name: 'GET /api/templates/:id/versions/1', call: (c) => c.get(`/api/templates/${w.templateId}/versions/1`), expect: s(404, 200, 404, 200, 404, 200) },
  { name: 'PUT /api/templates/:id', call: (c) => c.put(`/api/templates/${w.templateId}`, { description: 'One line across, clearer' }), expect: s(401, 404, 404, 200, 404, 200) },
  { name: 'POST /api/templates/:id/copy', call: (c) => c.post(`/api/templates/${w.templateId}/copy`, {}), expect: s(401, 201, 404, 201, 404, 201) },
  { name: 'GET /api/templates/mine', call: (c) => c.get('/api/templates/mine'), expect: s(401, 404, 404, 200, 200, 200) },
  { name: 'GET /api/templates (gallery)', call: (c) => c.get('/api/templates'), expect: s(200, 200, 200, 200, 200, 200) },
];

describe('teaching permission matrix', () => {
  for (const row of rows) {
    it(row.name, async () => {
      const got: Partial<Record<Actor, number>> = {};
      for (const a of ACTORS) {
        const res = await row.call(client(a), a);
        got[a] = res.status;
        // Nothing leaks in a refusal: no class title, no lesson text, no template title.
        if (res.status === 404 || res.status === 401) expect(res.text).not.toMatch(/Tuesday quilt-along|Lesson 1|Heron ribbon|Secret winter/);
      }
      expect(got).toEqual(row.expect);
    });
  }

  it('destructive endpoints: only the teacher or an admin deletes a lesson or class; others get 404', async () => {
    const extra = await w.teacher.client.post(`/api/classes/${w.classId}/lessons`, { title: 'To delete', releaseAt: iso(-DAY), templateVersionId: w.versionId, confirmed: true });
    const lessonId = extra.body.lesson.id;
    for (const a of ['student', 'otherStudent', 'otherTeacher'] as const) expect((await w[a].client.delete(`/api/lessons/${lessonId}`)).status).toBe(404);
    expect((await anonymous.delete(`/api/lessons/${lessonId}`)).status).toBe(401);
    expect((await w.teacher.client.delete(`/api/lessons/${lessonId}`)).status).toBe(204);

    const cls = await w.teacher.client.post('/api/classes', { title: 'Short-lived', startsOn: daysAhead(117) });
    for (const a of ['student', 'otherStudent', 'otherTeacher'] as const) expect((await w[a].client.delete(`/api/classes/${cls.body.class.id}`)).status).toBe(404);
    expect((await w.admin.client.delete(`/api/classes/${cls.body.class.id}`)).status).toBe(204);

    for (const a of ['otherStudent', 'otherTeacher'] as const) expect((await w[a].client.delete(`/api/photos/${photoId}`)).status).toBe(404);
  });

  it('a student sees released lessons only, and no join code or Markdown source', async () => {
    const res = await w.student.client.get(`/api/classes/${w.classId}`);
    expect(res.body.class.joinCode).toBeUndefined();
    expect(res.body.lessons.map((l: { id: string }) => l.id)).toEqual([w.releasedLessonId]);
    expect(res.body.lessons[0].notes).toBeUndefined();
    expect(res.body.lessons[0].notesHtml).toContain('<em>left</em>');
    const teacherView = await w.teacher.client.get(`/api/classes/${w.classId}`);
    expect(teacherView.body.lessons.map((l: { id: string }) => l.id)).toContain(w.futureLessonId);
  });
});
