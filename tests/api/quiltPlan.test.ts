// POST /api/quilts/:id/plan and GET /api/quilts/:id/plan-jobs/:jobId: the chained route of a quilt, planned by the
// planning worker process npm test starts (job queue in PostgreSQL), then answered at once from the stored corner costs.
// Analytic checks (no source needed beyond arithmetic): a block whose only quilting line is its 12 in square outline
// is one closed loop, so entering and leaving at the same corner sews it with no travel; two such blocks side by side
// share a corner, so the whole 1 × 2 quilt is one pass with no travel and 2 × 48 = 96 in stitched. With 2 in sashing
// the nearest corners of the two blocks are 2 in apart, so the least travel is exactly that 2 in link.
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createAccount, type TestAccount } from '../helpers/accounts.ts';
import { closeTestDb, testDb } from '../helpers/db.ts';
import { block } from './designFixtures.ts';
import { inputsKey } from '../../src/server/jobs/planInputs.ts';
import { quiltPlanAnswerSchema, quiltPlanJobAnswerSchema, quiltPlanQueuedSchema, type QuiltPlanJobAnswer } from '../../shared/contract/quiltPlan.ts';

const outline = () => block({ seams: [], lines: [[[0, 0], [12, 0], [12, 12], [0, 12], [0, 0]]], edgeTravel: false });

let owner: TestAccount;
let other: TestAccount;
let designId: string;
beforeAll(async () => {
  owner = await createAccount({ displayName: 'Quilt planner' });
  other = await createAccount({ displayName: 'Plan neighbour' });
  const d = await owner.client.post('/api/designs', { title: 'Square outline', design: outline() });
  expect(d.status, d.text).toBe(201);
  designId = d.body.design.id;
});
afterAll(closeTestDb);

async function quiltOf(sashing: number, cells: ({ designId: string; rotation?: number; mirror?: boolean } | string | null)[]): Promise<string> {
  const res = await owner.client.post('/api/quilts', {
    title: `Outline row, sashing ${sashing}`,
    quilt: { version: 1, units: 'in', rows: 1, columns: cells.length, block: { width: 12, height: 12 }, sashing, placements: [cells.map((c) => (typeof c === 'string' ? { designId: c } : c))] },
  });
  expect(res.status, res.text).toBe(201);
  return res.body.quilt.id;
}

/** Polls the job until it ends (every 200 ms, at most 60 s); every answer seen, in order. */
async function pollJob(quiltId: string, jobId: string): Promise<QuiltPlanJobAnswer[]> {
  const seen: QuiltPlanJobAnswer[] = [];
  for (let i = 0; i < 300; i++) {
    const res = await owner.client.get(`/api/quilts/${quiltId}/plan-jobs/${jobId}`);
    expect(res.status, res.text).toBe(200);
    const answer = quiltPlanJobAnswerSchema.parse(res.body);
    seen.push(answer);
    if (answer.job.state === 'done' || answer.job.state === 'failed') return seen;
    await new Promise((r) => setTimeout(r, 200));
  }
  throw new Error(`job ${jobId} did not end within 60 s`);
}

