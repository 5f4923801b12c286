// Issue 16: Threadway on more than one machine, on loopback. Two app instances and one planning worker share one
// PostgreSQL behind a small balancer (tests/helpers/appCluster.ts). A whole-quilt plan is asked for through one
// instance and read through the other (the job, its progress and its result live in PostgreSQL, not in an
// instance's memory); the worker is killed mid-job (SIGKILL: it cannot hand the job back), a second worker takes
// over, finds the job's heartbeat stopped, hands it back to the queue, and the retried job finishes, planning only
// the designs whose corner-pair tables the dead worker had not stored.
import type { Kysely } from 'kysely';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { connectDatabase } from '@db/connect.ts';
import type { Database } from '@db/schema.ts';
import { archRowsDesign, patchFillDesign, squareInSquareDesign } from '@shared/testing/multiPieceDesigns.ts';
import { quiltPlanAnswerSchema, quiltPlanJobAnswerSchema, quiltPlanQueuedSchema, type QuiltPlanJobAnswer } from '@shared/contract/quiltPlan.ts';
import { createAccount, type TestAccount } from '../helpers/accounts.ts';
import { startAppCluster, type AppCluster } from '../helpers/appCluster.ts';
import { TestClient } from '../helpers/client.ts';

let cluster: AppCluster;
let db: Kysely<Database>;
let owner: TestAccount;

beforeAll(async () => {
  cluster = await startAppCluster({ instances: 2, workers: 1, workerThreads: 1 });
  db = connectDatabase(cluster.databaseUrl, 2);
  owner = await createAccount({ displayName: 'Two-instance quilter', target: { appUrl: cluster.url, db } });
}, 180_000);

afterAll(async () => {
  await db?.destroy();
  await cluster?.close();
}, 60_000);

/** The same signed-in browser tab, talking to one instance directly (its session cookie is valid on every instance). */
function through(base: string): TestClient {
  const client = new TestClient(base);
  for (const [k, v] of owner.client.cookies) client.cookies.set(k, v);
  return client;
}

async function poll(
  client: TestClient,
  quiltId: string,
  jobId: string,
  until: (a: QuiltPlanJobAnswer) => boolean,
  seconds: number,
  meanwhile?: () => Promise<void>,
): Promise<QuiltPlanJobAnswer> {
  const deadline = Date.now() + seconds * 1000;
  for (;;) {
    await meanwhile?.();
    const res = await client.get(`/api/quilts/${quiltId}/plan-jobs/${jobId}`);
    expect(res.status, res.text).toBe(200);
    const answer = quiltPlanJobAnswerSchema.parse(res.body);
    if (until(answer)) return answer;
    if (answer.job.state === 'failed') throw new Error(`job failed: ${JSON.stringify(answer.job.failure)}`);
    if (Date.now() > deadline) throw new Error(`job ${jobId} not there within ${seconds} s: ${JSON.stringify(answer.job)}`);
    await new Promise((r) => setTimeout(r, 150));
  }
}

describe('two app instances and a planning worker behind a balancer', () => {
  it('a quilt plan asked through one instance is read through the other, and survives its worker being killed mid-job', async () => {
    // Nine distinct multi-piece blocks (patch fills, arch rows, square in a square): 90 corner-pair plans for one
    // engine thread, long enough to kill the worker part-way.
    const designs = [
      patchFillDesign(3, 3, 3), patchFillDesign(4, 3, 4), patchFillDesign(5, 4, 3),
      archRowsDesign(3, 3, 6), archRowsDesign(4, 4, 6), archRowsDesign(5, 4, 8),
      squareInSquareDesign(3, 3), squareInSquareDesign(4, 4), squareInSquareDesign(5, 5),
    ];
    const ids: string[] = [];
    for (const [i, design] of designs.entries()) {
      const res = await owner.client.post('/api/designs', { title: `Cluster block ${i + 1}`, design });
      expect(res.status, res.text).toBe(201);
      ids.push(res.body.design.id);
    }
    const created = await owner.client.post('/api/quilts', {
      title: 'Quilt planned on two machines',
      quilt: { version: 1, units: 'in', rows: 3, columns: 3, block: { width: 12, height: 12 }, sashing: 1, placements: [0, 1, 2].map((r) => [0, 1, 2].map((c) => ({ designId: ids[r * 3 + c]! }))) },
    });
    expect(created.status, created.text).toBe(201);
    const quiltId: string = created.body.quilt.id;

    const [first, second] = cluster.instances.map(through) as [TestClient, TestClient];
    const asked = await first.post(`/api/quilts/${quiltId}/plan`);
    expect(asked.status, asked.text).toBe(202);
    const { job } = quiltPlanQueuedSchema.parse(asked.body);

    // The other instance sees the job and its progress: they are rows in PostgreSQL. The worker is killed once it
    // has stored at least one design's corner-pair table but is not done.
    const storedTables = async () => Number((await db.selectFrom('corner_cost').select((eb) => eb.fn.countAll<string>().as('n')).executeTakeFirstOrThrow()).n);
    let stored = 0;
    const midway = await poll(second, quiltId, job.id, (a) => a.job.state === 'running' && a.job.done > 0, 60);
    for (let i = 0; i < 600 && stored < 1; i++) {
      stored = await storedTables();
      if (stored < 1) await new Promise((r) => setTimeout(r, 100));
    }
    expect(stored).toBeGreaterThanOrEqual(1);
    expect(midway.job.done).toBeLessThan(midway.job.total);
    await cluster.killWorker(0);
    const stalled = await poll(second, quiltId, job.id, () => true, 1);
    expect(stalled.job.state, 'killed before it finished').toBe('running');
    stored = await storedTables();

    // A second worker (another machine, in production) takes over: the stopped heartbeat hands the job back, and
    // the retry's own progress (attempt 2) counts only the designs with no stored table.
    cluster.startWorker();
    const retryTotals: number[] = [];
    const end = await poll(second, quiltId, job.id, (a) => a.job.state === 'done', 150, async () => {
      const r = await db.selectFrom('quilt_plan_job').select(['attempts', 'total', 'state']).where('id', '=', job.id).executeTakeFirstOrThrow();
      if (r.attempts === 2 && r.state === 'running' && r.total > 0) retryTotals.push(r.total);
    });
    expect(end.plan, 'the finished job carries its plan').not.toBeNull();
    expect(end.plan!.steps).toHaveLength(9);
    const row = await db.selectFrom('quilt_plan_job').select(['attempts', 'state']).where('id', '=', job.id).executeTakeFirstOrThrow();
    expect(row.state).toBe('done');
    expect(row.attempts, 'the job ran again after its worker died').toBe(2);
    // The retry planned only what was missing: 10 pairs for each design without a stored table, not all 90.
    expect(retryTotals.length).toBeGreaterThan(0);
    expect(Math.min(...retryTotals)).toBeLessThanOrEqual(10 * (9 - stored));
    expect(await storedTables()).toBe(9);

    // Asked again through the balancer: answered at once from the corner costs stored by the workers.
    const again = await owner.client.post(`/api/quilts/${quiltId}/plan`);
    expect(again.status, again.text).toBe(200);
    expect(quiltPlanAnswerSchema.parse(again.body).plan).toEqual(end.plan);
    // Both instances answered requests that came through the balancer.
    expect(cluster.served().every((n) => n > 0), JSON.stringify(cluster.served())).toBe(true);
  }, 300_000);
});
