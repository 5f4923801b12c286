// Teachers fixing mistakes (issue 14, item 7, and the roster from item 9): editing and deleting classes and lessons
// with what students lose counted from the rows, dates in the past asked about and impossible ones refused, every
// bad invitation address named, an invitation bound to its address, and the roster counting released lessons only.
// The date limits are our own (src/server/classes/teachingDates.ts): common practice, no source.
import { formatDate, WITHOUT_VIEWER } from '@shared/format/dates.ts';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { countClassDeletionImpact, countLessonDeletionImpact } from '@server/classes/deletionImpact.repository.ts';
import { createAccount, uniqueEmail } from '../helpers/accounts.ts';
import { closeTestDb, testDb } from '../helpers/db.ts';
import { linksIn, waitForMail } from '../helpers/mail.ts';
import { TestClient } from '../helpers/client.ts';
import { buildWorld, DAY, expectStatus, iso, type World } from './teachingWorld.ts';

let w: World;
beforeAll(async () => {
  w = await buildWorld();
});
afterAll(closeTestDb);

const today = () => new Date().toISOString().slice(0, 10);
const daysFromToday = (n: number) => new Date(Date.now() + n * DAY).toISOString().slice(0, 10);

describe('editing a class and a lesson', () => {
  it('the teacher changes a class; an admin changes it too; the student reads the change', async () => {
    const changed = await expectStatus(w.teacher.client.patch(`/api/classes/${w.classId}`, { title: 'Tuesday quilt-along (spring)', priceCents: 2500, currency: 'EUR' }), 200);
    expect(changed.class).toMatchObject({ title: 'Tuesday quilt-along (spring)', priceCents: 2500, currency: 'EUR' });
    await expectStatus(w.admin.client.patch(`/api/classes/${w.classId}`, { title: 'Tuesday quilt-along', priceCents: null }), 200);
    const seen = await expectStatus(w.student.client.get(`/api/classes/${w.classId}`), 200);
    expect(seen.class).toMatchObject({ title: 'Tuesday quilt-along', priceCents: null });
  });

  it('a lesson edit that leaves a past release as it was asks nothing', async () => {
    const before = await expectStatus(w.teacher.client.get(`/api/lessons/${w.releasedLessonId}`), 200);
    const same = await expectStatus(w.teacher.client.patch(`/api/lessons/${w.releasedLessonId}`, { title: 'Lesson 1: the first line', releaseAt: before.lesson.releaseAt }), 200);
    expect(same.lesson.releaseAt).toBe(before.lesson.releaseAt);
  });

  it('deleting a lesson: the counts the teacher is shown match the rows, and afterwards the student cannot open it', async () => {
    const lesson = await expectStatus(
      w.teacher.client.post(`/api/classes/${w.classId}/lessons`, { title: 'Lesson 9: to be removed', releaseAt: iso(-2 * 60_000), templateVersionId: w.versionId, confirmed: true }),
      201,
    );
    const id = lesson.lesson.id;
    await expectStatus(w.student.client.put(`/api/lessons/${id}/progress`, { stepIndex: 1, totalSteps: 4 }), 200);
    // One enrolled student, one progress row, no photos (the world has exactly one student in this class).
    expect(await countLessonDeletionImpact(testDb(), id, w.classId)).toEqual({ students: 1, studentsWithProgress: 1, photos: 0 });

    await expectStatus(w.teacher.client.delete(`/api/lessons/${id}`), 204);
    expect((await w.student.client.get(`/api/lessons/${id}`)).status).toBe(404);
    const cls = await expectStatus(w.student.client.get(`/api/classes/${w.classId}`), 200);
    expect(cls.lessons.map((l: { id: string }) => l.id)).not.toContain(id);
    expect(await testDb().selectFrom('lesson_progress').select('student_id').where('lesson_id', '=', id).execute()).toEqual([]);
  });

  it('deleting a class: students, lessons and progress counted, then gone for the student', async () => {
    const teacher = await createAccount({ role: 'teacher' });
    const student = await createAccount();
    const cls = await expectStatus(teacher.client.post('/api/classes', { title: 'Short spring circle', startsOn: daysFromToday(3) }), 201);
    await expectStatus(student.client.post('/api/classes/join', { code: cls.class.joinCode }), 200);
    expect(await countClassDeletionImpact(testDb(), cls.class.id)).toEqual({ students: 1, lessons: 0, studentsWithProgress: 0, photos: 0 });
    await expectStatus(teacher.client.delete(`/api/classes/${cls.class.id}`), 204);
    expect((await student.client.get(`/api/classes/${cls.class.id}`)).status).toBe(404);
    expect((await expectStatus(student.client.get('/api/classes'), 200)).enrolled).toEqual([]);
  });
});

