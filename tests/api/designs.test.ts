// /api/designs against the real server and database: create/read/update, list, version conflicts,
// delete/restore, history, size caps and malformed geometry.
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createAccount, type TestAccount } from '../helpers/accounts.ts';
import { closeTestDb } from '../helpers/db.ts';
import { waitForFigures, waitForListFigures } from '../helpers/designFigures.ts';
import { block } from './designFixtures.ts';

let ann: TestAccount;
beforeAll(async () => {
  ann = await createAccount({ displayName: 'Ann of the River Guild' });
});
afterAll(closeTestDb);

async function create(account: TestAccount, title: string, design = block()) {
  const res = await account.client.post('/api/designs', { title, design });
  expect(res.status, res.text).toBe(201);
  return res.body.design;
}

describe('create, read, update', () => {
  it('creates a design (version 1, schema defaults applied, figures from the planner after the save) and reads it back', async () => {
    const created = await create(ann, '  Nine-patch sampler  ');
    expect(created).toMatchObject({ title: 'Nine-patch sampler', notes: '', version: 1 });
    expect(created.design).toEqual({ ...block(), edgeTravel: true });
    // The save does not wait for the planner: no figures yet.
    expect(created).toMatchObject({ summary: null, summaryPending: true });
    const read = await waitForFigures(ann.client, created.id);
    // Two straight lines joined by the seam and the block edge: one pass (common sense; the planner's own tests
    // check optimality against worked examples).
    expect(read.summary).toMatchObject({ passes: 1, stops: 0, pieces: 2, units: 'in' });
    expect(read.summary.stitchLength).toBeCloseTo(24, 9);
    expect(read).toEqual({ ...created, summary: read.summary, summaryPending: false });
  });

  it('updates title, notes and design; every save bumps the version', async () => {
    const d = await create(ann, 'Star block');
    const r1 = await ann.client.put(`/api/designs/${d.id}`, { baseVersion: 1, title: 'Star block, take 2' });
    expect(r1.status, r1.text).toBe(200);
    expect(r1.body.design).toMatchObject({ version: 2, title: 'Star block, take 2', design: d.design });
    const moved = block({ lines: [[[0, 4], [12, 4]]] });
    const r2 = await ann.client.put(`/api/designs/${d.id}`, { baseVersion: 2, notes: 'walking foot', design: moved });
    expect(r2.status, r2.text).toBe(200);
    expect(r2.body.design).toMatchObject({ version: 3, notes: 'walking foot', design: { ...moved, edgeTravel: true } });
    expect((await waitForFigures(ann.client, d.id)).summary.stitchLength).toBeCloseTo(12, 9);
  });

  it('refuses an update with nothing to save, or with unknown fields', async () => {
    const d = await create(ann, 'Empty update');
    expect((await ann.client.put(`/api/designs/${d.id}`, { baseVersion: 1 })).status).toBe(400);
    const extra = await ann.client.put(`/api/designs/${d.id}`, { baseVersion: 1, title: 'x', owner: 'me' });
    expect(extra.status).toBe(400);
    expect(extra.body.error.fields).toHaveProperty('owner');
  });

  it('saves a design the planner cannot use (no quilting lines yet) with no figures', async () => {
    const d = await create(ann, 'Blank start', block({ lines: [] }));
    expect(await waitForFigures(ann.client, d.id)).toMatchObject({ summary: null, summaryPending: false });
  });
});

describe('version conflicts', () => {
  it('a stale save gets 409 with the current design; neither copy is lost', async () => {
    const d = await create(ann, 'Shared between two tabs');
    const tabA = block({ lines: [[[0, 2], [12, 2]]] });
    const tabB = block({ lines: [[[0, 10], [12, 10]]] });
    const a = await ann.client.put(`/api/designs/${d.id}`, { baseVersion: 1, design: tabA });
    expect(a.status).toBe(200);
    const b = await ann.client.put(`/api/designs/${d.id}`, { baseVersion: 1, design: tabB });
    expect(b.status).toBe(409);
    expect(b.body.error.code).toBe('conflict');
    expect(b.body.design).toMatchObject({ version: 2, design: { ...tabA, edgeTravel: true } });
    // Tab B merges (here: keeps its own lines) on top of version 2; both copies stay in the history.
    const merged = await ann.client.put(`/api/designs/${d.id}`, { baseVersion: 2, design: tabB });
    expect(merged.body.design.version).toBe(3);
    const v2 = await ann.client.get(`/api/designs/${d.id}/versions/2`);
    const v3 = await ann.client.get(`/api/designs/${d.id}/versions/3`);
    expect(v2.body.version.design.lines).toEqual(tabA.lines);
    expect(v3.body.version.design.lines).toEqual(tabB.lines);
  });

  it('of two saves racing on the same base version exactly one wins', async () => {
    const d = await create(ann, 'Race');
    const results = await Promise.all(
      [2, 4, 6, 8].map((y) => ann.client.put(`/api/designs/${d.id}`, { baseVersion: 1, design: block({ lines: [[[0, y], [12, y]]] }) })),
    );
    expect(results.map((r) => r.status).sort()).toEqual([200, 409, 409, 409]);
    const winner = results.find((r) => r.status === 200)!.body.design;
    const now = await ann.client.get(`/api/designs/${d.id}`);
    expect(now.body.design).toMatchObject({ version: 2, design: winner.design });
    const versions = await ann.client.get(`/api/designs/${d.id}/versions`);
    expect(versions.body.versions.map((v: { version: number }) => v.version)).toEqual([2, 1]);
  });
});

