// Sign-up, sign-in and sign-out against the real server and database.
import { afterAll, describe, expect, it } from 'vitest';
import { sql } from 'kysely';
import { DEFAULT_PASSWORD, createAccount, uniqueEmail } from '../helpers/accounts.ts';
import { TestClient } from '../helpers/client.ts';
import { closeTestDb, testDb } from '../helpers/db.ts';
import { linksIn, waitForMail } from '../helpers/mail.ts';

afterAll(closeTestDb);

describe('sign up', () => {
  it('creates a quilter from the e-mailed link, signs them in and stores only hashes of the tokens', async () => {
    const email = uniqueEmail('signup');
    const since = new Date();
    const asked = await new TestClient().post('/api/accounts', { email, displayName: 'Rosalind Marsh', password: DEFAULT_PASSWORD, units: 'cm' });
    expect(asked.status).toBe(202);
    const mail = await waitForMail(email, { subject: 'Finish creating your Threadway account', since });
    const linkToken = new URL(linksIn(mail.text).find((l) => l.includes('/sign-up/confirm?token='))!).searchParams.get('token')!;
    const pending = await testDb().selectFrom('sign_up_request').selectAll().where('email', '=', email).executeTakeFirstOrThrow();
    expect(pending.id).toMatch(/^[0-9a-f]{64}$/);
    expect(pending.id).not.toContain(linkToken);
    expect(pending.password_hash).toMatch(/^\$argon2id\$/);

    const client = new TestClient();
    const res = await client.post('/api/accounts/confirm', { token: linkToken });
    expect(res.status).toBe(201);
    expect(res.body.account).toMatchObject({ email, displayName: 'Rosalind Marsh', role: 'quilter', units: 'cm' });
    expect(res.body.account).not.toHaveProperty('passwordHash');

    const cookie = res.headers.getSetCookie().find((c) => c.startsWith('tw_session='))!;
    expect(cookie).toMatch(/HttpOnly/i);
    expect(cookie).toMatch(/SameSite=Lax/i);
    expect(cookie).not.toMatch(/Secure/i); // the test server speaks plain http
    const token = client.sessionToken!;
    expect(token).toMatch(/^[a-z2-7]{32}$/);

    const db = testDb();
    const row = await db.selectFrom('account').selectAll().where('email', '=', email).executeTakeFirstOrThrow();
    expect(row.password_hash).toBe(pending.password_hash);
    const sessions = await db.selectFrom('session').selectAll().where('account_id', '=', row.id).execute();
    expect(sessions).toHaveLength(1);
    expect(sessions[0]!.id).toMatch(/^[0-9a-f]{64}$/);
    expect(sessions[0]!.id).not.toContain(token);
    expect(await db.selectFrom('sign_up_request').select('id').where('email', '=', email).execute()).toEqual([]);

    const me = await client.get('/api/session');
    expect(me.status).toBe(200);
    expect(me.body.account.email).toBe(email);
  });

  it('never makes a second account for the same e-mail, whatever its case, and answers as for a new one', async () => {
    const email = uniqueEmail('dup');
    await createAccount({ email });
    for (const variant of [email, email.toUpperCase(), `  ${email.replace(/^./, (c) => c.toUpperCase())} `]) {
      const res = await new TestClient().post('/api/accounts', { email: variant, displayName: 'Copy', password: DEFAULT_PASSWORD });
      expect(res.status).toBe(202);
      expect(res.body.message).toMatch(/Check your inbox/);
    }
    const count = await testDb()
      .selectFrom('account')
      .select((eb) => eb.fn.countAll<number>().as('n'))
      .where(sql<string>`lower(email)`, '=', email.toLowerCase())
      .executeTakeFirstOrThrow();
    expect(Number(count.n)).toBe(1);
    expect(await testDb().selectFrom('sign_up_request').select('id').where(sql<string>`lower(email)`, '=', email.toLowerCase()).execute()).toEqual([]);
  });

  it('asks for a password of at least 10 characters', async () => {
    const res = await new TestClient().post('/api/accounts', { email: uniqueEmail(), displayName: 'Short', password: 'nine-char' });
    expect(res.status).toBe(400);
    expect(res.body.error.fields.password).toMatch(/10/);
  });
});

describe('sign in and out', () => {
  it('signs in with the right password, in any e-mail case', async () => {
    const a = await createAccount();
    const client = new TestClient();
    const res = await client.post('/api/session', { email: a.email.toUpperCase(), password: a.password });
    expect(res.status).toBe(200);
    expect(res.body.account.id).toBe(a.id);
    expect((await client.get('/api/account')).body.account.email).toBe(a.email);
  });

  it('gives the same answer for a wrong password and an unknown e-mail', async () => {
    const a = await createAccount();
    const wrong = await new TestClient().post('/api/session', { email: a.email, password: 'not-the-password' });
    const unknown = await new TestClient().post('/api/session', { email: uniqueEmail('nobody'), password: 'not-the-password' });
    expect(wrong.status).toBe(401);
    expect(unknown.status).toBe(401);
    expect(wrong.body).toEqual(unknown.body);
    expect(wrong.body.error.code).toBe('invalid_credentials');
    expect(wrong.headers.getSetCookie().some((c) => c.startsWith('tw_session=') && !c.startsWith('tw_session=;'))).toBe(false);
  });

  it('signs out: the session row is deleted and the cookie no longer works', async () => {
    const a = await createAccount();
    const token = a.client.sessionToken!;
    const out = await a.client.delete('/api/session');
    expect(out.status).toBe(204);
    expect(a.client.sessionToken).toBeUndefined();
    const stale = new TestClient();
    stale.cookies.set('tw_session', token);
    expect((await stale.get('/api/session')).status).toBe(401);
    const rows = await testDb().selectFrom('session').select('id').where('account_id', '=', a.id).execute();
    expect(rows).toHaveLength(0);
  });

  it('signs out through the header form (POST /sign-out) and redirects home', async () => {
    const a = await createAccount();
    const res = await a.client.request('POST', '/sign-out', { headers: { 'content-type': 'application/x-www-form-urlencoded' }, body: '' });
    expect(res.status).toBe(303);
    expect(res.headers.get('location')).toMatch(/^\/\?signed-out/);
    expect((await a.client.get('/api/session')).status).toBe(401);
  });

  it('ignores a made-up session cookie', async () => {
    const client = new TestClient();
    client.cookies.set('tw_session', 'a'.repeat(32));
    expect((await client.get('/api/session')).status).toBe(401);
  });
});
