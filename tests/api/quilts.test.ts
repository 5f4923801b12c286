// /api/quilts: create, read, list, save with baseVersion (409 with the current copy on a stale save), delete;
// owner isolation (another account gets 404 for every call, an anonymous visitor 401); 400 naming the field for a
// bad map and naming the placement for a design that is not the owner's own live design.
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createAccount, type TestAccount } from '../helpers/accounts.ts';
import { closeTestDb } from '../helpers/db.ts';
import { TestClient } from '../helpers/client.ts';
import { block } from './designFixtures.ts';

type Placement = { designId: string; rotation?: number; mirror?: boolean } | null;

function quilt(placements: Placement[][], over: Record<string, unknown> = {}): Record<string, unknown> {
  return { version: 1, units: 'in', rows: placements.length, columns: placements[0]!.length, block: { width: 12, height: 12 }, placements, sashing: 2, borders: [3], ...over };
}

let owner: TestAccount;
let other: TestAccount;
let d1: string;
let d2: string;
let otherDesign: string;
let quiltId: string;

beforeAll(async () => {
  owner = await createAccount({ displayName: 'Quilt owner' });
  other = await createAccount({ displayName: 'Quilt neighbour' });
  d1 = (await owner.client.post('/api/designs', { title: 'Block one', design: block() })).body.design.id;
  d2 = (await owner.client.post('/api/designs', { title: 'Block two', design: block() })).body.design.id;
  otherDesign = (await other.client.post('/api/designs', { title: 'Not yours', design: block() })).body.design.id;
  const res = await owner.client.post('/api/quilts', { title: 'Sampler', quilt: quilt([[{ designId: d1 }, null], [null, { designId: d2, rotation: 90 }]]) });
  expect(res.status, res.text).toBe(201);
  quiltId = res.body.quilt.id;
});
afterAll(closeTestDb);

describe('the owner', () => {
  it('reads the quilt back with the schema defaults applied', async () => {
    const res = await owner.client.get(`/api/quilts/${quiltId}`);
    expect(res.status).toBe(200);
    expect(res.body.quilt).toMatchObject({ id: quiltId, title: 'Sampler', version: 1 });
    expect(res.body.quilt.quilt.placements[1][1]).toEqual({ designId: d2, rotation: 90, mirror: false });
    expect(res.body.quilt.quilt.placements[0][0]).toEqual({ designId: d1, rotation: 0, mirror: false });
    expect(res.body.quilt.quilt.order).toEqual({ kind: 'rows' });
  });

  it('sees it in the list with its size and filled cells', async () => {
    const res = await owner.client.get('/api/quilts');
    expect(res.status).toBe(200);
    expect(res.body.quilts).toContainEqual(expect.objectContaining({ id: quiltId, rows: 2, columns: 2, placed: 2, units: 'in' }));
  });

  it('saves over the current version, then a save on the old version gets 409 with the current copy', async () => {
    const next = quilt([[{ designId: d1, rotation: 270, mirror: true }, { designId: d1 }], [null, { designId: d2 }]]);
    const saved = await owner.client.put(`/api/quilts/${quiltId}`, { baseVersion: 1, quilt: next });
    expect(saved.status, saved.text).toBe(200);
    expect(saved.body.quilt.version).toBe(2);
    expect(saved.body.quilt.quilt.placements[0][0]).toEqual({ designId: d1, rotation: 270, mirror: true });

    const stale = await owner.client.put(`/api/quilts/${quiltId}`, { baseVersion: 1, title: 'Lost update' });
    expect(stale.status).toBe(409);
    expect(stale.body.error.code).toBe('conflict');
    expect(stale.body.quilt).toMatchObject({ id: quiltId, version: 2, title: 'Sampler' });
    expect(stale.body.quilt.quilt.placements[0][1]).toEqual({ designId: d1, rotation: 0, mirror: false });
    expect((await owner.client.get(`/api/quilts/${quiltId}`)).body.quilt.title).toBe('Sampler');
  });

  it('gets 400 naming the field for a bad map, a missing baseVersion or a turn that is not a quarter turn', async () => {
    const wrongRows = await owner.client.post('/api/quilts', { title: 'Bad', quilt: quilt([[null, null]], { rows: 2 }) });
    expect(wrongRows.status).toBe(400);
    expect(wrongRows.body.error.code).toBe('invalid_input');
    expect(Object.keys(wrongRows.body.error.fields)).toContain('quilt.placements');

    const noBase = await owner.client.put(`/api/quilts/${quiltId}`, { title: 'No base' });
    expect(noBase.status).toBe(400);
    expect(Object.keys(noBase.body.error.fields)).toContain('baseVersion');

    const turn = await owner.client.put(`/api/quilts/${quiltId}`, { baseVersion: 2, quilt: quilt([[{ designId: d1, rotation: 45 }]]) });
    expect(turn.status).toBe(400);
    expect(Object.keys(turn.body.error.fields)).toContain('quilt.placements.0.0.rotation');

    const noTitle = await owner.client.post('/api/quilts', { title: '  ', quilt: quilt([[null]]) });
    expect(noTitle.status).toBe(400);
    expect(noTitle.body.error.fields.title).toBe('Give the quilt a title.');
  });

  it("gets 400 naming the placement for someone else's design, a deleted design or an unknown id", async () => {
    const theirs = await owner.client.post('/api/quilts', { title: 'Borrowed', quilt: quilt([[{ designId: d1 }, { designId: otherDesign }]]) });
    expect(theirs.status).toBe(400);
    expect(Object.keys(theirs.body.error.fields)).toEqual(['quilt.placements.0.1.designId']);

    const gone = (await owner.client.post('/api/designs', { title: 'Soon gone', design: block() })).body.design.id;
    expect((await owner.client.delete(`/api/designs/${gone}`)).status).toBe(200);
    const deleted = await owner.client.put(`/api/quilts/${quiltId}`, { baseVersion: 2, quilt: quilt([[{ designId: gone }], [{ designId: 'not-a-uuid' }]]) });
    expect(deleted.status).toBe(400);
    expect(Object.keys(deleted.body.error.fields).sort()).toEqual(['quilt.placements.0.0.designId', 'quilt.placements.1.0.designId']);
    expect((await owner.client.get(`/api/quilts/${quiltId}`)).body.quilt.version).toBe(2);
  });
});

