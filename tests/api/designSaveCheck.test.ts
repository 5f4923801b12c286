// The engine facade (issue 11 item 6): PUT /api/designs/:id?check=1 saves a version and answers with its route check
// in one request; the design's figures are written from that check. Figures are checked against worked example E9
// (e9Grid in designFixtures.ts: a 12 in block, border + N vertical and N horizontal lines, route (0,0) → (12,12):
// 4N odd points, stitch 48 + 24N, least retrace 24 for every N, as designsEngine.test.ts also checks).
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { checkAnswerSchema } from '@shared/contract/check.ts';
import { designAnswerSchema, savedWithCheckAnswerSchema } from '@shared/contract/designs.ts';
import { problemSchema } from '@shared/contract/errors.ts';
import { createAccount, type TestAccount } from '../helpers/accounts.ts';
import { closeTestDb } from '../helpers/db.ts';
import { block, e9Grid } from './designFixtures.ts';

let ann: TestAccount;
beforeAll(async () => {
  ann = await createAccount({ displayName: 'Ann' });
});
afterAll(closeTestDb);

async function create(title: string, design: Record<string, unknown>): Promise<string> {
  const res = await ann.client.post('/api/designs', { title, design });
  expect(res.status, res.text).toBe(201);
  return res.body.design.id;
}

describe('PUT /api/designs/:id?check=1: one request saves and checks', () => {
  it('returns the saved version and its route check (E9, N = 4) in one answer, in the contract’s shape', async () => {
    const id = await create('Burst', block());
    const res = await ann.client.put(`/api/designs/${id}?check=1`, { baseVersion: 1, design: e9Grid(4) });
    expect(res.status, res.text).toBe(200);
    const answer = savedWithCheckAnswerSchema.parse(res.body);
    expect(answer.design.version).toBe(2);
    expect(answer.design.design.lines).toHaveLength(9);
    expect(answer.checkError).toBeNull();
    const check = answer.check!;
    expect(check.check.oddPoints.count).toBe(16);
    expect(check.check.stitchLength).toBeCloseTo(48 + 24 * 4, 9);
    expect(check.plan).toMatchObject({ passes: 1, stops: 0, optimal: true });
    expect(check.plan.retraceLength).toBeCloseTo(24, 9);
    // The figures were written from this check: not pending, the same plan's numbers, no second engine job needed.
    expect(answer.design.summaryPending).toBe(false);
    expect(answer.design.summary).toMatchObject({ passes: 1, stops: 0, optimal: true, units: 'in' });
    expect(answer.design.summary!.retraceLength).toBeCloseTo(24, 9);
    expect(answer.design.summary!.thread.stitches).toBe(check.threadBudget.stitchCount);
    const read = designAnswerSchema.parse((await ann.client.get(`/api/designs/${id}`)).body);
    expect(read.design.summaryPending).toBe(false);
    expect(read.design.summary).toEqual(answer.design.summary);
  });

  it('gives the same figures as the separate check endpoint for the saved version', async () => {
    const id = await create('Same figures', block());
    const saved = savedWithCheckAnswerSchema.parse((await ann.client.put(`/api/designs/${id}?check=1`, { baseVersion: 1, design: e9Grid(12) })).body);
    const separate = await ann.client.post(`/api/designs/${id}/check`, {});
    expect(separate.status, separate.text).toBe(200);
    const { designVersion, draft, ...check } = checkAnswerSchema.parse(separate.body);
    expect({ designVersion, draft }).toEqual({ designVersion: 2, draft: false });
    expect(saved.check).toEqual(check);
    expect(check.plan.retraceLength).toBeCloseTo(24, 9);
    expect(check.check.oddPoints.count).toBe(48);
  });

  it('refuses a stale version with 409 and the current design, and checks nothing', async () => {
    const id = await create('Stale', block());
    expect((await ann.client.put(`/api/designs/${id}?check=1`, { baseVersion: 1, design: e9Grid(4) })).status).toBe(200);
    const stale = await ann.client.put(`/api/designs/${id}?check=1`, { baseVersion: 1, design: block() });
    expect(stale.status).toBe(409);
    expect(problemSchema.parse(stale.body).error.code).toBe('conflict');
    expect(stale.body.design.version).toBe(2);
    expect(stale.body.check).toBeUndefined();
  });

  it('keeps the save when the engine refuses the drawing, and says why instead of a check', async () => {
    const id = await create('Nothing to quilt yet', block());
    const res = await ann.client.put(`/api/designs/${id}?check=1`, { baseVersion: 1, design: block({ lines: [] }) });
    expect(res.status, res.text).toBe(200);
    const answer = savedWithCheckAnswerSchema.parse(res.body);
    expect(answer.design.version).toBe(2);
    expect(answer.check).toBeNull();
    expect(answer.checkError).toMatchObject({ code: 'invalid_input', fields: { 'design.lines': expect.stringContaining('empty-design') } });
    expect(answer.design).toMatchObject({ summary: null, summaryPending: false });
  });

  it('answers a save without ?check=1 as before: the version only, figures still to come', async () => {
    const id = await create('Plain save', block());
    const res = await ann.client.put(`/api/designs/${id}`, { baseVersion: 1, design: e9Grid(4) });
    expect(res.status, res.text).toBe(200);
    expect(Object.keys(res.body)).toEqual(['design']);
    expect(designAnswerSchema.parse(res.body).design.version).toBe(2);
  });
});
