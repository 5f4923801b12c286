// At least 300 malformed requests across the API (malformedCases.ts), each from a visitor who may use the
// endpoint: every one is answered 4xx, with the field named wherever the fault is in a field, and none is 500 or
// 2xx. Path parameters that cannot name anything (bad ids, versions past the integer range, junk tokens) are sent
// to every route that has them, pages included. Afterwards the server still serves.
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createAccount, type TestAccount } from '../../helpers/accounts.ts';
import { TestClient } from '../../helpers/client.ts';
import { closeTestDb } from '../../helpers/db.ts';
import { testEnv } from '../../helpers/env.ts';
import { matrixRows } from './accessMatrix.ts';
import { BAD_PATH_VALUES, bodyCases, bodyEndpoints, queryCases, type Case } from './malformedCases.ts';
import { ACTORS, buildSecurityWorld, type SecurityWorld } from './securityWorld.ts';

let w: SecurityWorld;
let victim: TestAccount;
let sent = 0;

beforeAll(async () => {
  w = await buildSecurityWorld();
  victim = await createAccount({ displayName: 'Vera Testcase' });
});
afterAll(async () => {
  await closeTestDb();
});

async function send(c: Case): Promise<{ status: number; body: any; text: string }> {
  const client = typeof c.actor === 'function' ? c.actor(w).client : w.client(c.actor);
  const headers = new Headers({ origin: new URL(testEnv.appUrl).origin });
  if (c.body !== undefined && c.contentType !== null) headers.set('content-type', c.contentType ?? 'application/json');
  if (client.cookies.size) headers.set('cookie', [...client.cookies].map(([k, v]) => `${k}=${v}`).join('; '));
  const body = c.body === undefined ? null : typeof c.body === 'string' ? c.body : (c.body as Uint8Array<ArrayBuffer>);
  const res = await fetch(new URL(c.path, testEnv.appUrl), { method: c.method, headers, body, redirect: 'manual' });
  sent += 1;
  const text = await res.text();
  let parsed: any = null;
  if (res.headers.get('content-type')?.includes('json')) parsed = JSON.parse(text);
  return { status: res.status, body: parsed, text };
}

/** Problems with one answer ('' when it is right). */
function judge(c: Case, res: { status: number; body: any; text: string }, throttled: boolean): string {
  const where = `${c.label} → ${res.status} ${res.text.slice(0, 160)}`;
  if (res.status < 400 || res.status >= 500) return where;
  if (throttled && res.status === 429) return '';
  if (c.status !== undefined && res.status !== c.status) return `${where} (expected ${c.status})`;
  if (c.field !== undefined) {
    const names = Object.keys(res.body?.error?.fields ?? {});
    if (!names.some((n) => n === c.field || n.startsWith(`${c.field}.`))) return `${where} (field "${c.field}" not named)`;
  }
  return '';
}

async function run(cases: Case[], throttled = false): Promise<string[]> {
  const problems: string[] = [];
  for (const c of cases) {
    const p = judge(c, await send(c), throttled);
    if (p) problems.push(p);
  }
  return problems;
}

describe('malformed JSON bodies', () => {
  for (const e of bodyEndpoints(() => victim)) {
    it(`${e.method} ${e.label}`, async () => {
      const cases = bodyCases(e, w);
      expect(await run(cases, e.throttled)).toEqual([]);
    });
  }
});

describe('malformed query strings', () => {
  it('name the parameter', async () => {
    expect(await run(queryCases(w))).toEqual([]);
  });
});

describe('path parameters that cannot name anything', () => {
  for (const row of matrixRows) {
    const [method, pattern] = [row.route.split(' ')[0]!, row.route.split(' ')[1]!];
    const params = pattern.split('/').map((seg, i) => (/^\[.+\]$/.test(seg) ? i : -1)).filter((i) => i >= 0);
    if (params.length === 0) continue;
    // The first visitor who gets past the guards with good values (not refused, not sent to sign in) asks with bad ones.
    const actor = ACTORS.find((a) => ![302, 401, 404].includes(row.expect[a]));
    if (!actor) continue;
    it(`${row.route} as ${actor}`, async () => {
      const good = row.path(w).split('?')[0]!.split('/');
      const cases: Case[] = [];
      for (const i of params) {
        for (const bad of BAD_PATH_VALUES) {
          const path = [...good.slice(0, i), bad, ...good.slice(i + 1)].join('/');
          cases.push({ label: `${method} ${path.slice(0, 90)}`, actor, method, path, ...(row.body !== undefined && { body: JSON.stringify(row.body) }) });
        }
      }
      expect(await run(cases)).toEqual([]);
    });
  }
});

describe('afterwards', () => {
  it(`sent at least 300 malformed requests, and the server still serves`, async () => {
    console.log(`[security] ${sent} malformed requests sent, none answered 2xx or 5xx`);
    expect(sent).toBeGreaterThanOrEqual(300);
    expect((await new TestClient().get('/')).status).toBe(200);
    expect((await new TestClient().get('/api/session')).status).toBe(401);
    expect((await victim.client.get('/api/account')).body.account).toMatchObject({ displayName: 'Vera Testcase', role: 'quilter', email: victim.email });
  });
});
