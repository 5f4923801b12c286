/**
 * Reliability benchmark (issue 10): serves the built app on a throwaway database (nothing started by hand) and
 * measures, on loopback only, with autocannon:
 * 1. heavy designs (200,000 points, the cap): how long the request thread is blocked while one is saved and read
 *    (the longest answer to a tiny probe request sent every few ms meanwhile), and the designs list's size;
 * 2. the route check endpoint under load (target ≥ 300 req/s, p99 < 100 ms) while one account floods planning;
 * 3. sign-in for another account while one e-mail address is under a password-guessing burst.
 * Prints Markdown tables. Run alone: `npx tsx bench/reliability.bench.ts`; `npm run bench` runs it with the
 * others. BENCH_LOAD_SECONDS sets each load phase's length (default 20 s). Seeded (mulberry32), so runs compare.
 */
import os from 'node:os';
import { Worker } from 'node:worker_threads';
import autocannon from 'autocannon';
import type { Design } from '@shared/design/design.schema.ts';
import type { Point, Polyline } from '@shared/geometry/point.ts';
import { buildPiecedLayout } from '@shared/layouts/piecedLayouts.ts';
import { connectDatabase } from '@db/connect.ts';
import { hashPassword } from '@server/auth/password.ts';
import { mulberry32 } from './generators.ts';
import { findFreePort, waitForHttp } from '../scripts/lib/ports.mjs';
import { serveApp } from '../scripts/lib/app.mjs';
import { startBenchStack } from './benchStack.ts';

const LOAD_SECONDS = Number(process.env['BENCH_LOAD_SECONDS'] ?? 20);
const PASSWORD = 'quilting-is-fun-42';

/** 2,000 freehand-like strokes of 100 points (seeded random walks, steps up to 0.2 in): the 200,000-point cap. */
function capDesign(): Design {
  const rand = mulberry32(11);
  const lines: Polyline[] = Array.from({ length: 2_000 }, () => {
    let p: Point = [0.5 + rand() * 11, 0.5 + rand() * 11];
    return Array.from({ length: 100 }, (): Point => {
      p = [Math.min(11.9, Math.max(0.1, p[0] + (rand() - 0.5) * 0.4)), Math.min(11.9, Math.max(0.1, p[1] + (rand() - 0.5) * 0.4))];
      return [Math.round(p[0] * 1e4) / 1e4, Math.round(p[1] * 1e4) / 1e4];
    });
  });
  return { version: 1, units: 'in', width: 12, height: 12, seams: [], lines, edgeTravel: true };
}

/** The workbench bench's typical block: nine-patch seams and 36 quilting lines across the middle. */
function typicalDesign(): Design {
  const lines: Polyline[] = [];
  for (let i = 1; i <= 18; i++) {
    const c = 4 + (i * 4) / 19;
    lines.push([[c, 0], [c, 12]], [[0, c], [12, c]]);
  }
  return { version: 1, units: 'in', width: 12, height: 12, seams: buildPiecedLayout('nine-patch', 12, 12).seams, lines, edgeTravel: true };
}

/** 0.1 in crosshatch with a stitched border (E9, N = 120): ~30,000 planar edges, the densest plan of the engine bench. */
function denseDesign(): Design {
  const lines: Polyline[] = [[[0, 0], [12, 0], [12, 12], [0, 12], [0, 0]]];
  for (let i = 0; i < 120; i++) {
    const c = 0.05 + i * 0.1;
    lines.push([[c, 0], [c, 12]], [[0, c], [12, c]]);
  }
  return { version: 1, units: 'in', width: 12, height: 12, seams: [], lines, edgeTravel: false };
}

