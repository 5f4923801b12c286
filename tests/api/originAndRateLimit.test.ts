// Cross-site protection for the JSON API, and the sign-in / reset rate limits.
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createAccount, uniqueEmail } from '../helpers/accounts.ts';
import { TestClient } from '../helpers/client.ts';
import { closeTestDb, testDb } from '../helpers/db.ts';
import { forgetLoopbackLimits } from '../helpers/limits.ts';

beforeAll(forgetLoopbackLimits);
afterAll(async () => {
  await forgetLoopbackLimits();
  await closeTestDb();
});

describe('Origin check on state-changing API requests', () => {
  const writes: [string, string][] = [
    ['POST', '/api/session'],
    ['POST', '/api/accounts'],
    ['DELETE', '/api/session'],
    ['PATCH', '/api/account'],
    ['PUT', '/api/account/password'],
    ['POST', '/api/password-resets'],
  ];
  for (const [method, path] of writes) {
    it(`${method} ${path}: 403 JSON without an Origin and with a foreign one`, async () => {
      for (const origin of [null, 'https://evil.example', 'http://127.0.0.1:1']) {
        const res = await new TestClient().request(method, path, { origin, body: { email: uniqueEmail(), password: 'whatever-password' } });
        expect(res.status).toBe(403);
        expect(res.body.error.code).toBe('forbidden_origin');
      }
    });
  }

  it('does not sign out a session through a foreign-origin DELETE', async () => {
    const a = await createAccount();
    expect((await a.client.delete('/api/session', { origin: 'https://evil.example' })).status).toBe(403);
    expect((await a.client.get('/api/session')).status).toBe(200);
  });

  it('lets GET requests through without an Origin', async () => {
    expect((await new TestClient().get('/api/session')).status).toBe(401);
  });
});

describe('rate limits', () => {
  it('slows an account down after 10 failed sign-ins from unfamiliar devices: 429, Retry-After and the retry time', async () => {
    const a = await createAccount();
    for (let i = 0; i < 10; i += 1) {
      expect((await new TestClient().post('/api/session', { email: a.email, password: `wrong-password-${i}` })).status).toBe(401);
    }
    const blocked = await new TestClient().post('/api/session', { email: a.email, password: a.password });
    expect(blocked.status).toBe(429);
    expect(blocked.body.error.code).toBe('rate_limited');
    const retryAfter = Number(blocked.headers.get('retry-after'));
    expect(retryAfter).toBeGreaterThan(25);
    expect(retryAfter).toBeLessThanOrEqual(30);
    expect(blocked.body.error.message).toMatch(/\d+ seconds \(until \d\d:\d\d UTC\)/);
    expect(blocked.body.error.message).toMatch(/device you have signed in from before/);
    // Another e-mail from the same address is not affected.
    const b = await createAccount();
    expect((await new TestClient().post('/api/session', { email: b.email, password: b.password })).status).toBe(200);
    // Once the wait is over, the right password works again (and clears the failures).
    await testDb().updateTable('rate_limit').set({ next_at: new Date(Date.now() - 1000) }).where('key', '=', `sign-in:account:${a.email}`).execute();
    expect((await new TestClient().post('/api/session', { email: a.email, password: a.password })).status).toBe(200);
    expect(await testDb().selectFrom('rate_limit').select('key').where('key', '=', `sign-in:account:${a.email}`).execute()).toEqual([]);
  });

  it('a caller who varies X-Forwarded-For still meets the per-account limit', async () => {
    const a = await createAccount();
    const attempt = (i: number, password: string) =>
      new TestClient().request('POST', '/api/session', { body: { email: a.email, password }, headers: { 'x-forwarded-for': `203.0.113.${i % 250}` } });
    for (let i = 0; i < 10; i += 1) expect((await attempt(i, `wrong-password-${i}`)).status).toBe(401);
    const blocked = await attempt(99, a.password);
    expect(blocked.status).toBe(429);
    expect(blocked.body.error.code).toBe('rate_limited');
  });

  it('a successful sign-in clears earlier failures', async () => {
    const a = await createAccount();
    for (let i = 0; i < 9; i += 1) await new TestClient().post('/api/session', { email: a.email, password: 'wrong-password' });
    expect((await new TestClient().post('/api/session', { email: a.email, password: a.password })).status).toBe(200);
    for (let i = 0; i < 9; i += 1) expect((await new TestClient().post('/api/session', { email: a.email, password: 'wrong-password' })).status).toBe(401);
  });

  it('allows 5 reset requests per hour for one e-mail, then 429', async () => {
    const email = uniqueEmail('resetter');
    for (let i = 0; i < 5; i += 1) expect((await new TestClient().post('/api/password-resets', { email })).status).toBe(202);
    const blocked = await new TestClient().post('/api/password-resets', { email });
    expect(blocked.status).toBe(429);
    expect(Number(blocked.headers.get('retry-after'))).toBeGreaterThan(59 * 60);
    expect(blocked.body.error.message).toMatch(/password-reset requests/);
  });
});
