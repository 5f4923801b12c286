// Issue 10, defect 3: the sign-in limits hold under parallel requests, X-Forwarded-For counts only behind a
// configured proxy, and a stranger's burst against an account does not stop its owner on a device they have
// signed in from before. Two extra servers act as "deployed behind a proxy" and "no proxy" with small limits.
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createAccount, uniqueEmail } from '../helpers/accounts.ts';
import { TestClient } from '../helpers/client.ts';
import { closeTestDb, testDb } from '../helpers/db.ts';
import { startExtraServer, type ExtraServer } from '../helpers/extraServer.ts';
import { forgetLoopbackLimits } from '../helpers/limits.ts';

let behindProxy: ExtraServer;
let smallNoProxy: ExtraServer;

beforeAll(async () => {
  await forgetLoopbackLimits();
  [behindProxy, smallNoProxy] = await Promise.all([
    // The test process is the proxy: it connects from 127.0.0.1 and says who the client is.
    startExtraServer({ TRUSTED_PROXIES: '127.0.0.1' }),
    // RATE_LIMIT_SCALE 0.1: 10 failed sign-ins per address instead of 100, so a spray is short.
    startExtraServer({ RATE_LIMIT_SCALE: '0.1' }),
  ]);
});
afterAll(async () => {
  await Promise.all([behindProxy?.stop(), smallNoProxy?.stop()]);
  await forgetLoopbackLimits();
  await closeTestDb();
});

const statuses = (rs: { status: number }[]) => rs.map((r) => r.status);
const count = (xs: number[], s: number) => xs.filter((x) => x === s).length;

describe('sign-in limit under a parallel burst', () => {
  it('checks at most 10 of 30 simultaneous wrong passwords for one account; the rest get 429', async () => {
    const a = await createAccount();
    const burst = await Promise.all(Array.from({ length: 30 }, (_, i) => new TestClient().post('/api/session', { email: a.email, password: `wrong-password-${i}` })));
    const got = statuses(burst);
    expect(count(got, 401) + count(got, 429)).toBe(30);
    expect(count(got, 401)).toBeLessThanOrEqual(10);
    expect(count(got, 401)).toBeGreaterThan(0);
    const refused = burst.find((r) => r.status === 429)!;
    expect(refused.body.error.code).toBe('rate_limited');
    expect(Number(refused.headers.get('retry-after'))).toBeGreaterThan(0);
  });
});

describe('client address', () => {
  it('ignores X-Forwarded-For when no proxy is trusted (the default): the attempt counts for the connecting address', async () => {
    const a = await createAccount();
    const res = await new TestClient().request('POST', '/api/session', { body: { email: a.email, password: 'wrong-password' }, headers: { 'x-forwarded-for': '203.0.113.77' } });
    expect(res.status).toBe(401);
    const keys = (await testDb().selectFrom('rate_limit').select('key').execute()).map((r) => r.key);
    expect(keys.filter((k) => k.includes('203.0.113.77'))).toEqual([]);
    expect(keys).toContain('sign-in:ip:127.0.0.1');
  });

  it('rotating X-Forwarded-For does not get round the per-address limit when no proxy is trusted', async () => {
    await forgetLoopbackLimits();
    const client = new TestClient(smallNoProxy.url);
    const tries: number[] = [];
    for (let i = 0; i < 11; i += 1) {
      const res = await client.request('POST', '/api/session', { body: { email: uniqueEmail('spray'), password: 'summer-quilt-2027' }, headers: { 'x-forwarded-for': `203.0.113.${i + 1}` } });
      tries.push(res.status);
    }
    expect(tries.slice(0, 10)).toEqual(Array(10).fill(401));
    expect(tries[10]).toBe(429);
    await forgetLoopbackLimits();
  });

  it('behind a trusted proxy, the address the proxy reports is the one counted', async () => {
    const a = await createAccount();
    const res = await new TestClient(behindProxy.url).request('POST', '/api/session', { body: { email: a.email, password: 'wrong-password' }, headers: { 'x-forwarded-for': '198.51.100.41' } });
    expect(res.status).toBe(401);
    const row = await testDb().selectFrom('rate_limit').select('hits').where('key', '=', 'sign-in:ip:198.51.100.41').executeTakeFirst();
    expect(row?.hits).toBe(1);
  });
});

describe("a stranger's burst does not lock the owner out", () => {
  it('the owner still signs in from a device they used before; an unfamiliar device has to wait', async () => {
    const owner = await createAccount();
    const ownerDevice = new TestClient(behindProxy.url);
    const at = (address: string) => ({ 'x-forwarded-for': address });
    expect((await ownerDevice.request('POST', '/api/session', { body: { email: owner.email, password: owner.password }, headers: at('198.51.100.7') })).status).toBe(200);
    expect(ownerDevice.cookies.get('tw_device')).toBeTruthy();
    expect((await ownerDevice.delete('/api/session')).status).toBe(204);

    // 60 wrong passwords at once from 60 addresses (more than the old per-account cap of 50).
    const burst = await Promise.all(
      Array.from({ length: 60 }, (_, i) =>
        new TestClient(behindProxy.url).request('POST', '/api/session', { body: { email: owner.email, password: `guess-${i}-password` }, headers: at(`203.0.113.${i + 1}`) }),
      ),
    );
    const got = statuses(burst);
    expect(count(got, 401)).toBeLessThanOrEqual(10);
    expect(count(got, 429)).toBeGreaterThanOrEqual(50);

    // The right password from a browser that never signed in to this account: slowed down, with a way out.
    const stranger = await new TestClient(behindProxy.url).request('POST', '/api/session', { body: { email: owner.email, password: owner.password }, headers: at('198.51.100.8') });
    expect(stranger.status).toBe(429);
    expect(stranger.body.error.message).toMatch(/device you have signed in from before|reset your password/);

    // The owner's own browser, with its device cookie, gets in at once.
    const back = await ownerDevice.request('POST', '/api/session', { body: { email: owner.email, password: owner.password }, headers: at('198.51.100.7') });
    expect(back.status).toBe(200);
    expect((await ownerDevice.get('/api/session')).body.account.id).toBe(owner.id);
  });

  it('a device cookie for one account does not help with another account, and a forged one is ignored', async () => {
    const [a, b] = await Promise.all([createAccount(), createAccount()]);
    const device = new TestClient(behindProxy.url);
    expect((await device.request('POST', '/api/session', { body: { email: a.email, password: a.password }, headers: { 'x-forwarded-for': '198.51.100.9' } })).status).toBe(200);
    const cookie = device.cookies.get('tw_device')!;
    const burst = await Promise.all(
      Array.from({ length: 15 }, (_, i) =>
        new TestClient(behindProxy.url).request('POST', '/api/session', { body: { email: b.email, password: `guess-${i}-password` }, headers: { 'x-forwarded-for': `203.0.113.${100 + i}` } }),
      ),
    );
    expect(count(statuses(burst), 401)).toBeLessThanOrEqual(10);
    const other = new TestClient(behindProxy.url);
    other.cookies.set('tw_device', cookie);
    expect((await other.request('POST', '/api/session', { body: { email: b.email, password: b.password }, headers: { 'x-forwarded-for': '198.51.100.10' } })).status).toBe(429);
    const forged = new TestClient(behindProxy.url);
    forged.cookies.set('tw_device', cookie.replace(/^[0-9a-f-]{36}/, b.id));
    expect((await forged.request('POST', '/api/session', { body: { email: b.email, password: b.password }, headers: { 'x-forwarded-for': '198.51.100.10' } })).status).toBe(429);
  });
});
