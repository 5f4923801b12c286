// Template versioning, invitations (expired, reused, forged), join codes, release e-mails sent once, roster + CSV.
import { createHash } from 'node:crypto';
import { sql } from 'kysely';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createAccount } from '../helpers/accounts.ts';
import { closeTestDb, testDb } from '../helpers/db.ts';
import { linksIn, readCapturedMail, waitForMail } from '../helpers/mail.ts';
import { signInviteToken } from '@server/classes/inviteToken.ts';
import { buildWorld, DAY, expectStatus, insertDesignWithRoute, iso, saveRoute, type World } from './teachingWorld.ts';

let w: World;
beforeAll(async () => {
  w = await buildWorld();
});
afterAll(closeTestDb);

describe('template versions', () => {
  it('an edit publishes a new version; copying the old version still gives the old drawing', async () => {
    const designId = await insertDesignWithRoute(w.teacher, 4);
    const v1 = await expectStatus(
      w.teacher.client.post('/api/templates', { designId, title: 'Arches, first cut', difficulty: 'intermediate', motifs: ['Arches'], visibility: 'public' }),
      201,
    );
    expect(v1.version.version).toBe(1);
    expect(v1.version.figures).toMatchObject({ passes: 1, stops: 0, stitchLength: 12 });
    // The teacher redraws the line at y = 8 and saves a new route (what the workbench would store).
    const moved = { version: 1, units: 'in', width: 12, height: 12, seams: [[[6, 0], [6, 12]]], lines: [[[0, 8], [12, 8]]], edgeTravel: true };
    await testDb().updateTable('design').set({ data: JSON.stringify(moved), version: 2 }).where('id', '=', designId).execute();
    const stale = await w.teacher.client.put(`/api/templates/${v1.template.id}`, { designId });
    expect(stale.status).toBe(409);
    await saveRoute(designId, 2, 8);
    const v2 = await expectStatus(w.teacher.client.put(`/api/templates/${v1.template.id}`, { designId, title: 'Arches, second cut' }), 200);
    expect(v2.version.version).toBe(2);
    expect(v2.versions.map((v: { version: number }) => v.version)).toEqual([2, 1]);

    const copy = await expectStatus(w.student.client.post(`/api/templates/${v1.template.id}/copy`, { version: 1 }), 201);
    expect(copy.templateVersionId).toBe(v1.version.id);
    const copied = await testDb().selectFrom('design').selectAll().where('id', '=', copy.designId).executeTakeFirstOrThrow();
    expect(copied.owner_id).toBe(w.student.id);
    expect(copied.copied_from_template_version_id).toBe(v1.version.id);
    expect((copied.data as { lines: unknown }).lines).toEqual([[[0, 4], [12, 4]]]);
    const old = await expectStatus(w.student.client.get(`/api/templates/${v1.template.id}/versions/1`), 200);
    expect(old.version.title).toBe('Arches, first cut');
    expect(old.version.route[0].points).toEqual([[0, 4], [12, 4]]);
    // The gallery lists the latest version, filterable by motif (stored lower-case), difficulty and size.
    const gallery = await expectStatus(w.student.client.get('/api/templates?motif=arches&difficulty=intermediate&size=medium&q=second'), 200);
    expect(gallery.templates.map((t: { id: string }) => t.id)).toContain(v1.template.id);
    const small = await expectStatus(w.student.client.get('/api/templates?motif=arches&size=small'), 200);
    expect(small.templates.map((t: { id: string }) => t.id)).not.toContain(v1.template.id);
  });

  it('published versions are immutable in the database itself', async () => {
    await expect(sql`update template_version set title = 'changed' where id = ${w.versionId}`.execute(testDb())).rejects.toThrow(/immutable/);
  });

  it('an unlisted template opens only through its link', async () => {
    const designId = await insertDesignWithRoute(w.teacher, 5);
    const t = await expectStatus(w.teacher.client.post('/api/templates', { designId, title: 'Hidden echo', difficulty: 'advanced', visibility: 'unlisted' }), 201);
    expect((await w.student.client.get(`/api/templates/${t.template.id}`)).status).toBe(404);
    const token = String(t.linkPath).split('/').pop();
    expect((await w.student.client.get(`/api/templates/link/${token}`)).status).toBe(200);
    expect((await w.student.client.get(`/api/templates/link/${token}x`)).status).toBe(404);
  });
});