class Client {
  cookie = '';
  constructor(readonly base: string) {}
  /** `body`: a value (serialised here) or a string sent as it is. The answer's text is returned unparsed. */
  async send(method: string, url: string, body?: unknown): Promise<{ status: number; text: string; ms: number }> {
    const headers: Record<string, string> = { origin: this.base, accept: 'application/json' };
    if (body !== undefined) headers['content-type'] = 'application/json';
    if (this.cookie) headers['cookie'] = this.cookie;
    const payload = body === undefined ? null : typeof body === 'string' ? body : JSON.stringify(body);
    const t0 = performance.now();
    const res = await fetch(this.base + url, { method, headers, body: payload });
    const text = await res.text();
    const ms = performance.now() - t0;
    const set = res.headers.getSetCookie().find((c) => c.startsWith('tw_session='));
    if (set) this.cookie = set.split(';')[0]!;
    return { status: res.status, text, ms };
  }
}

/**
 * Sends a tiny request (no database, no session) one after another from a worker thread of its own, so the
 * bench's own work (serialising 3 MB bodies) does not count, and keeps the longest answer time.
 */
function probe(base: string): { stop: () => Promise<{ max: number; count: number }> } {
  const worker = new Worker(
    `const { parentPort, workerData } = require('node:worker_threads');
     let running = true, max = 0, count = 0;
     parentPort.on('message', () => { running = false; });
     (async () => {
       while (running) {
         const t0 = performance.now();
         await (await fetch(workerData + '/api/__probe')).arrayBuffer();
         max = Math.max(max, performance.now() - t0);
         count += 1;
         await new Promise((r) => setTimeout(r, 2));
       }
       parentPort.postMessage({ max, count });
     })();`,
    { eval: true, workerData: base },
  );
  return {
    stop: () =>
      new Promise((resolve) => {
        worker.once('message', (m: { max: number; count: number }) => void worker.terminate().then(() => resolve(m)));
        worker.postMessage('stop');
      }),
  };
}

const ms = (v: number) => (v >= 100 ? v.toFixed(0) : v.toFixed(1));
const kib = (bytes: number) => (bytes >= 1024 * 1024 ? `${(bytes / 1024 / 1024).toFixed(2)} MiB` : `${(bytes / 1024).toFixed(1)} KiB`);

async function heavyDesigns(base: string, client: Client): Promise<void> {
  const design = capDesign();
  const rows: string[] = [];
  const measure = async (label: string, op: () => Promise<{ status: number; text: string; ms: number }>) => {
    await new Promise((r) => setTimeout(r, 500));
    const p = probe(base);
    await new Promise((r) => setTimeout(r, 200));
    const res = await op();
    const blocked = await p.stop();
    rows.push(`| ${label} | ${res.status} | ${ms(res.ms)} | ${ms(blocked.max)} | ${kib(res.text.length)} |`);
    return res;
  };
  const idle = probe(base);
  await new Promise((r) => setTimeout(r, 1_000));
  const quiet = await idle.stop();
  const createBody = JSON.stringify({ title: 'Stipple storm', design });
  const saveBody = JSON.stringify({ baseVersion: 1, title: 'Stipple storm 2', design });
  const created = await measure('POST /api/designs (create, 200,000 points)', () => client.send('POST', '/api/designs', createBody));
  const id = idIn(created.text.slice(-2000).includes('"id"') ? created.text.slice(-2000) : created.text);
  await measure('GET /api/designs/:id', () => client.send('GET', `/api/designs/${id}`));
  await measure('PUT /api/designs/:id (save)', () => client.send('PUT', `/api/designs/${id}`, saveBody));
  await measure('GET /api/designs (list)', () => client.send('GET', '/api/designs'));
  // The save's figures are worked out in the background (a design this dense runs into the 8 s cap); let that
  // finish so it does not weigh on the load phases below.
  for (let i = 0; i < 120 && /"summaryPending":true/.test((await client.send('GET', '/api/designs')).text); i++) await new Promise((r) => setTimeout(r, 500));
  console.log(`\n### Heavy design (200,000 points, ${kib(JSON.stringify(design).length)} of JSON)\n`);
  console.log(`Probe: GET /api/__probe one after another; idle longest answer ${ms(quiet.max)} ms over ${quiet.count} probes.\n`);
  console.log('| request | status | request ms | longest probe answer meanwhile (ms) | response size |');
  console.log('|---|---:|---:|---:|---:|');
  for (const r of rows) console.log(r);
}