describe('dates', () => {
  it('a class starting in the past needs a yes; more than a year ago (the 1999 class) is refused even with one', async () => {
    const past = daysFromToday(-10);
    const asked = await w.teacher.client.post('/api/classes', { title: 'Back-dated circle', startsOn: past });
    expect(asked.status).toBe(409);
    expect(asked.body.error.code).toBe('needs_confirmation');
    expect(asked.body.error.message).toBe(`The start date ${formatDate(`${past}T00:00:00Z`, 'day', WITHOUT_VIEWER)} is in the past. Keep it?`);
    expect(asked.body.error.fields).toHaveProperty('startsOn');
    await expectStatus(w.teacher.client.post('/api/classes', { title: 'Back-dated circle', startsOn: past, confirmed: true }), 201);
    await expectStatus(w.teacher.client.post('/api/classes', { title: 'Starts today', startsOn: today() }), 201);

    const old = await w.teacher.client.post('/api/classes', { title: 'Millennium circle', startsOn: '1999-01-05', confirmed: true });
    expect(old.status).toBe(400);
    expect(old.body.error.fields.startsOn).toBe('The start date 5 Jan 1999 is more than a year ago. Check the year.');
    // A changed start date on an existing class is checked the same way.
    expect((await w.teacher.client.patch(`/api/classes/${w.classId}`, { startsOn: '1999-01-05', confirmed: true })).status).toBe(400);
    expect((await w.teacher.client.patch(`/api/classes/${w.classId}`, { startsOn: past })).status).toBe(409);
  });

  it('a release in the past, or before the class starts, needs a yes; a 2001 release is refused', async () => {
    const body = (releaseAt: string, confirmed?: boolean) => ({ title: 'Dated lesson', releaseAt, templateVersionId: w.versionId, ...(confirmed !== undefined && { confirmed }) });
    const past = await w.teacher.client.post(`/api/classes/${w.classId}/lessons`, body(iso(-3 * DAY)));
    expect(past.status).toBe(409);
    expect(past.body.error.message).toMatch(/in the past: students can open the lesson as soon as you save/);
    expect(past.body.error.fields).toHaveProperty('releaseAt');

    // The world's class starts 31 days from today; a release in 5 days comes before it.
    const startsOn = (await expectStatus(w.teacher.client.get(`/api/classes/${w.classId}`), 200)).class.startsOn;
    const early = await w.teacher.client.post(`/api/classes/${w.classId}/lessons`, body(iso(5 * DAY)));
    expect(early.status).toBe(409);
    expect(early.body.error.message).toBe(`This lesson opens on ${formatDate(iso(5 * DAY), 'day', WITHOUT_VIEWER)}, before the class starts on ${formatDate(`${startsOn}T00:00:00Z`, 'day', WITHOUT_VIEWER)}. Keep it?`);
    const yes = await expectStatus(w.teacher.client.post(`/api/classes/${w.classId}/lessons`, body(iso(-3 * DAY), true)), 201);
    expect(yes.lesson.released).toBe(true);

    const ancient = await w.teacher.client.post(`/api/classes/${w.classId}/lessons`, body('2001-03-01T09:00:00Z', true));
    expect(ancient.status).toBe(400);
    expect(ancient.body.error.fields.releaseAt).toBe('The release date 1 Mar 2001 is more than a year ago. Check the year.');
    const moved = await w.teacher.client.patch(`/api/lessons/${w.futureLessonId}`, { releaseAt: iso(-DAY) });
    expect(moved.status).toBe(409);
    // Someone who may not manage the lesson hears nothing about dates: the same 404 as always.
    expect((await w.otherTeacher.client.patch(`/api/lessons/${w.futureLessonId}`, { releaseAt: iso(-DAY) })).status).toBe(404);
  });
});