describe('invitations', () => {
  it('the e-mailed link works once; a reused, forged or expired link is refused with a clear message', async () => {
    const invitee = await createAccount({ displayName: 'Invited Quilter' });
    await expectStatus(w.teacher.client.post(`/api/classes/${w.classId}/invitations`, { emails: [invitee.email] }), 201);
    const mail = await waitForMail(invitee.email, { subject: 'invites you' });
    const link = linksIn(mail.text).find((l) => l.includes('/invitations/'))!;
    const token = link.split('/invitations/')[1]!;
    const info = await expectStatus(invitee.client.get(`/api/invitations/${token}`), 200);
    expect(info.class.title).toBe('Tuesday quilt-along');

    const forged = token.slice(0, -4) + (token.endsWith('aaaa') ? 'bbbb' : 'aaaa');
    const f = await invitee.client.post(`/api/invitations/${forged}/accept`);
    expect(f.status).toBe(400);
    expect(f.body.error.message).toMatch(/not valid/);

    expect((await expectStatus(invitee.client.post(`/api/invitations/${token}/accept`), 200)).classId).toBe(w.classId);
    const again = await w.otherStudent.client.post(`/api/invitations/${token}/accept`);
    expect(again.status).toBe(410);
    expect(again.body.error.message).toMatch(/already been used/);
    expect((await w.otherStudent.client.get(`/api/classes/${w.classId}`)).status).toBe(404);

    // An expired link: signed with the server's own key but an expiry in the past.
    const key = await testDb().selectFrom('server_secret').select('value').where('name', '=', 'invite-hmac').executeTakeFirstOrThrow();
    const old = signInviteToken(new Uint8Array(Buffer.from(key.value, 'base64')), new Date(Date.now() - DAY));
    await testDb()
      .insertInto('class_invitation')
      .values({ class_id: w.classId, email: 'late@guild.test', token_hash: createHash('sha256').update(old.id).digest('hex'), expires_at: old.expiresAt })
      .execute();
    const expired = await w.otherStudent.client.post(`/api/invitations/${old.token}/accept`);
    expect(expired.status).toBe(410);
    expect(expired.body.error.message).toMatch(/expired/);
  });

  it('a wrong join code is refused; the right one enrols', async () => {
    const q = await createAccount();
    expect((await q.client.post('/api/classes/join', { code: 'ZZZZ9999' })).status).toBe(400);
    const cls = await expectStatus(w.teacher.client.get(`/api/classes/${w.classId}`), 200);
    const joined = await expectStatus(q.client.post('/api/classes/join', { code: cls.class.joinCode.toLowerCase() }), 200);
    expect(joined.classId).toBe(w.classId);
  });
});

describe('lesson release e-mails', () => {
  it('go out once per student when a lesson opens, however often the sweep runs', async () => {
    const lesson = await expectStatus(
      w.teacher.client.post(`/api/classes/${w.classId}/lessons`, { title: 'Lesson 3: the release test', releaseAt: iso(DAY), templateVersionId: w.versionId, confirmed: true }),
      201,
    );
    await expectStatus(w.admin.client.post('/api/lessons/release-sweep'), 200);
    const key = `lesson-release:${lesson.lesson.id}:${w.student.id}`;
    const rows = () => testDb().selectFrom('email_message').select(['id', 'status']).where('dedupe_key', '=', key).execute();
    expect(await rows()).toHaveLength(0);

    await expectStatus(w.teacher.client.patch(`/api/lessons/${lesson.lesson.id}`, { releaseAt: iso(-60_000), confirmed: true }), 200);
    await expectStatus(w.admin.client.post('/api/lessons/release-sweep'), 200);
    const mail = await waitForMail(w.student.email, { subject: 'Lesson 3: the release test' });
    expect(mail.text).toContain(`/classes/${w.classId}/lessons/${lesson.lesson.id}`);
    const second = await expectStatus(w.admin.client.post('/api/lessons/release-sweep'), 200);
    expect(second.sent).toBe(0);
    expect(await rows()).toEqual([expect.objectContaining({ status: 'sent' })]);
    await new Promise((r) => setTimeout(r, 500));
    expect(readCapturedMail().filter((m) => m.to.includes(w.student.email) && m.subject.includes('Lesson 3: the release test'))).toHaveLength(1);
    // The other class's student hears nothing.
    expect(readCapturedMail().filter((m) => m.to.includes(w.otherStudent.email) && m.subject.includes('Lesson 3'))).toHaveLength(0);
  });
});

describe('progress and roster', () => {
  it('saves the walkthrough place and shows it in the roster and its CSV', async () => {
    const saved = await expectStatus(w.student.client.put(`/api/lessons/${w.releasedLessonId}/progress`, { stepIndex: 5, totalSteps: 5, finished: true }), 200);
    expect(saved).toMatchObject({ stepIndex: 5, totalSteps: 5, finished: true });
    expect((await w.student.client.put(`/api/lessons/${w.releasedLessonId}/progress`, { stepIndex: 7, totalSteps: 5 })).status).toBe(400);
    const roster = await expectStatus(w.teacher.client.get(`/api/classes/${w.classId}/roster`), 200);
    const me = roster.students.find((s: { studentId: string }) => s.studentId === w.student.id);
    expect(me).toMatchObject({ lessonsFinished: 1, current: { stepIndex: 5, totalSteps: 5, finished: true } });
    const csv = await w.teacher.client.get(`/api/classes/${w.classId}/roster.csv`);
    expect(csv.headers.get('content-type')).toContain('text/csv');
    expect(csv.text.split('\r\n')[0]).toBe('student,email,joined,joined via,lessons finished,lessons,current lesson,current step,total steps,last active,photos');
    expect(csv.text).toContain(`Pim Arkwright,${w.student.email}`);
  });
});