describe('history', () => {
  it('lists versions newest first and restores an old one as a new version', async () => {
    const d = await create(ann, 'Versions');
    await ann.client.put(`/api/designs/${d.id}`, { baseVersion: 1, title: 'Versions b', design: block({ lines: [[[1, 1], [11, 11]]] }) });
    await ann.client.put(`/api/designs/${d.id}`, { baseVersion: 2, title: 'Versions c' });
    const list = await ann.client.get(`/api/designs/${d.id}/versions`);
    expect(list.status).toBe(200);
    expect(list.body.current).toBe(3);
    expect(list.body.versions.map((v: any) => [v.version, v.title, v.lines, v.seams])).toEqual([
      [3, 'Versions c', 1, 1],
      [2, 'Versions b', 1, 1],
      [1, 'Versions', 2, 1],
    ]);
    const stale = await ann.client.post(`/api/designs/${d.id}/versions/1/restore`, { baseVersion: 2 });
    expect(stale.status).toBe(409);
    const back = await ann.client.post(`/api/designs/${d.id}/versions/1/restore`, { baseVersion: 3 });
    expect(back.status, back.text).toBe(200);
    expect(back.body.design).toMatchObject({ version: 4, title: 'Versions', design: d.design });
    expect((await ann.client.get(`/api/designs/${d.id}/versions/9`)).status).toBe(404);
    expect((await ann.client.get(`/api/designs/${d.id}/versions/abc`)).status).toBe(404);
  });
});

describe('duplicate, delete and restore', () => {
  it('duplicates as a new design at version 1', async () => {
    const d = await create(ann, 'Original');
    const copy = await ann.client.post(`/api/designs/${d.id}/duplicate`);
    expect(copy.status).toBe(201);
    expect(copy.body.design).toMatchObject({ title: 'Copy of Original', version: 1, design: d.design });
    expect(copy.body.design.id).not.toBe(d.id);
  });

  it('deletes softly (gone from read and list) and restores (undo)', async () => {
    const d = await create(ann, 'Delete me softly');
    const del = await ann.client.delete(`/api/designs/${d.id}`);
    expect(del.status).toBe(200);
    expect(del.body.design.id).toBe(d.id);
    expect((await ann.client.get(`/api/designs/${d.id}`)).status).toBe(404);
    expect((await ann.client.delete(`/api/designs/${d.id}`)).status).toBe(404);
    const listed = await ann.client.get(`/api/designs?q=${encodeURIComponent('Delete me softly')}`);
    expect(listed.body.total).toBe(0);
    const back = await ann.client.post(`/api/designs/${d.id}/restore`);
    expect(back.status).toBe(200);
    expect(back.body.design).toMatchObject({ id: d.id, version: 1, title: 'Delete me softly' });
    expect((await ann.client.get(`/api/designs/${d.id}`)).status).toBe(200);
  });
});

describe('the designs list', () => {
  let lists: TestAccount;
  beforeAll(async () => {
    lists = await createAccount();
    // Two separate quilting lines with no travel between them (no seams, edge travel off): 2 passes, 1 stop.
    const twoPieces = block({ seams: [], edgeTravel: false, lines: [[[1, 3], [11, 3]], [[1, 9], [11, 9]]] });
    await create(lists, 'Gamma', block());
    await create(lists, 'alpha 100%', twoPieces);
    await create(lists, 'Beta_1', block({ units: 'cm', width: 30, height: 30, seams: [], lines: [[[0, 15], [30, 15]]] }));
    await waitForListFigures(lists.client);
  });

  it('sorts by title (case-insensitive), filters by title with % and _ taken literally, and pages', async () => {
    const byTitle = await lists.client.get('/api/designs?sort=title');
    expect(byTitle.status).toBe(200);
    expect(byTitle.body.designs.map((d: any) => d.title)).toEqual(['alpha 100%', 'Beta_1', 'Gamma']);
    expect(byTitle.body).toMatchObject({ total: 3, page: 1, pageSize: 25, sort: 'title', dir: 'asc' });
    const percent = await lists.client.get('/api/designs?q=%25');
    expect(percent.body.designs.map((d: any) => d.title)).toEqual(['alpha 100%']);
    const underscore = await lists.client.get('/api/designs?q=a_');
    expect(underscore.body.designs.map((d: any) => d.title)).toEqual(['Beta_1']);
    const page2 = await lists.client.get('/api/designs?sort=title&dir=desc&pageSize=2&page=2');
    expect(page2.body.designs.map((d: any) => d.title)).toEqual(['alpha 100%']);
    expect(page2.body.total).toBe(3);
  });

  it('gives each row size, figures and a thumbnail, and sorts by figures', async () => {
    const byStops = await lists.client.get('/api/designs?sort=stops&dir=desc');
    const first = byStops.body.designs[0];
    expect(first).toMatchObject({ title: 'alpha 100%', units: 'in', width: 12, height: 12, summary: { passes: 2, stops: 1 } });
    expect(first.thumbnailSvg).toMatch(/^<svg /);
    expect(first).not.toHaveProperty('design');
    // Only Gamma travels (along its seam and the edge between its two lines); the others have none.
    const byTravel = await lists.client.get('/api/designs?sort=travel');
    expect(byTravel.body.designs.map((d: any) => d.title)[2]).toBe('Gamma');
    const byTravelDesc = await lists.client.get('/api/designs?sort=travel&dir=desc');
    expect(byTravelDesc.body.designs[0].title).toBe('Gamma');
    const byUpdated = await lists.client.get('/api/designs');
    expect(byUpdated.body.designs.map((d: any) => d.title)).toEqual(['Beta_1', 'alpha 100%', 'Gamma']);
  });

  it('refuses bad list parameters with 400 naming them', async () => {
    const bad = await lists.client.get('/api/designs?sort=colour&pageSize=1000');
    expect(bad.status).toBe(400);
    expect(Object.keys(bad.body.error.fields).sort()).toEqual(['pageSize', 'sort']);
  });
});

