// Issue 10, defects 7, 8, 9 and 10: the captured-mail page is for admins in test/development runs only; a
// demoted teacher loses teacher powers on the next request; a password change by any path ends every reset
// link and every other session; every state-changing request, not just /api JSON, must come from the site.
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createAccount, signIn } from '../helpers/accounts.ts';
import { TestClient } from '../helpers/client.ts';
import { closeTestDb } from '../helpers/db.ts';
import { startExtraServer, type ExtraServer } from '../helpers/extraServer.ts';
import { linksIn, waitForMail } from '../helpers/mail.ts';
import { buildWorld, expectStatus, type World } from './teachingWorld.ts';

afterAll(closeTestDb);

describe('the captured-mail page (/dev/mail)', () => {
  let devToolsOff: ExtraServer;
  beforeAll(async () => {
    devToolsOff = await startExtraServer({ DEV_TOOLS: 'false' });
  });
  afterAll(() => devToolsOff?.stop());

  it('is shown to an admin only, with a banner saying it is a local fake', async () => {
    const [quilter, teacher, admin] = await Promise.all([createAccount(), createAccount({ role: 'teacher' }), createAccount({ role: 'admin' })]);
    const anonymous = await new TestClient().get('/dev/mail');
    expect(anonymous.status).toBe(302);
    expect(anonymous.headers.get('location')).toMatch(/^\/sign-in\?next=/);
    expect((await quilter.client.get('/dev/mail')).status).toBe(404);
    expect((await teacher.client.get('/dev/mail')).status).toBe(404);
    const page = await admin.client.get('/dev/mail');
    expect(page.status).toBe(200);
    expect(page.text).toMatch(/local fake mail server/i);
    expect(page.text).toMatch(/nothing here was sent/i);
  });

  it('does not exist when DEV_TOOLS is off, not even for an admin', async () => {
    const admin = await createAccount({ role: 'admin' });
    const client = await signInAt(devToolsOff.url, admin.email, admin.password);
    const res = await client.get('/dev/mail');
    expect(res.status).toBe(404);
    expect(res.text).toContain('We could not find that page');
  });
});

async function signInAt(url: string, email: string, password: string): Promise<TestClient> {
  const client = new TestClient(url);
  const res = await client.post('/api/session', { email, password });
  if (res.status !== 200) throw new Error(`sign-in at ${url} failed: ${res.status} ${res.text}`);
  return client;
}

describe('a teacher demoted to quilter', () => {
  let w: World;
  beforeAll(async () => {
    w = await buildWorld();
    await expectStatus(w.admin.client.patch(`/api/admin/accounts/${w.teacher.id}`, { role: 'quilter' }), 200);
  });

  it('loses teacher powers on the next request: class, roster, join code, invitations, lessons, templates', async () => {
    const t = w.teacher.client;
    expect((await t.get(`/api/classes/${w.classId}`)).status).toBe(404);
    expect((await t.patch(`/api/classes/${w.classId}`, { title: 'Taken back' })).status).toBe(404);
    expect((await t.get(`/api/classes/${w.classId}/roster`)).status).toBe(404);
    expect((await t.post(`/api/classes/${w.classId}/join-code`)).status).toBe(404);
    expect((await t.post(`/api/classes/${w.classId}/invitations`, { emails: ['new.student@guild.test'] })).status).toBe(404);
    expect((await t.post(`/api/classes/${w.classId}/lessons`, { title: 'More', releaseAt: new Date().toISOString(), notes: '', templateVersionId: w.versionId })).status).toBe(404);
    expect((await t.get(`/api/lessons/${w.futureLessonId}`)).status).toBe(404);
    expect((await t.put(`/api/templates/${w.templateId}`, { title: 'Renamed by a quilter' })).status).toBe(404);
    expect((await t.get('/api/templates/mine')).status).toBe(404);
    expect((await t.get('/api/classes')).body.teaching).toEqual([]);
    expect((await t.get(`/classes/${w.classId}`)).status).toBe(404);
  });

  it('leaves the class read-only for its students and manageable by admins; new enrolments are closed', async () => {
    expect((await w.student.client.get(`/api/classes/${w.classId}`)).status).toBe(200);
    expect((await w.student.client.get(`/api/lessons/${w.releasedLessonId}`)).status).toBe(200);
    expect((await w.admin.client.patch(`/api/classes/${w.classId}`, { title: 'Tuesday quilt-along (guild)' })).status).toBe(200);
    expect((await w.admin.client.get(`/api/classes/${w.classId}/roster`)).status).toBe(200);
    const newcomer = await createAccount();
    const joined = await newcomer.client.post('/api/classes/join', { code: w.joinCode });
    expect(joined.status).toBe(400);
    expect(joined.body.error.fields.code).toBeTruthy();
  });

  it('gets everything back when made a teacher again', async () => {
    await expectStatus(w.admin.client.patch(`/api/admin/accounts/${w.teacher.id}`, { role: 'teacher' }), 200);
    expect((await w.teacher.client.get(`/api/classes/${w.classId}/roster`)).status).toBe(200);
    expect((await w.teacher.client.get('/api/classes')).body.teaching).toHaveLength(1);
  });
});

