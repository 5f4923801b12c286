// POST /api/quilts/:id/plan: the chained route of a quilt, planned in the engine's worker pool.
// Analytic checks (no source needed beyond arithmetic): a block whose only quilting line is its 12 in square outline
// is one closed loop, so entering and leaving at the same corner sews it with no travel; two such blocks side by side
// share a corner, so the whole 1 × 2 quilt is one pass with no travel and 2 × 48 = 96 in stitched. With 2 in sashing
// the nearest corners of the two blocks are 2 in apart, so the least travel is exactly that 2 in link.
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createAccount, type TestAccount } from '../helpers/accounts.ts';
import { closeTestDb } from '../helpers/db.ts';
import { block } from './designFixtures.ts';
import { quiltPlanAnswerSchema } from '../../shared/contract/quiltPlan.ts';

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

async function quiltOf(sashing: number, cells: (string | null)[]): Promise<string> {
  const res = await owner.client.post('/api/quilts', {
    title: `Outline pair, sashing ${sashing}`,
    quilt: { version: 1, units: 'in', rows: 1, columns: cells.length, block: { width: 12, height: 12 }, sashing, placements: [cells.map((id) => (id ? { designId: id } : null))] },
  });
  expect(res.status, res.text).toBe(201);
  return res.body.quilt.id;
}

describe('planning a quilt', () => {
  it('two outline blocks sewn straight together: one pass, no travel, 96 in stitched, proven', async () => {
    const id = await quiltOf(0, [designId, designId]);
    const res = await owner.client.post(`/api/quilts/${id}/plan`);
    expect(res.status, res.text).toBe(200);
    const { plan, quiltVersion } = quiltPlanAnswerSchema.parse(res.body);
    expect(quiltVersion).toBe(1);
    expect(plan.steps.map((s) => s.cell)).toEqual([{ row: 0, column: 0 }, { row: 0, column: 1 }]);
    expect(plan.totalTravel).toBeCloseTo(0, 9);
    expect(plan.stitchLength).toBeCloseTo(96, 9);
    expect(plan.passes).toBe(1);
    expect(plan.stops).toBe(0);
    expect(plan.proven).toBe(true);
    // The first block's exit is the corner it shares with the second block's entry: its top or bottom right.
    expect([1, 2]).toContain(plan.steps[0]!.exit);
  });

  it('with 2 in sashing the least travel is the 2 in link between the nearest corners', async () => {
    const id = await quiltOf(2, [designId, designId]);
    const { plan } = quiltPlanAnswerSchema.parse((await owner.client.post(`/api/quilts/${id}/plan`)).body);
    expect(plan.linkTravel).toBeCloseTo(2, 9);
    expect(plan.blockTravel).toBeCloseTo(0, 9);
    expect(plan.totalTravel).toBeCloseTo(2, 9);
    expect(plan.passes).toBe(1);
  });

  it('answers 400 when nothing is placed, and 404 to anyone but the owner', async () => {
    const empty = await quiltOf(0, [null, null]);
    const res = await owner.client.post(`/api/quilts/${empty}/plan`);
    expect(res.status).toBe(400);
    expect(Object.keys(res.body.error.fields)).toEqual(['quilt.placements']);
    const id = await quiltOf(0, [designId, null]);
    expect((await other.client.post(`/api/quilts/${id}/plan`)).status).toBe(404);
  });

  it('names the cell of a design that was deleted after the quilt was saved', async () => {
    const gone = (await owner.client.post('/api/designs', { title: 'Soon deleted', design: outline() })).body.design.id;
    const id = await quiltOf(0, [designId, gone]);
    expect((await owner.client.delete(`/api/designs/${gone}`)).status).toBe(200);
    const res = await owner.client.post(`/api/quilts/${id}/plan`);
    expect(res.status, res.text).toBe(400);
    expect(Object.keys(res.body.error.fields)).toEqual(['quilt.placements.0.1.designId']);
  });
});
