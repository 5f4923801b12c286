// Owner isolation: every design endpoint answers 404 to another account (its existence is not revealed) and
// 401 to an anonymous visitor; the owner's design is untouched afterwards.
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createAccount, type TestAccount } from '../helpers/accounts.ts';
import { closeTestDb } from '../helpers/db.ts';
import { TestClient } from '../helpers/client.ts';
import { block } from './designFixtures.ts';

interface Call {
  method: 'GET' | 'POST' | 'PUT' | 'DELETE';
  path: (id: string) => string;
  /** A body the owner could send successfully (so a 404 comes from ownership, not from validation). */
  body?: unknown;
}

const designCalls: Call[] = [
  { method: 'GET', path: (id) => `/api/designs/${id}` },
  { method: 'PUT', path: (id) => `/api/designs/${id}`, body: { baseVersion: 1, title: 'taken over' } },
  { method: 'DELETE', path: (id) => `/api/designs/${id}` },
  { method: 'POST', path: (id) => `/api/designs/${id}/duplicate` },
  { method: 'POST', path: (id) => `/api/designs/${id}/restore` },
  { method: 'GET', path: (id) => `/api/designs/${id}/versions` },
  { method: 'GET', path: (id) => `/api/designs/${id}/versions/1` },
  { method: 'POST', path: (id) => `/api/designs/${id}/versions/1/restore`, body: { baseVersion: 1 } },
  { method: 'POST', path: (id) => `/api/designs/${id}/check`, body: {} },
  { method: 'POST', path: (id) => `/api/designs/${id}/plan`, body: { design: block() } },
  { method: 'GET', path: (id) => `/api/designs/${id}/route` },
  { method: 'PUT', path: (id) => `/api/designs/${id}/route`, body: { kind: 'planned', designVersion: 1 } },
  { method: 'GET', path: (id) => `/api/designs/${id}/export.svg` },
];

function send(client: TestClient, call: Call, id: string) {
  return client.request(call.method, call.path(id), call.body === undefined ? {} : { body: call.body });
}

let owner: TestAccount;
let other: TestAccount;
let designId: string;
beforeAll(async () => {
  owner = await createAccount({ displayName: 'Owner' });
  other = await createAccount({ displayName: 'Neighbour' });
  const res = await owner.client.post('/api/designs', { title: 'Mine alone', design: block() });
  designId = res.body.design.id;
});
afterAll(closeTestDb);

describe('another account', () => {
  for (const call of designCalls) {
    it(`gets 404 for ${call.method} ${call.path(':id')}`, async () => {
      const res = await send(other.client, call, designId);
      expect(res.status, res.text).toBe(404);
      expect(res.body?.error?.code).toBe('not_found');
    });
  }

  it('gets 404 for ids that are not uuids, and does not see the design in its list', async () => {
    expect((await other.client.get('/api/designs/not-a-uuid')).status).toBe(404);
    const list = await other.client.get('/api/designs');
    expect(list.body.designs.map((d: { id: string }) => d.id)).not.toContain(designId);
  });

  it('changed nothing: the owner still has version 1, live, with no route', async () => {
    const res = await owner.client.get(`/api/designs/${designId}`);
    expect(res.body.design).toMatchObject({ version: 1, title: 'Mine alone' });
    expect((await owner.client.get(`/api/designs/${designId}/route`)).body.route).toBeNull();
  });
});

describe('the owner', () => {
  // The same table, so it is known that each call succeeds when it is yours (the 404s above are about ownership).
  for (const call of designCalls.filter((c) => c.method === 'GET')) {
    it(`gets an answer for ${call.method} ${call.path(':id')}`, async () => {
      expect((await send(owner.client, call, designId)).status).toBe(200);
    });
  }
});

describe('an anonymous visitor', () => {
  const anonymous = new TestClient();
  const all: Call[] = [
    { method: 'GET', path: () => '/api/designs' },
    { method: 'POST', path: () => '/api/designs', body: { title: 'x', design: block() } },
    ...designCalls,
  ];
  for (const call of all) {
    it(`gets 401 for ${call.method} ${call.path(':id')}`, async () => {
      const res = await send(anonymous, call, designId);
      expect(res.status).toBe(401);
      expect(res.body.error.code).toBe('unauthenticated');
    });
  }
});