describe('a password change by any path', () => {
  async function resetToken(email: string): Promise<string> {
    const since = new Date();
    expect((await new TestClient().post('/api/password-resets', { email })).status).toBe(202);
    const mail = await waitForMail(email, { subject: 'Reset your Threadway password', since });
    return new URL(linksIn(mail.text).find((l) => l.includes('token='))!).searchParams.get('token')!;
  }

  it('in account settings ends every reset link and every other session', async () => {
    const a = await createAccount();
    const phone = await signIn(a.email, a.password);
    const token = await resetToken(a.email);
    expect((await a.client.put('/api/account/password', { currentPassword: a.password, newPassword: 'changed-in-settings-1' })).status).toBe(200);
    const late = await new TestClient().post('/api/password-resets/confirm', { token, password: 'attacker-chosen-pass' });
    expect(late.status).toBe(400);
    expect(late.body.error.code).toBe('invalid_token');
    expect((await phone.get('/api/session')).status).toBe(401);
    expect((await a.client.get('/api/session')).status).toBe(200);
    await signIn(a.email, 'changed-in-settings-1');
  });

  it('through a reset link ends the other reset links and every session', async () => {
    const a = await createAccount();
    const first = await resetToken(a.email);
    const second = await resetToken(a.email);
    expect((await new TestClient().post('/api/password-resets/confirm', { token: second, password: 'reset-new-password' })).status).toBe(200);
    expect((await new TestClient().post('/api/password-resets/confirm', { token: first, password: 'another-new-password' })).status).toBe(400);
    expect((await a.client.get('/api/session')).status).toBe(401);
  });
});

describe('Origin check on every state-changing request', () => {
  it('refuses a cross-site JSON POST to the sign-out form endpoint and keeps the session', async () => {
    const a = await createAccount();
    for (const origin of ['https://evil.example', null]) {
      const res = await a.client.request('POST', '/sign-out', { origin, body: {} });
      expect(res.status).toBe(403);
    }
    const bare = await a.client.request('POST', '/sign-out', { origin: 'https://evil.example' });
    expect(bare.status).toBe(403);
    expect((await a.client.get('/api/session')).status).toBe(200);
  });

  it('refuses a cross-site JSON sign-out through the API', async () => {
    const a = await createAccount();
    expect((await a.client.request('POST', '/api/session', { origin: 'https://evil.example', body: {} })).status).toBe(403);
    expect((await a.client.request('DELETE', '/api/session', { origin: 'https://evil.example' })).status).toBe(403);
    expect((await a.client.get('/api/session')).status).toBe(200);
  });

  it('still lets the site itself sign out with its form', async () => {
    const a = await createAccount();
    const res = await a.client.request('POST', '/sign-out', { headers: { 'content-type': 'application/x-www-form-urlencoded' }, body: '' });
    expect(res.status).toBe(303);
    expect((await a.client.get('/api/session')).status).toBe(401);
  });
});