describe('planning a quilt through the job queue', () => {
  it('cold: 202 with a job, progress to done, the plan (one pass, no travel, 96 in, proven); then 200 at once from the cache', async () => {
    const id = await quiltOf(0, [designId, designId]);
    const first = await owner.client.post(`/api/quilts/${id}/plan`);
    expect(first.status, first.text).toBe(202);
    const { job, quiltVersion } = quiltPlanQueuedSchema.parse(first.body);
    expect(quiltVersion).toBe(1);
    expect(first.headers.get('location')).toBe(`/api/quilts/${id}/plan-jobs/${job.id}`);
    const seen = await pollJob(id, job.id);
    const end = seen.at(-1)!;
    expect(end.job.state, JSON.stringify(end.job.failure)).toBe('done');
    // One design: its 10 corner pairs (the other 6 are the same routes sewn backwards), plus any the chain proves.
    expect(end.job.total).toBeGreaterThanOrEqual(10);
    expect(end.job.done).toBe(end.job.total);
    expect(seen.every((a) => a.job.done <= a.job.total)).toBe(true);
    const plan = end.plan!;
    expect(plan.steps.map((s) => s.cell)).toEqual([{ row: 0, column: 0 }, { row: 0, column: 1 }]);
    expect(plan.totalTravel).toBeCloseTo(0, 9);
    expect(plan.stitchLength).toBeCloseTo(96, 9);
    expect(plan.passes).toBe(1);
    expect(plan.stops).toBe(0);
    expect(plan.proven).toBe(true);
    // The first block's exit is the corner it shares with the second block's entry: its top or bottom right.
    expect([1, 2]).toContain(plan.steps[0]!.exit);

    const again = await owner.client.post(`/api/quilts/${id}/plan`);
    expect(again.status, again.text).toBe(200);
    expect(quiltPlanAnswerSchema.parse(again.body).plan).toEqual(plan);
  });

  it('the same design turned and mirrored in another quilt plans at once: its stored table serves every orientation', async () => {
    // Relies on the first test having stored the design's table.
    const id = await quiltOf(2, [{ designId, rotation: 90, mirror: true }, { designId, rotation: 270 }]);
    const res = await owner.client.post(`/api/quilts/${id}/plan`);
    expect(res.status, res.text).toBe(200);
    const { plan } = quiltPlanAnswerSchema.parse(res.body);
    expect(plan.linkTravel).toBeCloseTo(2, 9);
    expect(plan.blockTravel).toBeCloseTo(0, 9);
    expect(plan.totalTravel).toBeCloseTo(2, 9);
    expect(plan.passes).toBe(1);
  });

  it('a saved design is planned again: its new version has no stored table yet', async () => {
    const fresh = (await owner.client.post('/api/designs', { title: 'Outline to edit', design: outline() })).body.design.id as string;
    const id = await quiltOf(0, [fresh]);
    const first = await owner.client.post(`/api/quilts/${id}/plan`);
    expect(first.status).toBe(202);
    expect((await pollJob(id, quiltPlanQueuedSchema.parse(first.body).job.id)).at(-1)!.job.state).toBe('done');
    expect((await owner.client.post(`/api/quilts/${id}/plan`)).status).toBe(200);
    expect((await owner.client.put(`/api/designs/${fresh}`, { baseVersion: 1, notes: 'second version' })).status).toBe(200);
    expect((await owner.client.post(`/api/quilts/${id}/plan`)).status).toBe(202);
  });

  it('a design the planner refuses ends the job failed, naming its cell', async () => {
    const empty = (await owner.client.post('/api/designs', { title: 'Nothing drawn yet', design: block({ seams: [], lines: [] }) }));
    expect(empty.status, empty.text).toBe(201);
    const id = await quiltOf(0, [designId, empty.body.design.id]);
    const res = await owner.client.post(`/api/quilts/${id}/plan`);
    expect(res.status, res.text).toBe(202);
    const end = (await pollJob(id, res.body.job.id)).at(-1)!;
    expect(end.job.state).toBe('failed');
    expect(end.plan).toBeNull();
    expect(end.job.failure?.code).toBe('invalid_input');
    expect(Object.keys(end.job.failure?.fields ?? {})).toEqual(['quilt.placements.0.1.designId']);
  });

  it('answers 400 when nothing is placed, and 404 to anyone but the owner (the quilt and its jobs)', async () => {
    const empty = await quiltOf(0, [null, null]);
    const res = await owner.client.post(`/api/quilts/${empty}/plan`);
    expect(res.status).toBe(400);
    expect(Object.keys(res.body.error.fields)).toEqual(['quilt.placements']);
    const fresh = (await owner.client.post('/api/designs', { title: 'Outline for the neighbour check', design: outline() })).body.design.id as string;
    const id = await quiltOf(0, [fresh, null]);
    expect((await other.client.post(`/api/quilts/${id}/plan`)).status).toBe(404);
    const queued = await owner.client.post(`/api/quilts/${id}/plan`);
    expect(queued.status).toBe(202);
    const jobId = queued.body.job.id as string;
    expect((await other.client.get(`/api/quilts/${id}/plan-jobs/${jobId}`)).status).toBe(404);
    expect((await owner.client.get(`/api/quilts/${id}/plan-jobs/not-a-uuid`)).status).toBe(404);
    expect((await owner.client.get(`/api/quilts/${id}/plan-jobs/00000000-0000-4000-8000-000000000000`)).status).toBe(404);
    await pollJob(id, jobId);
  });

  it('names the cell of a design that was deleted after the quilt was saved', async () => {
    const gone = (await owner.client.post('/api/designs', { title: 'Soon deleted', design: outline() })).body.design.id;
    const id = await quiltOf(0, [designId, gone]);
    expect((await owner.client.delete(`/api/designs/${gone}`)).status).toBe(200);
    const res = await owner.client.post(`/api/quilts/${id}/plan`);
    expect(res.status, res.text).toBe(400);
    expect(Object.keys(res.body.error.fields)).toEqual(['quilt.placements.0.1.designId']);
  });

  it('a job row whose queue job was never sent (its instance stopped in between) is sent on the next request', async () => {
    const fresh = (await owner.client.post('/api/designs', { title: 'Outline never sent', design: outline() })).body.design.id as string;
    const id = await quiltOf(0, [fresh]);
    const orphan = await testDb()
      .insertInto('quilt_plan_job')
      .values({ quilt_id: id, owner_id: owner.id, quilt_version: 1, inputs_key: inputsKey([{ id: fresh, version: 1 }]), created_at: new Date(Date.now() - 60_000) })
      .returning('id')
      .executeTakeFirstOrThrow();
    const res = await owner.client.post(`/api/quilts/${id}/plan`);
    expect(res.status, res.text).toBe(202);
    expect(res.body.job.id).toBe(orphan.id);
    expect((await pollJob(id, orphan.id)).at(-1)!.job.state).toBe('done');
  });

  it('429 with Retry-After when the account already has 2 plans being made', async () => {
    const busy = await createAccount({ displayName: 'Busy planner' });
    const d = (await busy.client.post('/api/designs', { title: 'Outline', design: outline() })).body.design.id as string;
    const quilt = async () =>
      (await busy.client.post('/api/quilts', { title: 'Busy quilt', quilt: { version: 1, units: 'in', rows: 1, columns: 1, block: { width: 12, height: 12 }, placements: [[{ designId: d }]] } })).body.quilt.id as string;
    // Two jobs held open in the table (as if two workers were still on them), so the third request meets the cap.
    const held = [await quilt(), await quilt()];
    await testDb()
      .insertInto('quilt_plan_job')
      .values(held.map((q) => ({ quilt_id: q, owner_id: busy.id, quilt_version: 1, inputs_key: 'held-open-by-the-test', state: 'running' as const })))
      .execute();
    const res = await busy.client.post(`/api/quilts/${await quilt()}/plan`);
    expect(res.status, res.text).toBe(429);
    expect(res.body.error.code).toBe('rate_limited');
    expect(res.headers.get('retry-after')).toBe('5');
    await testDb().deleteFrom('quilt_plan_job').where('owner_id', '=', busy.id).execute();
  });
});
