// Password reset through the e-mail the fake SMTP server captured.
import { afterAll, describe, expect, it } from 'vitest';
import { createAccount, signIn, uniqueEmail } from '../helpers/accounts.ts';
import { TestClient } from '../helpers/client.ts';
import { closeTestDb, testDb } from '../helpers/db.ts';
import { linksIn, readCapturedMail, waitForMail } from '../helpers/mail.ts';

afterAll(closeTestDb);

async function requestResetLink(email: string): Promise<URL> {
  const since = new Date();
  const res = await new TestClient().post('/api/password-resets', { email });
  expect(res.status).toBe(202);
  const mail = await waitForMail(email, { subject: 'Reset your Threadway password', since });
  const link = linksIn(mail.text).find((l) => l.includes('/reset-password?token='));
  expect(link).toBeDefined();
  return new URL(link!);
}

describe('password reset', () => {
  it('resets the password with the e-mailed link, signs out every session, and the link works once', async () => {
    const a = await createAccount();
    const other = await signIn(a.email, a.password);
    const link = await requestResetLink(a.email);
    const token = link.searchParams.get('token')!;
    expect(token).toMatch(/^[a-z2-7]{32}$/);

    const page = await new TestClient().get(link.pathname + link.search);
    expect(page.status).toBe(200);
    expect(page.text).toContain('Choose a new password');

    const done = await new TestClient().post('/api/password-resets/confirm', { token, password: 'a-brand-new-password' });
    expect(done.status).toBe(200);
    expect((await a.client.get('/api/session')).status).toBe(401);
    expect((await other.get('/api/session')).status).toBe(401);
    expect((await new TestClient().post('/api/session', { email: a.email, password: a.password })).status).toBe(401);
    await signIn(a.email, 'a-brand-new-password');

    const again = await new TestClient().post('/api/password-resets/confirm', { token, password: 'yet-another-password' });
    expect(again.status).toBe(400);
    expect(again.body.error.code).toBe('invalid_token');
    expect(again.body.error.message).toMatch(/already been used/);
  });

  it('refuses an expired link with a clear message', async () => {
    const a = await createAccount();
    const token = (await requestResetLink(a.email)).searchParams.get('token')!;
    await testDb().updateTable('password_reset').set({ expires_at: new Date(Date.now() - 1000) }).where('account_id', '=', a.id).execute();
    const res = await new TestClient().post('/api/password-resets/confirm', { token, password: 'a-brand-new-password' });
    expect(res.status).toBe(400);
    expect(res.body.error.message).toMatch(/expired/);
    expect((await a.client.get('/api/session')).status).toBe(200);
  });

  it('refuses a well-formed token it never issued', async () => {
    const res = await new TestClient().post('/api/password-resets/confirm', { token: 'a'.repeat(32), password: 'a-brand-new-password' });
    expect(res.status).toBe(400);
    expect(res.body.error.code).toBe('invalid_token');
  });

  it('stores only a hash of the token, valid for one hour', async () => {
    const a = await createAccount();
    const token = (await requestResetLink(a.email)).searchParams.get('token')!;
    const row = await testDb().selectFrom('password_reset').selectAll().where('account_id', '=', a.id).executeTakeFirstOrThrow();
    expect(row.id).toMatch(/^[0-9a-f]{64}$/);
    expect(row.id).not.toBe(token);
    const minutes = (row.expires_at.getTime() - row.created_at.getTime()) / 60_000;
    expect(minutes).toBeCloseTo(60, 0);
  });

  it('answers 202 for an unknown address and sends nothing', async () => {
    const email = uniqueEmail('ghost');
    const res = await new TestClient().post('/api/password-resets', { email });
    expect(res.status).toBe(202);
    await new Promise((r) => setTimeout(r, 500));
    expect(readCapturedMail().some((m) => m.to.includes(email))).toBe(false);
  });

  it('logs the message in the outbox as sent', async () => {
    const a = await createAccount();
    await requestResetLink(a.email);
    const rows = await testDb().selectFrom('email_message').selectAll().where('to_address', '=', a.email).execute();
    expect(rows).toHaveLength(1);
    expect(rows[0]).toMatchObject({ kind: 'password-reset', status: 'sent', attempts: 1 });
  });
});
