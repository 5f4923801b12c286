// Creating an account from a class invitation link: only for the address the invitation went to (holding the link
// shows control of that mailbox), once, joining the class in the same step; sign-up stays private everywhere else.
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { DEFAULT_PASSWORD, createAccount, uniqueEmail } from '../helpers/accounts.ts';
import { TestClient } from '../helpers/client.ts';
import { closeTestDb, testDb } from '../helpers/db.ts';
import { forgetLoopbackLimits } from '../helpers/limits.ts';
import { linksIn, waitForMail } from '../helpers/mail.ts';
import { buildWorld, expectStatus, type World } from './teachingWorld.ts';

let w: World;
beforeAll(async () => {
  await forgetLoopbackLimits();
  w = await buildWorld();
});
afterAll(async () => {
  await forgetLoopbackLimits();
  await closeTestDb();
});

async function invite(email: string): Promise<string> {
  const since = new Date();
  await expectStatus(w.teacher.client.post(`/api/classes/${w.classId}/invitations`, { emails: [email] }), 201);
  const link = linksIn((await waitForMail(email, { subject: 'invites you', since })).text).find((l) => l.includes('/invitations/'))!;
  return new URL(link).pathname.split('/').pop()!;
}

const body = (email: string) => ({ email, displayName: 'Marisol Thimble', password: DEFAULT_PASSWORD, units: 'cm' });

describe('sign-up from an invitation link', () => {
  it('creates the account for the invited address, signs it in and joins the class; the link then is used up', async () => {
    const email = uniqueEmail('invited');
    const token = await invite(email);
    const client = new TestClient();
    const res = await client.post(`/api/invitations/${token}/sign-up`, body(email.toUpperCase()));
    expect(res.status).toBe(201);
    expect(res.body.classId).toBe(w.classId);
    expect((await client.get(`/api/classes/${w.classId}`)).body.standing).toBe('student');
    const again = await new TestClient().post(`/api/invitations/${token}/sign-up`, body(email));
    expect(again.status).toBe(410);
  });

  it('refuses another address and an address that already has an account, creating nothing', async () => {
    const email = uniqueEmail('invited');
    const token = await invite(email);
    const other = uniqueEmail('someone-else');
    const wrong = await new TestClient().post(`/api/invitations/${token}/sign-up`, body(other));
    expect(wrong.status).toBe(400);
    expect(wrong.body.error.fields.email).toMatch(/sign up on the sign-up page/);
    expect(await testDb().selectFrom('account').select('id').where('email', '=', other).execute()).toEqual([]);

    const member = await createAccount();
    const memberToken = await invite(member.email);
    const taken = await new TestClient().post(`/api/invitations/${memberToken}/sign-up`, body(member.email));
    expect(taken.status).toBe(409);
    // The invitation still works for the member once signed in.
    expect((await member.client.post(`/api/invitations/${memberToken}/accept`)).status).toBe(200);
  });

  it('refuses a made-up link', async () => {
    const res = await new TestClient().post(`/api/invitations/${'a'.repeat(32)}.1999999999.${'b'.repeat(52)}/sign-up`, body(uniqueEmail()));
    expect(res.status).toBe(400);
    expect(res.body.error.code).toBe('invalid_token');
  });
});