describe('another account', () => {
  it('gets 404 for GET, PUT and DELETE and does not see the quilt in its list', async () => {
    expect((await other.client.get(`/api/quilts/${quiltId}`)).status).toBe(404);
    const put = await other.client.put(`/api/quilts/${quiltId}`, { baseVersion: 2, title: 'Taken over' });
    expect(put.status).toBe(404);
    expect(put.body.error.code).toBe('not_found');
    expect((await other.client.delete(`/api/quilts/${quiltId}`)).status).toBe(404);
    expect((await other.client.get('/api/quilts')).body.quilts.map((q: { id: string }) => q.id)).not.toContain(quiltId);
    expect((await other.client.get('/api/quilts/not-a-uuid')).status).toBe(404);
  });

  it('changed nothing', async () => {
    expect((await owner.client.get(`/api/quilts/${quiltId}`)).body.quilt).toMatchObject({ version: 2, title: 'Sampler' });
  });
});

describe('an anonymous visitor', () => {
  const anonymous = new TestClient();
  it('gets 401 everywhere', async () => {
    for (const [method, path] of [['GET', '/api/quilts'], ['POST', '/api/quilts'], ['GET', `/api/quilts/${quiltId}`], ['PUT', `/api/quilts/${quiltId}`], ['DELETE', `/api/quilts/${quiltId}`]] as const) {
      const res = await anonymous.request(method, path, method === 'POST' || method === 'PUT' ? { body: { baseVersion: 1, title: 'x' } } : {});
      expect(res.status, `${method} ${path}`).toBe(401);
    }
  });
});

describe('deleting', () => {
  it('takes the quilt out of reads and the list; a second delete is 404', async () => {
    const res = await owner.client.post('/api/quilts', { title: 'Short-lived', quilt: quilt([[null]]) });
    const id = res.body.quilt.id;
    const del = await owner.client.delete(`/api/quilts/${id}`);
    expect(del.status).toBe(200);
    expect(del.body.quilt.id).toBe(id);
    expect((await owner.client.get(`/api/quilts/${id}`)).status).toBe(404);
    expect((await owner.client.put(`/api/quilts/${id}`, { baseVersion: 1, title: 'Back?' })).status).toBe(404);
    expect((await owner.client.delete(`/api/quilts/${id}`)).status).toBe(404);
    expect((await owner.client.get('/api/quilts')).body.quilts.map((q: { id: string }) => q.id)).not.toContain(id);
  });
});