type Result = autocannon.Result;
function cannon(opts: autocannon.Options): Promise<Result> {
  return new Promise((resolve, reject) => {
    autocannon(opts, (error, result) => (error ? reject(error) : resolve(result)));
  });
}
const statusCounts = (r: Result) =>
  Object.entries((r as unknown as { statusCodeStats?: Record<string, { count: number }> }).statusCodeStats ?? {})
    .map(([code, s]) => `${code}: ${s.count}`)
    .join(', ');

/** Checkers: one account per connection, as quilters each at their own workbench (the per-account queue cap
 * would refuse one account sending eight checks at once). */
async function routeCheckUnderFlood(base: string, checkers: Client[], flooder: Client): Promise<void> {
  const typical = typicalDesign();
  const draft: Design = { ...typical, lines: [...typical.lines, [[0.5, 1], [3.5, 1.2]]] };
  const body = JSON.stringify({ design: draft });
  const targets: { path: string; cookie: string }[] = [];
  for (const c of checkers) {
    const created = await c.send('POST', '/api/designs', { title: 'Typical block', design: typical });
    targets.push({ path: `/api/designs/${idIn(created.text)}/check`, cookie: c.cookie });
  }
  const dense = await flooder.send('POST', '/api/designs', { title: 'Dense crosshatch', design: denseDesign() });
  const denseId = idIn(dense.text);
  const checkOpts = (duration: number): autocannon.Options => {
    let next = 0;
    return {
      url: base,
      connections: checkers.length,
      duration,
      setupClient: (client) => {
        const t = targets[next++ % targets.length]!;
        client.setRequests([{ method: 'POST', path: t.path, headers: { origin: base, cookie: t.cookie, 'content-type': 'application/json' }, body }]);
      },
    };
  };
  await cannon(checkOpts(3)); // warm-up: workers loaded, JIT warm
  const alone = await cannon(checkOpts(LOAD_SECONDS));
  const flood = cannon({
    url: `${base}/api/designs/${denseId}/plan`,
    method: 'POST',
    connections: 16,
    duration: LOAD_SECONDS + 4,
    headers: { origin: base, cookie: flooder.cookie, 'content-type': 'application/json' },
    body: '{}',
  });
  await new Promise((r) => setTimeout(r, 2_000));
  const flooded = await cannon(checkOpts(LOAD_SECONDS));
  const floodResult = await flood;
  const row = (label: string, r: Result) =>
    `| ${label} | ${r.requests.average.toFixed(0)} | ${r.latency.p50} | ${r.latency.p97_5} | ${r.latency.p99} | ${r.latency.max} | ${statusCounts(r)} |`;
  console.log(`\n### Route check under load (${LOAD_SECONDS} s each; ${checkers.length} quilters, one connection each, each sending a 12 in nine-patch with 37 lines as a draft)\n`);
  console.log('| load | req/s | p50 ms | p97.5 ms | p99 ms | max ms | answers |');
  console.log('|---|---:|---:|---:|---:|---:|---|');
  console.log(row('route check alone', alone));
  console.log(row('route check while one account floods planning', flooded));
  console.log(row('the flood: POST …/plan, 16 connections, one account, 0.1 in crosshatch', floodResult));
}

function idIn(text: string): string {
  const id = /"id":"([0-9a-f-]{36})"/.exec(text)?.[1];
  if (!id) throw new Error(`bench/reliability: no design id in ${text.slice(0, 200)}`);
  return id;
}

