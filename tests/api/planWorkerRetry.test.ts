// A planning worker killed in the middle of a whole-quilt plan (SIGKILL: no goodbye, its job left active in the
// queue): the job's heartbeat stops, another worker hands it back to the queue after PLAN_HEARTBEAT_STALE_SECONDS,
// pg-boss runs it again, and it finishes — with the corner-pair tables the dead worker had stored used, not planned
// again. On an app instance and database of its own (throwawayApp.ts), so the shared stack's worker takes no part.
import type { ChildProcess } from 'node:child_process';
import type { Kysely } from 'kysely';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { connectDatabase } from '@db/connect.ts';
import type { Database } from '@db/schema.ts';
import { createAccount, type TestAccount } from '../helpers/accounts.ts';
import { startThrowawayApp, type ThrowawayApp } from '../helpers/throwawayApp.ts';
import { startPlanWorkerProcess } from '../../scripts/lib/app.mjs';
import { filledBlockDesigns } from '../../shared/testing/filledBlocks.ts';
import { quiltPlanJobAnswerSchema, quiltPlanQueuedSchema } from '../../shared/contract/quiltPlan.ts';

let app: ThrowawayApp;
let db: Kysely<Database>;
let quilter: TestAccount;
const workers: ChildProcess[] = [];
beforeAll(async () => {
  app = await startThrowawayApp({ fast: true });
  db = connectDatabase(app.databaseUrl, 2);
  quilter = await createAccount({ displayName: 'Retry quilter', target: { appUrl: app.url, db } });
});
afterAll(async () => {
  for (const w of workers) if (w.exitCode === null && w.signalCode === null) w.kill('SIGKILL');
  await db?.destroy();
  await app?.close();
});

const sleep = (ms: number) => new Promise((r) => setTimeout(r, ms));

describe('a planning worker dies mid-job', () => {
  it('the job is handed back, retried by another worker and finishes', async () => {
    const ids: string[] = [];
    for (const b of filledBlockDesigns(12, 5)) {
      const res = await quilter.client.post('/api/designs', b);
      expect(res.status, res.text).toBe(201);
      ids.push(res.body.design.id);
    }
    const placements = [0, 1, 2].map((r) => [0, 1, 2, 3].map((c) => ({ designId: ids[r * 4 + c]! })));
    const made = await quilter.client.post('/api/quilts', { title: 'Twelve for the retry', quilt: { version: 1, units: 'in', rows: 3, columns: 4, block: { width: 12, height: 12 }, placements } });
    expect(made.status, made.text).toBe(201);
    const quiltId = made.body.quilt.id as string;

    // One engine thread, so the quilt takes long enough to be killed in the middle of.
    const first = startPlanWorkerProcess({ env: { DATABASE_URL: app.databaseUrl }, threads: 1, quiet: true });
    workers.push(first);
    const posted = await quilter.client.post(`/api/quilts/${quiltId}/plan`);
    expect(posted.status, posted.text).toBe(202);
    const jobId = quiltPlanQueuedSchema.parse(posted.body).job.id;
    const poll = async () => quiltPlanJobAnswerSchema.parse((await quilter.client.get(`/api/quilts/${quiltId}/plan-jobs/${jobId}`)).body);

    // Kill it once it has stored at least one design's table but is not done.
    let stored = 0;
    for (let i = 0; i < 600; i++) {
      const { job } = await poll();
      expect(job.state).not.toBe('done');
      stored = Number((await db.selectFrom('corner_cost').select((eb) => eb.fn.countAll<number>().as('n')).executeTakeFirstOrThrow()).n);
      if (job.state === 'running' && stored >= 1) break;
      await sleep(100);
    }
    expect(stored).toBeGreaterThanOrEqual(1);
    first.kill('SIGKILL');
    await new Promise((r) => first.once('exit', r));
    const killedAt = (await poll()).job;
    expect(killedAt.state).toBe('running');

    const second = startPlanWorkerProcess({ env: { DATABASE_URL: app.databaseUrl }, threads: 2, quiet: true });
    workers.push(second);
    // The retry's own progress (attempt 2): its first total counts only the designs with no stored table.
    const retryTotals: number[] = [];
    let end = await poll();
    for (let i = 0; i < 2_400 && end.job.state !== 'done' && end.job.state !== 'failed'; i++) {
      const r = await db.selectFrom('quilt_plan_job').select(['attempts', 'total', 'state']).where('id', '=', jobId).executeTakeFirstOrThrow();
      if (r.attempts === 2 && r.state === 'running' && r.total > 0) retryTotals.push(r.total);
      await sleep(75);
      end = await poll();
    }
    expect(end.job.state, JSON.stringify(end.job.failure)).toBe('done');
    expect(end.plan?.steps).toHaveLength(12);
    const row = await db.selectFrom('quilt_plan_job').select(['attempts']).where('id', '=', jobId).executeTakeFirstOrThrow();
    expect(row.attempts).toBe(2);
    // The retry planned only what was missing: 10 pairs for each design without a stored table, not all 120.
    expect(retryTotals.length).toBeGreaterThan(0);
    expect(Math.min(...retryTotals)).toBeLessThanOrEqual(10 * (12 - stored));
    const tables = Number((await db.selectFrom('corner_cost').select((eb) => eb.fn.countAll<number>().as('n')).executeTakeFirstOrThrow()).n);
    expect(tables).toBe(12);
  }, 240_000);
});
