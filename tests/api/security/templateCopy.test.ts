// Issue 10, defect 0: a teacher keeps their own stitching order as a design's route and publishes it; a quilter
// copies the template. The copy must open, and the quilter's designs list must keep working. Before the fix the
// copy wrote the own order's figures (no lower bound, `optimal: null`) as the design's planner summary, and both
// GET /api/designs and GET /api/designs/:id answered 500 for the quilter.
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { up as repairCopiedSummaries } from '@db/migrations/2026_12_04_0900_repair_copied_design_summaries.ts';
import { createAccount, type TestAccount } from '../../helpers/accounts.ts';
import { closeTestDb, testDb } from '../../helpers/db.ts';
import { waitForFigures } from '../../helpers/designFigures.ts';
import { block } from '../designFixtures.ts';

let teacher: TestAccount;
let quilter: TestAccount;
let templateId: string;

// block(): a 12 in block, seam x = 6, quilting lines y = 3 and y = 9, edge travel on. The teacher's own order runs
// along y = 3, down the right edge (6 in of edge travel inside the binding band) and back along y = 9: one pass.
const ownOrder = [[[0, 3], [12, 3]], [[12, 3], [12, 9]], [[12, 9], [0, 9]]];

beforeAll(async () => {
  teacher = await createAccount({ role: 'teacher', displayName: 'Ada Quillfeather' });
  quilter = await createAccount({ displayName: 'Bram Tackett' });
  const design = await teacher.client.post('/api/designs', { title: 'Two rows, my order', design: block() });
  expect(design.status, design.text).toBe(201);
  const own = await teacher.client.put(`/api/designs/${design.body.design.id}/route`, { kind: 'own', designVersion: 1, route: ownOrder });
  expect(own.status, own.text).toBe(200);
  expect(own.body.route.summary.optimal).toBeNull();
  const published = await teacher.client.post('/api/templates', {
    designId: design.body.design.id,
    title: 'Two rows in my own order',
    difficulty: 'beginner',
    visibility: 'public',
  });
  expect(published.status, published.text).toBe(201);
  templateId = published.body.template.id;
});
afterAll(closeTestDb);

describe('copying a template whose route is the teacher’s own order', () => {
  it('gives a copy that opens, keeps the own order as an own route, and leaves the designs list working', async () => {
    const copy = await quilter.client.post(`/api/templates/${templateId}/copy`, {});
    expect(copy.status, copy.text).toBe(201);
    const opened = await quilter.client.get(`/api/designs/${copy.body.designId}`);
    expect(opened.status, opened.text).toBe(200);
    // Saves (copies too) never wait for the planner: the figures follow from the engine a moment later.
    const one = { body: { design: await waitForFigures(quilter.client, copy.body.designId) } };
    // The designs table holds the planner's figures for the drawing, not the own order's: for these two lines the
    // least travel is 6 in (the 4 odd points pair up 6 in apart along the right or left edge; the same analytic
    // figure as in tests/api/designsEngine.test.ts), proven least.
    expect(one.body.design.summary).toMatchObject({ passes: 1, stops: 0, optimal: true });
    expect(one.body.design.summary.travelLength).toBeCloseTo(6, 9);
    expect(one.body.design.summary.travelLowerBound).toBeCloseTo(6, 9);

    const list = await quilter.client.get('/api/designs');
    expect(list.status, list.text).toBe(200);
    expect(list.body.designs.map((d: { id: string }) => d.id)).toContain(copy.body.designId);

    const route = await quilter.client.get(`/api/designs/${copy.body.designId}/route`);
    expect(route.status, route.text).toBe(200);
    expect(route.body.route).toMatchObject({ kind: 'own', current: true, summary: { passes: 1, stops: 0, optimal: null } });
    expect(route.body.route.summary.edgeLength).toBeCloseTo(6, 9);
  });

  it('reads a summary that fails its schema as "no figures" instead of failing the whole list', async () => {
    const good = await quilter.client.post('/api/designs', { title: 'A good neighbour', design: block() });
    const bad = await quilter.client.post('/api/designs', { title: 'Broken figures', design: block() });
    // Let the engine write both designs' figures first, so nothing overwrites the broken row afterwards.
    await waitForFigures(quilter.client, good.body.design.id);
    await waitForFigures(quilter.client, bad.body.design.id);
    await testDb().updateTable('design').set({ summary: JSON.stringify({ passes: 'many', optimal: null }) }).where('id', '=', bad.body.design.id).execute();
    const list = await quilter.client.get('/api/designs');
    expect(list.status, list.text).toBe(200);
    const byId = new Map(list.body.designs.map((d: { id: string; summary: unknown }) => [d.id, d.summary]));
    expect(byId.get(bad.body.design.id)).toBeNull();
    expect(byId.get(good.body.design.id)).toMatchObject({ passes: 1 });
    const one = await quilter.client.get(`/api/designs/${bad.body.design.id}`);
    expect(one.status).toBe(200);
    expect(one.body.design.summary).toBeNull();
  });
});

describe('migration 2026_12_04_0900: rows written by the old copy', () => {
  it('clears the bad summary and marks the copied own order as an own route; good rows stay as they were', async () => {
    const db = testDb();
    const owner = await createAccount();
    // What the old copy wrote: the own order's figures as design.summary, and the route stored as 'planned'.
    const ownFigures = {
      passes: 1, stops: 0, pieces: 1, oddPoints: 4, stitchLength: 24, travelLength: 6, retraceLength: 0, ditchLength: 0, edgeLength: 6,
      units: 'in', optimal: null, thread: { totalYards: 1, topYards: 0.5, bobbinYards: 0.5, bobbins: 0.01, stitches: 300, minutes: 2 },
    };
    const broken = await owner.client.post('/api/designs', { title: 'Old copy', design: block() });
    const brokenId = broken.body.design.id as string;
    await waitForFigures(owner.client, brokenId);
    await db.updateTable('design').set({ summary: JSON.stringify(ownFigures) }).where('id', '=', brokenId).execute();
    await db
      .insertInto('design_route')
      .values({ design_id: brokenId, kind: 'planned', strokes: JSON.stringify([{ pass: 1, kind: 'stitch', points: [[0, 3], [12, 3]], length: 12 }]), summary: JSON.stringify(ownFigures), design_version: 1 })
      .execute();
    const fine = await owner.client.post('/api/designs', { title: 'Saved normally', design: block() });
    const fineSummary = (await waitForFigures(owner.client, fine.body.design.id)).summary;
    expect(fineSummary).toMatchObject({ optimal: true });

    await repairCopiedSummaries(db);

    const rows = await db.selectFrom('design').select(['id', 'summary']).where('id', 'in', [brokenId, fine.body.design.id]).execute();
    expect(rows.find((r) => r.id === brokenId)?.summary).toBeNull();
    expect(rows.find((r) => r.id === fine.body.design.id)?.summary).toEqual(fineSummary);
    const route = await db.selectFrom('design_route').select('kind').where('design_id', '=', brokenId).executeTakeFirstOrThrow();
    expect(route.kind).toBe('own');
    expect((await owner.client.get('/api/designs')).status).toBe(200);
  });
});