async function signInDuringGuessing(base: string, victimEmail: string, bystanderEmail: string): Promise<void> {
  const guesses = cannon({
    url: `${base}/api/session`,
    method: 'POST',
    connections: 16,
    duration: LOAD_SECONDS,
    headers: { origin: base, 'content-type': 'application/json' },
    body: JSON.stringify({ email: victimEmail, password: 'not-the-password-1' }),
  });
  await new Promise((r) => setTimeout(r, 1_000));
  const times: number[] = [];
  const statuses = new Map<number, number>();
  const until = Date.now() + (LOAD_SECONDS - 3) * 1000;
  while (Date.now() < until) {
    const c = new Client(base);
    const r = await c.send('POST', '/api/session', { email: bystanderEmail, password: PASSWORD });
    times.push(r.ms);
    statuses.set(r.status, (statuses.get(r.status) ?? 0) + 1);
    await new Promise((res) => setTimeout(res, 250));
  }
  const burst = await guesses;
  times.sort((a, b) => a - b);
  const pct = (p: number) => times[Math.min(times.length - 1, Math.ceil((p / 100) * times.length) - 1)]!;
  console.log(`\n### Sign-in during a password-guessing burst (${LOAD_SECONDS} s, 16 connections guessing one address)\n`);
  console.log('| who | requests | p50 ms | p99 ms | max ms | answers |');
  console.log('|---|---:|---:|---:|---:|---|');
  console.log(`| the guesser (wrong passwords) | ${burst.requests.total} | ${burst.latency.p50} | ${burst.latency.p99} | ${burst.latency.max} | ${statusCounts(burst)} |`);
  console.log(`| another quilter signing in (every 250 ms) | ${times.length} | ${ms(pct(50))} | ${ms(pct(99))} | ${ms(times.at(-1)!)} | ${[...statuses].map(([s, n]) => `${s}: ${n}`).join(', ')} |`);
}

async function main(): Promise<void> {
  const stack = await startBenchStack({ rateLimitScale: '1', name: 'reliability' });
  const { env, cleanups } = stack;
  try {
    const appPort = await findFreePort();
    const base = `http://127.0.0.1:${appPort}`;
    const server = serveApp({ port: appPort, env: { ...env, PUBLIC_ORIGIN: base }, quiet: true });
    cleanups.push(() => server.kill('SIGTERM'));
    await waitForHttp(base);

    // Accounts straight into the database (as the demo seed does), so sign-up limits play no part.
    const db = connectDatabase(stack.databaseUrl, 1);
    const passwordHash = await hashPassword(PASSWORD);
    const names = [...Array.from({ length: 8 }, (_, i) => `checker${i + 1}`), 'heavy', 'flooder', 'victim', 'bystander'];
    for (const n of names) {
      await db.insertInto('account').values({ email: `${n}@bench.test`, display_name: `Bench ${n}`, password_hash: passwordHash }).execute();
    }
    await db.destroy();
    const clients = Object.fromEntries(names.map((n) => [n, new Client(base)])) as Record<string, Client>;
    for (const n of names) {
      const r = await clients[n]!.send('POST', '/api/session', { email: `${n}@bench.test`, password: PASSWORD });
      if (r.status !== 200) throw new Error(`bench/reliability: sign-in as ${n} answered ${r.status}: ${r.text}`);
    }

    console.log(`\n## Reliability (${new Date().toISOString().slice(0, 10)}, ${os.cpus().length} cores, Node ${process.version}, load average before: ${os.loadavg().map((l) => l.toFixed(1)).join(' ')})`);
    await heavyDesigns(base, clients['heavy']!);
    await routeCheckUnderFlood(base, names.filter((n) => n.startsWith('checker')).map((n) => clients[n]!), clients['flooder']!);
    await signInDuringGuessing(base, 'victim@bench.test', 'bystander@bench.test');
    console.log(`\nLoad average after: ${os.loadavg().map((l) => l.toFixed(1)).join(' ')}`);
  } finally {
    await stack.close();
  }
}

await main();
