// Issue 10, defects 12 and 14 (invalid UTF-8, the bare 413): values JavaScript accepts but PostgreSQL cannot hold
// (a 30th of February, numbers past the integer range, NUL characters, half a surrogate pair, bytes that are not
// UTF-8) are refused with 400 naming the field, before the database sees them; none gives 500, and nothing is
// stored altered. A path segment that cannot name anything (a version past the integer range) is 404, as any
// unknown path. A design past the body cap gets 413 saying the limits in words.
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createAccount, type TestAccount } from '../../helpers/accounts.ts';
import { TestClient } from '../../helpers/client.ts';
import { testEnv } from '../../helpers/env.ts';
import { closeTestDb, testDb } from '../../helpers/db.ts';
import { block } from '../designFixtures.ts';
import { buildWorld, DAY, iso, type World } from '../teachingWorld.ts';

let w: World;
let publicTemplateId: string;
let quilter: TestAccount;
const anonymous = new TestClient();

beforeAll(async () => {
  w = await buildWorld();
  quilter = await createAccount({ displayName: 'Orla Basting' });
  const design = await w.teacher.client.post('/api/designs', { title: 'Public one', design: block() });
  await w.teacher.client.put(`/api/designs/${design.body.design.id}/route`, { kind: 'planned', designVersion: 1 });
  const published = await w.teacher.client.post('/api/templates', { designId: design.body.design.id, title: 'Public validation block', difficulty: 'beginner', visibility: 'public' });
  expect(published.status, published.text).toBe(201);
  publicTemplateId = published.body.template.id;
});
afterAll(closeTestDb);

function expectField(res: { status: number; body: any; text: string }, field: string, status = 400) {
  expect(res.status, res.text).toBe(status);
  expect(res.body?.error?.fields?.[field], `field ${field} named in ${res.text}`).toBeTruthy();
}

/** Sends raw bytes as a JSON body with the client's cookies and the app's Origin. */
async function sendRaw(client: TestClient, method: string, path: string, bytes: Uint8Array) {
  const headers = new Headers({ 'content-type': 'application/json', origin: new URL(testEnv.appUrl).origin });
  if (client.cookies.size) headers.set('cookie', [...client.cookies].map(([k, v]) => `${k}=${v}`).join('; '));
  const res = await fetch(new URL(path, testEnv.appUrl), { method, headers, body: bytes as Uint8Array<ArrayBuffer> });
  const text = await res.text();
  return { status: res.status, body: res.headers.get('content-type')?.includes('json') ? JSON.parse(text) : null, text };
}

describe('dates that do not exist', () => {
  it('a class starting on 2027-02-30 (or 2027-02-29, or in year 0) is refused naming startsOn', async () => {
    for (const startsOn of ['2027-02-30', '2027-02-29', '2027-04-31', '0000-01-01']) {
      expectField(await w.teacher.client.post('/api/classes', { title: 'Leap class', startsOn }), 'startsOn');
      expectField(await w.teacher.client.patch(`/api/classes/${w.classId}`, { startsOn }), 'startsOn');
    }
    expect((await w.teacher.client.post('/api/classes', { title: 'Leap class', startsOn: '2028-02-29', confirmed: true })).status).toBe(201);
  });

  it('a lesson released on a day that does not exist, or in year 0, is refused naming releaseAt', async () => {
    for (const releaseAt of ['2027-02-30T09:00:00Z', '0000-06-01T09:00:00Z', '2027-01-01T09:00:00']) {
      expectField(await w.teacher.client.post(`/api/classes/${w.classId}/lessons`, { title: 'Odd day', releaseAt, templateVersionId: w.versionId }), 'releaseAt');
    }
    expect((await w.teacher.client.post(`/api/classes/${w.classId}/lessons`, { title: 'Real day', releaseAt: iso(3 * DAY), templateVersionId: w.versionId, confirmed: true })).status).toBe(201);
  });
});

describe('numbers past PostgreSQL’s integer range', () => {
  it('copying template version 99999999999 is refused naming version', async () => {
    for (const version of [99_999_999_999, 2 ** 31, 1e300]) expectField(await quilter.client.post(`/api/templates/${publicTemplateId}/copy`, { version }), 'version');
  });

  it('a version path past the range is not found (404), for anonymous visitors too, on the API and the page', async () => {
    for (const v of ['99999999999', '2147483648', '1e3', '01']) {
      const api = await anonymous.get(`/api/templates/${publicTemplateId}/versions/${v}`);
      expect(api.status, `${v}: ${api.text}`).toBe(404);
      const page = await anonymous.get(`/templates/${publicTemplateId}?version=${v}`);
      expect(page.status, v).toBe(404);
    }
    expect((await anonymous.get(`/api/templates/${publicTemplateId}/versions/1`)).status).toBe(200);
  });

  it('base versions past the range are refused naming the field', async () => {
    const d = await quilter.client.post('/api/designs', { title: 'Range', design: block() });
    expectField(await quilter.client.put(`/api/designs/${d.body.design.id}`, { baseVersion: 99_999_999_999, title: 'x' }), 'baseVersion');
    expectField(await quilter.client.put(`/api/designs/${d.body.design.id}/route`, { kind: 'planned', designVersion: 2 ** 31 }), 'designVersion');
  });
});

