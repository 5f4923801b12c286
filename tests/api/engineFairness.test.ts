// Issue 10, defect 5: one account flooding the route engine must not starve others. Fair turns per account,
// at most 4 checks or plans waiting per account (then 429 with Retry-After), a worker kept free of the flooding
// account, and saves that never wait on planning (the figures follow in the background).
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createAccount, type TestAccount } from '../helpers/accounts.ts';
import { closeTestDb } from '../helpers/db.ts';
import { waitForFigures } from '../helpers/designFigures.ts';
import { block, e9Grid } from './designFixtures.ts';

let flooder: TestAccount;
let other: TestAccount;
beforeAll(async () => {
  [flooder, other] = await Promise.all([createAccount({ displayName: 'Flood Quilter' }), createAccount({ displayName: 'Patient Quilter' })]);
});
afterAll(closeTestDb);

async function create(account: TestAccount, title: string, design: Record<string, unknown>): Promise<string> {
  const res = await account.client.post('/api/designs', { title, design });
  expect(res.status, res.text).toBe(201);
  return res.body.design.id;
}

describe('one account flooding the route engine', () => {
  it('gets 429 with Retry-After past its queue cap, while another account is checked and its own saves go through', async () => {
    // E9 with N = 120 (0.1 in crosshatch and a stitched border): ~30,000 planar edges, the densest case of
    // the route engine benchmark, so each plan keeps a worker busy for a while.
    const dense = await create(flooder, 'Dense crosshatch', e9Grid(120));
    const light = await create(other, 'Light block', block());
    await waitForFigures(flooder.client, dense); // the figures job of the create is done: only the flood runs

    const finished: string[] = [];
    const flood = Array.from({ length: 12 }, (_, i) =>
      flooder.client.post(`/api/designs/${dense}/plan`, {}).then((r) => {
        if (r.status === 200) finished.push(`plan${i}`);
        return r;
      }),
    );
    await new Promise((r) => setTimeout(r, 50)); // the flood is queued
    const check = await other.client.post(`/api/designs/${light}/check`, {});
    finished.push('other-check');
    expect(check.status, check.text).toBe(200);
    // The flood's own save: stored at once, figures later (it never queues behind the plans).
    const save = await flooder.client.put(`/api/designs/${dense}`, { baseVersion: 1, title: 'Dense crosshatch, saved mid-flood', design: e9Grid(119) });
    finished.push('flood-save');
    expect(save.status, save.text).toBe(200);
    expect(save.body.design).toMatchObject({ version: 2, summary: null, summaryPending: true });

    const answers = await Promise.all(flood);
    const refused = answers.filter((a) => a.status === 429);
    const planned = answers.filter((a) => a.status === 200);
    expect(answers.every((a) => a.status === 200 || a.status === 429), answers.map((a) => a.status).join(',')).toBe(true);
    // One running and at most 4 waiting (ENGINE_MAX_QUEUED_PER_ACCOUNT); the rest are told to come back.
    expect(refused.length).toBeGreaterThanOrEqual(1);
    expect(planned.length).toBeGreaterThanOrEqual(1);
    expect(refused[0]!.body.error.code).toBe('rate_limited');
    expect(Number(refused[0]!.headers.get('retry-after'))).toBeGreaterThan(0);
    // The other account and the save were answered before the flood had drained (fair turns, a free worker).
    const lastPlan = Math.max(...finished.map((f, i) => (f.startsWith('plan') ? i : -1)));
    expect(finished.indexOf('other-check')).toBeLessThan(lastPlan);
    expect(finished.indexOf('flood-save')).toBeLessThan(lastPlan);
    // And the save's figures arrive once the engine gets to them.
    const figures = await waitForFigures(flooder.client, dense, 60_000);
    expect(figures.summary).toMatchObject({ passes: 1 });
  });
});
