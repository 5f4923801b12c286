// Issue 10, defects 4 and 14 (sign-up part): password-reset e-mails are limited per account and per address,
// rotating X-Forwarded-For does not help; sign-up gives the same answer whether or not the address has an
// account (the owner is e-mailed instead), finishes through an e-mailed link, and is rate-limited.
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { DEFAULT_PASSWORD, createAccount, uniqueEmail } from '../helpers/accounts.ts';
import { TestClient } from '../helpers/client.ts';
import { closeTestDb, testDb } from '../helpers/db.ts';
import { startExtraServer, type ExtraServer } from '../helpers/extraServer.ts';
import { forgetLoopbackLimits } from '../helpers/limits.ts';
import { linksIn, readCapturedMail, waitForMail } from '../helpers/mail.ts';

let behindProxy: ExtraServer;
beforeAll(async () => {
  await forgetLoopbackLimits();
  behindProxy = await startExtraServer({ TRUSTED_PROXIES: '127.0.0.1' });
});
afterAll(async () => {
  await behindProxy?.stop();
  await forgetLoopbackLimits();
  await closeTestDb();
});

describe('password-reset e-mails', () => {
  it('are limited per account: rotating X-Forwarded-For does not buy a 6th e-mail within the hour', async () => {
    const a = await createAccount();
    const got: number[] = [];
    for (let i = 0; i < 6; i += 1) {
      got.push((await new TestClient().request('POST', '/api/password-resets', { body: { email: a.email }, headers: { 'x-forwarded-for': `203.0.113.${i + 1}` } })).status);
    }
    expect(got).toEqual([202, 202, 202, 202, 202, 429]);
    const queued = await testDb().selectFrom('email_message').select('id').where('to_address', '=', a.email).where('kind', '=', 'password-reset').execute();
    expect(queued).toHaveLength(5);
  });

  it('are limited per address across accounts (20 an hour), and another address is not affected', async () => {
    const client = new TestClient(behindProxy.url);
    const from = (address: string, email: string) => client.request('POST', '/api/password-resets', { body: { email }, headers: { 'x-forwarded-for': address } });
    const got: number[] = [];
    for (let i = 0; i < 21; i += 1) got.push((await from('198.51.100.20', uniqueEmail('reset-spray'))).status);
    expect(got.slice(0, 20)).toEqual(Array(20).fill(202));
    expect(got[20]).toBe(429);
    expect((await from('198.51.100.21', uniqueEmail('reset-spray'))).status).toBe(202);
  });

  it('a parallel burst for one account queues at most 5', async () => {
    const a = await createAccount();
    const burst = await Promise.all(Array.from({ length: 20 }, () => new TestClient().post('/api/password-resets', { email: a.email })));
    expect(burst.filter((r) => r.status === 202)).toHaveLength(5);
    expect(burst.filter((r) => r.status === 429)).toHaveLength(15);
  });
});

describe('sign-up does not tell who has an account', () => {
  it('answers the same for a new and a registered address; the owner is told by e-mail, nothing changes', async () => {
    const owner = await createAccount();
    const fresh = uniqueEmail('newcomer');
    const since = new Date();
    const body = (email: string) => ({ email, displayName: 'Ottoline Reed', password: DEFAULT_PASSWORD, units: 'in' });
    const forNew = await new TestClient().post('/api/accounts', body(fresh));
    const forTaken = await new TestClient().post('/api/accounts', body(owner.email.toUpperCase()));
    expect(forNew.status).toBe(202);
    expect(forTaken.status).toBe(202);
    expect(forTaken.body).toEqual(forNew.body);
    for (const r of [forNew, forTaken]) expect(r.headers.getSetCookie().filter((c) => c.startsWith('tw_session='))).toEqual([]);

    const notice = await waitForMail(owner.email, { subject: 'already have a Threadway account', since });
    expect(notice.text).toContain('/sign-in');
    expect(notice.text).toContain('/forgot-password');
    const accounts = await testDb().selectFrom('account').select(['id', 'display_name']).where('email', 'in', [owner.email, fresh]).execute();
    expect(accounts).toEqual([{ id: owner.id, display_name: owner.displayName }]);
  });

  it('creates the account only from the e-mailed link, once, and signs it in', async () => {
    const email = uniqueEmail('confirm');
    const since = new Date();
    expect((await new TestClient().post('/api/accounts', { email, displayName: 'Perpetua Vale', password: DEFAULT_PASSWORD, units: 'cm' })).status).toBe(202);
    const mail = await waitForMail(email, { subject: 'Finish creating your Threadway account', since });
    const link = new URL(linksIn(mail.text).find((l) => l.includes('/sign-up/confirm?token='))!);
    const token = link.searchParams.get('token')!;
    expect(token).toMatch(/^[a-z2-7]{32}$/);
    const page = await new TestClient().get(link.pathname + link.search);
    expect(page.status).toBe(200);
    expect(page.text).toContain('Finish creating your account');
    // Opening the page (as a mail scanner would) creates nothing.
    expect(await testDb().selectFrom('account').select('id').where('email', '=', email).execute()).toEqual([]);

    const client = new TestClient();
    const done = await client.post('/api/accounts/confirm', { token });
    expect(done.status).toBe(201);
    expect(done.body.account).toMatchObject({ email, displayName: 'Perpetua Vale', role: 'quilter', units: 'cm' });
    expect((await client.get('/api/session')).body.account.email).toBe(email);
    const again = await new TestClient().post('/api/accounts/confirm', { token });
    expect(again.status).toBe(400);
    expect(again.body.error.code).toBe('invalid_token');
    expect((await new TestClient().post('/api/session', { email, password: DEFAULT_PASSWORD })).status).toBe(200);
  });

  it('a confirmation link for an address that got an account meanwhile creates nothing', async () => {
    const email = uniqueEmail('race');
    const since = new Date();
    await new TestClient().post('/api/accounts', { email, displayName: 'First Try', password: DEFAULT_PASSWORD });
    const mail = await waitForMail(email, { subject: 'Finish creating', since });
    const token = new URL(linksIn(mail.text).find((l) => l.includes('token='))!).searchParams.get('token')!;
    await createAccount({ email });
    const res = await new TestClient().post('/api/accounts/confirm', { token });
    expect(res.status).toBe(400);
    expect(res.body.error.message).toMatch(/already has an account/);
  });

  it('is limited per e-mail address (3 an hour) so nobody can flood an inbox', async () => {
    const email = uniqueEmail('flood');
    const got: number[] = [];
    for (let i = 0; i < 4; i += 1) got.push((await new TestClient().post('/api/accounts', { email, displayName: 'Flood', password: DEFAULT_PASSWORD })).status);
    expect(got).toEqual([202, 202, 202, 429]);
    await new Promise((r) => setTimeout(r, 300));
    expect(readCapturedMail().filter((m) => m.to.includes(email)).length).toBeLessThanOrEqual(3);
  });

  it('is limited per address (20 an hour)', async () => {
    const client = new TestClient(behindProxy.url);
    const got: number[] = [];
    for (let i = 0; i < 21; i += 1) {
      got.push((await client.request('POST', '/api/accounts', { body: { email: uniqueEmail('signup-spray'), displayName: 'Spray', password: DEFAULT_PASSWORD }, headers: { 'x-forwarded-for': '198.51.100.30' } })).status);
    }
    expect(got.slice(0, 20)).toEqual(Array(20).fill(202));
    expect(got[20]).toBe(429);
  });
});