describe('invitations', () => {
  it('names every address that is not one, and sends nothing until the list is right', async () => {
    const good = uniqueEmail('listed');
    const res = await w.teacher.client.post(`/api/classes/${w.classId}/invitations`, { emails: [good, 'bob@', 'ann at the guild'] });
    expect(res.status).toBe(400);
    expect(res.body.error.message).toBe('These are not e-mail addresses: “bob@”, “ann at the guild”. Nothing was sent; fix them and send again.');
    expect(res.body.error.fields.emails).toBe('Not e-mail addresses: “bob@”, “ann at the guild”.');
    expect(await testDb().selectFrom('class_invitation').select('id').where('email', '=', good).execute()).toEqual([]);
    const one = await w.teacher.client.post(`/api/classes/${w.classId}/invitations`, { emails: ['pat@@guild.test'] });
    expect(one.body.error.message).toBe('This is not an e-mail address: “pat@@guild.test”. Nothing was sent; fix it and send again.');
  });

  it('is bound to its address: another signed-in account is refused in a plain sentence; the invited one joins', async () => {
    const invited = await createAccount({ displayName: 'Invited Quilter' });
    const other = await createAccount({ displayName: 'Someone Else' });
    const sentAt = new Date();
    await expectStatus(w.teacher.client.post(`/api/classes/${w.classId}/invitations`, { emails: [invited.email.toUpperCase()] }), 201);
    const mail = await waitForMail(invited.email.toUpperCase(), { subject: 'invites you', since: sentAt });
    const token = linksIn(mail.text).find((l) => l.includes('/invitations/'))!.split('/invitations/')[1]!;

    const refused = await other.client.post(`/api/invitations/${token}/accept`);
    expect(refused.status).toBe(409);
    expect(refused.body.error.code).toBe('wrong_account');
    expect(refused.body.error.message).toBe(
      `This invitation was sent to ${invited.email.toUpperCase()}, but you are signed in as ${other.email}. Sign out, then sign in (or create an account) as ${invited.email.toUpperCase()} to join.`,
    );
    expect((await other.client.get(`/api/classes/${w.classId}`)).status).toBe(404);
    // The page says the same and offers to switch accounts.
    const page = await other.client.get(`/invitations/${token}`);
    expect(page.text).toContain('Sign out and sign in as');
    expect(page.text).toContain('name="signInNext"');

    // The refusal did not use the invitation up; the invited address (any letter case) joins.
    expect((await expectStatus(invited.client.post(`/api/invitations/${token}/accept`), 200)).classId).toBe(w.classId);
  });

  it('sign-out from the invitation page leads to sign-in and back to the link', async () => {
    const someone = await createAccount();
    const form = { 'content-type': 'application/x-www-form-urlencoded' };
    const res = await someone.client.request('POST', '/sign-out', { body: 'signInNext=%2Finvitations%2Fabc', headers: form });
    expect(res.status).toBe(303);
    expect(res.headers.get('location')).toBe('/sign-in?next=%2Finvitations%2Fabc');
    const evil = await new TestClient().request('POST', '/sign-out', { body: 'signInNext=%2F%2Fevil.test', headers: form });
    expect(evil.headers.get('location')).toBe('/sign-in?next=%2Fdashboard');
  });
});

describe('roster', () => {
  it('counts released lessons only ("0 of 1", not "0 of 2", while one of two is out)', async () => {
    const teacher = await createAccount({ role: 'teacher' });
    const student = await createAccount();
    const cls = await expectStatus(teacher.client.post('/api/classes', { title: 'Two-lesson circle', startsOn: today() }), 201);
    // The world's template is class-only for its teacher; an admin may use any version.
    const version = w.versionId;
    await expectStatus(w.admin.client.post(`/api/classes/${cls.class.id}/lessons`, { title: 'Out now', releaseAt: iso(-60_000), templateVersionId: version }), 201);
    await expectStatus(w.admin.client.post(`/api/classes/${cls.class.id}/lessons`, { title: 'Next month', releaseAt: iso(30 * DAY), templateVersionId: version }), 201);
    await expectStatus(student.client.post('/api/classes/join', { code: cls.class.joinCode }), 200);
    const roster = await expectStatus(teacher.client.get(`/api/classes/${cls.class.id}/roster`), 200);
    expect(roster.students).toHaveLength(1);
    expect(roster.students[0]).toMatchObject({ lessonsFinished: 0, lessonCount: 1 });
  });
});