describe('size caps and malformed geometry', () => {
  it('answers 413 for a body over 5 MiB', async () => {
    const huge = `{"title":"big","design":${JSON.stringify(block())},"notes":"${'x'.repeat(5 * 1024 * 1024)}"}`;
    const res = await ann.client.post('/api/designs', huge);
    expect(res.status).toBe(413);
    expect(res.body.error.code).toBe('payload_too_large');
  });

  it('answers 400 naming the cap for a design over DESIGN_LIMITS (200,000 points; 20,000 lines; 120 in a side)', async () => {
    const zigzag = Array.from({ length: 200_001 }, (_, i) => (i % 2 ? [1, 1] : [2, 2]));
    const points = await ann.client.post('/api/designs', { title: 'too many points', design: block({ seams: [], lines: [zigzag] }) });
    expect(points.status).toBe(400);
    expect(points.body.error.fields.design).toMatch(/200,001 points; a design may have at most 200,000/);
    const manyLines = Array.from({ length: 20_001 }, () => [[1, 1], [2, 2]]);
    const lines = await ann.client.post('/api/designs', { title: 'too many lines', design: block({ lines: manyLines }) });
    expect(lines.status).toBe(400);
    expect(lines.body.error.fields['design.lines']).toMatch(/at most 20,000/);
    const wide = await ann.client.post('/api/designs', { title: 'wide', design: block({ width: 130 }) });
    expect(wide.status).toBe(400);
    expect(wide.body.error.fields['design.width']).toMatch(/at most 120 in/);
  });

  // JSON has no NaN or Infinity: JSON.stringify turns them into null, and a client may send them as strings;
  // a literal 1e400 parses to Infinity. Each must be refused at its exact path.
  const malformed: [string, string, string, RegExp][] = [
    ['NaN (arrives as null)', JSON.stringify(block({ lines: [[[0, 3], [NaN, 3]]] })), 'design.lines.0.1.0', /number/],
    ['"Infinity" as a string', JSON.stringify(block({ lines: [[[0, 3], ['Infinity', 3]]] })), 'design.lines.0.1.0', /number/],
    ['1e400 (parses to Infinity)', JSON.stringify(block()).replace('[[0,3],[12,3]]', '[[0,3],[1e400,3]]'), 'design.lines.0.1.0', /./],
    ['a point far outside the block', JSON.stringify(block({ lines: [[[0, 3], [500, 3]]] })), 'design.lines.0.1', /far outside/],
    ['a 1-point line', JSON.stringify(block({ lines: [[[3, 3]]] })), 'design.lines.0', /at least 2 points/],
    ['a line of one repeated point', JSON.stringify(block({ seams: [[[3, 3], [3, 3]]] })), 'design.seams.0', /two different points/],
  ];
  for (const [name, designJson, path, message] of malformed) {
    it(`answers 400 for ${name}, naming ${path}`, async () => {
      const res = await ann.client.post('/api/designs', `{"title":"bad","design":${designJson}}`);
      expect(res.status, res.text).toBe(400);
      expect(res.body.error.code).toBe('invalid_input');
      expect(res.body.error.fields[path]).toMatch(message);
    });
  }

  it('refuses the same malformed geometry in an update and a draft check, and keeps the saved design', async () => {
    const d = await create(ann, 'Keep me');
    const bad = block({ lines: [[[0, 3], [null, 3]]] });
    const put = await ann.client.put(`/api/designs/${d.id}`, { baseVersion: 1, design: bad });
    expect(put.status).toBe(400);
    expect(put.body.error.fields).toHaveProperty(['design.lines.0.1.0']);
    const check = await ann.client.post(`/api/designs/${d.id}/check`, { design: bad });
    expect(check.status).toBe(400);
    expect((await ann.client.get(`/api/designs/${d.id}`)).body.design.version).toBe(1);
  });
});