describe('text PostgreSQL cannot store', () => {
  it('NUL in a title, a notes field or a search is refused naming it; nothing is written', async () => {
    const before = await testDb().selectFrom('design').select((eb) => eb.fn.countAll<number>().as('n')).where('owner_id', '=', quilter.id).executeTakeFirstOrThrow();
    expectField(await quilter.client.post('/api/designs', { title: 'Nine\u0000patch', design: block() }), 'title');
    expectField(await quilter.client.post('/api/designs', { title: 'ok', notes: 'a\u0000b', design: block() }), 'notes');
    expectField(await w.teacher.client.post('/api/classes', { title: 'Class\u0000', startsOn: '2027-03-01' }), 'title');
    expectField(await quilter.client.get('/api/designs?q=%00'), 'q');
    expectField(await anonymous.get('/api/templates?q=%00'), 'q');
    const after = await testDb().selectFrom('design').select((eb) => eb.fn.countAll<number>().as('n')).where('owner_id', '=', quilter.id).executeTakeFirstOrThrow();
    expect(Number(after.n)).toBe(Number(before.n));
    expect((await anonymous.get('/templates?q=%00')).status).toBe(200);
  });

  it('half a surrogate pair (a valid JSON escape, but no character) is refused, not stored as U+FFFD', async () => {
    const d = await quilter.client.post('/api/designs', { title: 'Surrogates', design: block() });
    const res = await sendRaw(quilter.client, 'PUT', `/api/designs/${d.body.design.id}`, new TextEncoder().encode('{"baseVersion":1,"notes":"thread \\ud83e only"}'));
    expectField(res, 'notes');
    const stored = await testDb().selectFrom('design').select(['notes', 'version']).where('id', '=', d.body.design.id).executeTakeFirstOrThrow();
    expect(stored).toEqual({ notes: '', version: 1 });
    expectField(await sendRaw(w.teacher.client, 'POST', '/api/classes', new TextEncoder().encode('{"title":"\\udc00 class","startsOn":"2027-03-01"}')), 'title');
  });

  it('bytes that are not UTF-8 are refused with 400, not stored as U+FFFD', async () => {
    const enc = new TextEncoder();
    // 0xC3 0x28: a two-byte lead followed by "(" (RFC 3629: not a valid sequence).
    const body = new Uint8Array([...enc.encode('{"displayName":"Orla '), 0xc3, 0x28, ...enc.encode('"}')]);
    const res = await sendRaw(quilter.client, 'PATCH', '/api/account', body);
    expectField(res, 'body');
    expect(res.body.error.message).toMatch(/UTF-8/);
    expect((await quilter.client.get('/api/account')).body.account.displayName).toBe('Orla Basting');
    const design = new Uint8Array([...enc.encode('{"title":"Caf'), 0xe9, ...enc.encode('","design":'), ...enc.encode(JSON.stringify(block())), ...enc.encode('}')]);
    expectField(await sendRaw(quilter.client, 'POST', '/api/designs', design), 'body');
  });
});

describe('a design past the body cap', () => {
  it('gets 413 saying the limits in words: 5 MB, 200,000 points, 20,000 lines', async () => {
    // 200,000 points (the design cap) at full double precision is about 8 MB of JSON: over the 5 MB body cap.
    const lines: number[][][] = [];
    for (let i = 0; i < 2000; i += 1) {
      const line: number[][] = [];
      for (let j = 0; j < 100; j += 1) line.push([0.1 + (j * 11.8) / 99 + 1e-13 * i, 0.1 + (i * 11.8) / 1999 + 1e-13 * j]);
      lines.push(line);
    }
    const res = await quilter.client.post('/api/designs', { title: 'Every point', design: block({ lines }) });
    expect(res.status).toBe(413);
    expect(res.body.error.code).toBe('payload_too_large');
    expect(res.body.error.message).toMatch(/5 MB/);
    expect(res.body.error.message).toMatch(/200,000 points/);
    expect(res.body.error.message).toMatch(/20,000 lines/);
  });
});
