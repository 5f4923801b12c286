// Session lifetime: expiry and sliding refresh, driven by moving expires_at in the database.
import { afterAll, describe, expect, it } from 'vitest';
import { createAccount } from '../helpers/accounts.ts';
import { closeTestDb, testDb } from '../helpers/db.ts';

afterAll(closeTestDb);
const DAY = 24 * 60 * 60 * 1000;

async function sessionRow(accountId: string) {
  return testDb().selectFrom('session').selectAll().where('account_id', '=', accountId).executeTakeFirstOrThrow();
}

describe('session lifetime', () => {
  it('lasts 30 days from sign-in', async () => {
    const a = await createAccount();
    const row = await sessionRow(a.id);
    const days = (row.expires_at.getTime() - Date.now()) / DAY;
    expect(days).toBeGreaterThan(29.9);
    expect(days).toBeLessThanOrEqual(30);
  });

  it('refuses and deletes an expired session', async () => {
    const a = await createAccount();
    await testDb().updateTable('session').set({ expires_at: new Date(Date.now() - 1000) }).where('account_id', '=', a.id).execute();
    const res = await a.client.get('/api/session');
    expect(res.status).toBe(401);
    expect(res.headers.getSetCookie().some((c) => c.startsWith('tw_session=') && /max-age=0/i.test(c))).toBe(true);
    expect(await testDb().selectFrom('session').select('id').where('account_id', '=', a.id).execute()).toHaveLength(0);
  });

  it('renews a session with fewer than 15 days left, in the database and in the cookie', async () => {
    const a = await createAccount();
    await testDb().updateTable('session').set({ expires_at: new Date(Date.now() + 10 * DAY) }).where('account_id', '=', a.id).execute();
    const res = await a.client.get('/api/session');
    expect(res.status).toBe(200);
    const cookie = res.headers.getSetCookie().find((c) => c.startsWith('tw_session='));
    expect(cookie).toBeDefined();
    const expires = Date.parse(/expires=([^;]+)/i.exec(cookie!)![1]!);
    expect((expires - Date.now()) / DAY).toBeGreaterThan(29.9);
    expect(((await sessionRow(a.id)).expires_at.getTime() - Date.now()) / DAY).toBeGreaterThan(29.9);
  });

  it('leaves a fresh session alone (no new cookie, same expiry)', async () => {
    const a = await createAccount();
    const before = (await sessionRow(a.id)).expires_at.getTime();
    const res = await a.client.get('/api/session');
    expect(res.status).toBe(200);
    expect(res.headers.getSetCookie().filter((c) => c.startsWith('tw_session='))).toHaveLength(0);
    expect((await sessionRow(a.id)).expires_at.getTime()).toBe(before);
  });
});
