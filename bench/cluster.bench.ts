/**
 * More than one machine, on this one (issue 16): two app instances behind the small balancer of
 * scripts/lib/balancer.mjs and two planning worker processes (one engine thread each), one PostgreSQL, all on
 * loopback and started here (nothing by hand). Measures with autocannon, through the balancer:
 * 1. quiet: the route check (8 quilters, one connection each, a 12 in nine-patch draft) and a page (the designs
 *    list, 2 connections) side by side;
 * 2. the same while 20 whole-quilt plans (10 accounts × 2, the per-account cap; 2 × 3 quilts of distinct
 *    multi-piece blocks never planned before) wait in the job queue or run on the workers;
 * then how long the workers take to finish all 20. Prints Markdown tables. Run alone:
 * `npx tsx bench/cluster.bench.ts`; `npm run bench` runs it with the others. BENCH_LOAD_SECONDS sets each load
 * phase (default 20 s).
 */
import os from 'node:os';
import type { ChildProcess } from 'node:child_process';
import autocannon from 'autocannon';
import { sql } from 'kysely';
import type { Design } from '@shared/design/design.schema.ts';
import type { Polyline } from '@shared/geometry/point.ts';
import { buildPiecedLayout } from '@shared/layouts/piecedLayouts.ts';
import { archRowsDesign, patchFillDesign, squareInSquareDesign } from '@shared/testing/multiPieceDesigns.ts';
import { connectDatabase } from '@db/connect.ts';
import { hashPassword } from '@server/auth/password.ts';
import { findFreePort, waitForHttp } from '../scripts/lib/ports.mjs';
import { serveApp, startPlanWorkerProcess } from '../scripts/lib/app.mjs';
import { startBalancer } from '../scripts/lib/balancer.mjs';
import { startBenchStack } from './benchStack.ts';

const LOAD_SECONDS = Number(process.env['BENCH_LOAD_SECONDS'] ?? 20);
const PASSWORD = 'quilting-is-fun-42';
const PLANNERS = 10;
const QUILTS_PER_PLANNER = 2;
const CHECKERS = 8;

class Client {
  cookie = '';
  constructor(readonly base: string) {}
  async send(method: string, url: string, body?: unknown): Promise<{ status: number; text: string }> {
    const headers: Record<string, string> = { origin: this.base, accept: 'application/json' };
    if (body !== undefined) headers['content-type'] = 'application/json';
    if (this.cookie) headers['cookie'] = this.cookie;
    const res = await fetch(this.base + url, { method, headers, body: body === undefined ? null : JSON.stringify(body) });
    const text = await res.text();
    const set = res.headers.getSetCookie().find((c) => c.startsWith('tw_session='));
    if (set) this.cookie = set.split(';')[0]!;
    return { status: res.status, text };
  }
  async json(method: string, url: string, body?: unknown, expect = [200, 201, 202]): Promise<any> {
    const r = await this.send(method, url, body);
    if (!expect.includes(r.status)) throw new Error(`bench/cluster: ${method} ${url} answered ${r.status}: ${r.text.slice(0, 300)}`);
    return JSON.parse(r.text);
  }
}

/** The reliability bench's typical block: nine-patch seams and 36 quilting lines across the middle. */
function typicalDesign(): Design {
  const lines: Polyline[] = [];
  for (let i = 1; i <= 18; i++) {
    const c = 4 + (i * 4) / 19;
    lines.push([[c, 0], [c, 12]], [[0, c], [12, c]]);
  }
  return { version: 1, units: 'in', width: 12, height: 12, seams: buildPiecedLayout('nine-patch', 12, 12).seams, lines, edgeTravel: true };
}

/** Six distinct multi-piece blocks for quilt `n` (seeded, so runs compare). */
function quiltBlocks(n: number): Design[] {
  const s = 100 + n * 7;
  return [patchFillDesign(s, 3, 3), archRowsDesign(s + 1, 3, 6), squareInSquareDesign(s + 2, 3), patchFillDesign(s + 3, 2, 4), archRowsDesign(s + 4, 4, 6), squareInSquareDesign(s + 5, 4)];
}

type Result = autocannon.Result;
function cannon(opts: autocannon.Options): Promise<Result> {
  return new Promise((resolve, reject) => autocannon(opts, (error, result) => (error ? reject(error) : resolve(result))));
}
const answers = (r: Result) =>
  Object.entries((r as unknown as { statusCodeStats?: Record<string, { count: number }> }).statusCodeStats ?? {})
    .map(([code, s]) => `${code}: ${s.count}`)
    .join(', ');

async function main(): Promise<void> {
  const stack = await startBenchStack({ rateLimitScale: '1', name: 'cluster' });
  const { env, cleanups } = stack;
  const stop = (c: ChildProcess) => () => c.kill('SIGTERM');
  try {
    const balancerPort = await findFreePort();
    const base = `http://127.0.0.1:${balancerPort}`;
    const dbUrl = stack.databaseUrl;
    Object.assign(env, { PUBLIC_ORIGIN: base, TRUSTED_PROXIES: '127.0.0.1' });
    const upstreams: string[] = [];
    for (let i = 0; i < 2; i++) {
      const port = await findFreePort();
      upstreams.push(`http://127.0.0.1:${port}`);
      cleanups.push(stop(serveApp({ port, env: env, quiet: true })));
    }
    await Promise.all(upstreams.map((u) => waitForHttp(u)));
    const balancer = await startBalancer({ upstreams, port: balancerPort });
    cleanups.push(() => balancer.close());
    for (let i = 0; i < 2; i++) cleanups.push(stop(startPlanWorkerProcess({ env, threads: 1, quiet: true })));

    const db = connectDatabase(dbUrl, 1);
    const hash = await hashPassword(PASSWORD);
    const names = [...Array.from({ length: CHECKERS }, (_, i) => `checker${i + 1}`), ...Array.from({ length: PLANNERS }, (_, i) => `planner${i + 1}`), 'reader'];
    for (const n of names) await db.insertInto('account').values({ email: `${n}@bench.test`, display_name: `Bench ${n}`, password_hash: hash }).execute();
    const clients = new Map(names.map((n) => [n, new Client(base)]));
    for (const n of names) await clients.get(n)!.json('POST', '/api/session', { email: `${n}@bench.test`, password: PASSWORD }, [200]);

    // The checkers' blocks, and the planners' quilts (their designs saved first; each save's figures are worked
    // out in the background, so the phases below wait until the app has settled).
    const draft = JSON.stringify({ design: { ...typicalDesign(), lines: [...typicalDesign().lines, [[0.5, 1], [3.5, 1.2]]] } });
    const checkTargets: { path: string; cookie: string }[] = [];
    for (let i = 0; i < CHECKERS; i++) {
      const c = clients.get(`checker${i + 1}`)!;
      const created = await c.json('POST', '/api/designs', { title: 'Typical block', design: typicalDesign() });
      checkTargets.push({ path: `/api/designs/${created.design.id}/check`, cookie: c.cookie });
    }
    const quilts: { client: Client; id: string }[] = [];
    for (let p = 0; p < PLANNERS; p++) {
      const c = clients.get(`planner${p + 1}`)!;
      for (let q = 0; q < QUILTS_PER_PLANNER; q++) {
        const ids: string[] = [];
        for (const [i, design] of quiltBlocks(p * QUILTS_PER_PLANNER + q).entries()) ids.push((await c.json('POST', '/api/designs', { title: `Block ${i + 1}`, design })).design.id);
        const quilt = { version: 1, units: 'in', rows: 2, columns: 3, block: { width: 12, height: 12 }, sashing: 1, placements: [0, 1].map((r) => [0, 1, 2].map((k) => ({ designId: ids[r * 3 + k]! }))) };
        quilts.push({ client: c, id: (await c.json('POST', '/api/quilts', { title: `Bench quilt ${quilts.length + 1}`, quilt })).quilt.id });
      }
    }
    for (let i = 0; i < 240; i++) {
      // A design's figures are ready when they were worked out for its current version.
      const pending = await db.selectFrom('design').select((eb) => eb.fn.countAll<string>().as('n')).where(sql<boolean>`summary_version is distinct from version`).executeTakeFirstOrThrow();
      if (Number(pending.n) === 0) break;
      await new Promise((r) => setTimeout(r, 500));
    }

    const reader = clients.get('reader')!;
    const load = (duration: number) => {
      let next = 0;
      const checks = cannon({
        url: base,
        connections: CHECKERS,
        duration,
        setupClient: (client) => {
          const t = checkTargets[next++ % checkTargets.length]!;
          client.setRequests([{ method: 'POST', path: t.path, headers: { origin: base, cookie: t.cookie, 'content-type': 'application/json' }, body: draft }]);
        },
      });
      const pages = cannon({ url: `${base}/designs`, connections: 2, duration, headers: { cookie: reader.cookie } });
      return Promise.all([checks, pages]);
    };
    await load(3); // warm-up: engine threads loaded, JIT warm
    const jobsDone = async () => Number((await db.selectFrom('quilt_plan_job').select((eb) => eb.fn.countAll<string>().as('n')).where('state', '=', 'done').executeTakeFirstOrThrow()).n);

    const quiet = await load(LOAD_SECONDS);
    const queuedAt = performance.now();
    const queued = await Promise.all(quilts.map((q) => q.client.send('POST', `/api/quilts/${q.id}/plan`)));
    const accepted = queued.filter((r) => r.status === 202).length;
    const busy = await load(LOAD_SECONDS);
    const doneDuringLoad = await jobsDone();
    let drained = NaN;
    for (let i = 0; i < 1200; i++) {
      if ((await jobsDone()) >= accepted) {
        drained = (performance.now() - queuedAt) / 1000;
        break;
      }
      await new Promise((r) => setTimeout(r, 500));
    }
    const pairs = await db.selectFrom('quilt_plan_job').select((eb) => eb.fn.sum<string>('total').as('n')).executeTakeFirstOrThrow();
    await db.destroy();

    const row = (label: string, [checks, pages]: [Result, Result]) =>
      `| ${label} | ${checks.requests.average.toFixed(0)} | ${checks.latency.p50} | ${checks.latency.p99} | ${answers(checks)} | ${pages.requests.average.toFixed(0)} | ${pages.latency.p50} | ${pages.latency.p99} | ${answers(pages)} |`;
    console.log(`\n## Two app instances and two planning workers (${new Date().toISOString().slice(0, 10)}, ${os.cpus().length} cores, Node ${process.version}, load average ${os.loadavg().map((l) => l.toFixed(1)).join(' ')})\n`);
    console.log(`Through the balancer, ${LOAD_SECONDS} s each. Route check: ${CHECKERS} quilters, one connection each; page: GET /designs, 2 connections.\n`);
    console.log('| phase | check req/s | check p50 ms | check p99 ms | check answers | page req/s | page p50 ms | page p99 ms | page answers |');
    console.log('|---|---:|---:|---:|---|---:|---:|---:|---|');
    console.log(row('quiet', quiet));
    console.log(row(`${accepted} whole-quilt plans queued`, busy));
    console.log(`\nWhole-quilt plans: ${accepted} of ${quilts.length} accepted (202), ${doneDuringLoad} finished during the load phase, all ${accepted} finished ${Number.isFinite(drained) ? `${drained.toFixed(1)} s` : 'not within 10 min'} after they were asked for (${pairs.n ?? 0} corner-pair plans on 2 workers × 1 engine thread). Requests per instance: ${balancer.served.join(' / ')}.`);
  } finally {
    await stack.close();
  }
}

await main();
