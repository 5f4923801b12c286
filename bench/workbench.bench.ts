/**
 * Workbench benchmark (a browser bench, not a test): serves the built app on a throwaway database, then
 * 1. frame time while panning and zooming a 12 in design with 5,000 strokes in headless Chromium
 *    (target ≥ 50 fps), and
 * 2. the edit → route check round trip on the server for a typical 12 in block (nine-patch seams and
 *    36 quilting lines; target p95 < 150 ms), each round sending the edited draft as POST …/check does, and one
 *    burst of edits saved and checked both ways: PUT + POST …/check (before issue 11) and PUT ?check=1 (the workbench now).
 * Seeded (mulberry32, bench/generators.ts), so runs compare like with like. Prints a Markdown table.
 * Run alone: `npx tsx bench/workbench.bench.ts`; `npm run bench` runs it with the other benches.
 * BENCH_PROFILE=1 also prints the page's top self-time functions during pan/zoom (Chrome DevTools profiler);
 * BENCH_ROUND_TRIPS sets the number of check round trips (default 60).
 */
import { mkdtempSync, readFileSync, readdirSync, rmSync } from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import { chromium } from 'playwright-core';
import type { Design } from '@shared/design/design.schema.ts';
import type { Point, Polyline } from '@shared/geometry/point.ts';
import { buildPiecedLayout } from '@shared/layouts/piecedLayouts.ts';
import { mulberry32 } from './generators.ts';
import { findFreePort, waitForHttp } from '../scripts/lib/ports.mjs';
import { serveApp } from '../scripts/lib/app.mjs';
import { startBenchStack } from './benchStack.ts';

const CHROMIUM_ARGS = ['--no-sandbox', '--disable-gpu', '--disable-quic', '--no-first-run', '--disable-background-networking', '--disable-component-update', '--disable-sync'];
const STROKES = 5_000;
const ROUND_TRIPS = Number(process.env['BENCH_ROUND_TRIPS'] ?? 60);

/** 5,000 short freehand-like strokes (4–7 points, steps up to 1/4 in) scattered over a nine-patch. */
function denseDesign(seed: number): Design {
  const rand = mulberry32(seed);
  const lines: Polyline[] = [];
  for (let i = 0; i < STROKES; i++) {
    let p: Point = [0.3 + rand() * 11.4, 0.3 + rand() * 11.4];
    const line: Point[] = [p];
    const n = 4 + Math.floor(rand() * 4);
    for (let k = 1; k < n; k++) {
      p = [Math.min(11.9, Math.max(0.1, p[0] + (rand() - 0.5) * 0.5)), Math.min(11.9, Math.max(0.1, p[1] + (rand() - 0.5) * 0.5))];
      line.push(p);
    }
    lines.push(line);
  }
  return { version: 1, units: 'in', width: 12, height: 12, seams: buildPiecedLayout('nine-patch', 12, 12).seams, lines, edgeTravel: true };
}

/** A typical block: nine-patch seams, a straight-line set of 36 lines at 1/3 in across the middle column and row. */
function typicalDesign(): Design {
  const lines: Polyline[] = [];
  for (let i = 1; i <= 18; i++) {
    const c = 4 + (i * 4) / 19;
    lines.push([[c, 0], [c, 12]], [[0, c], [12, c]]);
  }
  return { version: 1, units: 'in', width: 12, height: 12, seams: buildPiecedLayout('nine-patch', 12, 12).seams, lines, edgeTravel: true };
}

/**
 * Runs in the page: one wheel event per animation frame for `ms` milliseconds — 60 frames of panning,
 * then 60 of ctrl+wheel (trackpad pinch) zoom, alternating in and out — and returns the frame intervals.
 */
const PAN_ZOOM_SCRIPT = `async (x, y, ms) => {
  const target = document.querySelector('[data-testid="block-canvas"] .konvajs-content');
  const intervals = [];
  let last = performance.now();
  let i = 0;
  const end = last + ms;
  await new Promise((resolve) => {
    const tick = (t) => {
      intervals.push(t - last);
      last = t;
      i += 1;
      const pan = Math.floor(i / 60) % 2 === 0;
      const zoomIn = Math.floor(i / 120) % 2 === 0;
      const init = pan
        ? { deltaX: 6, deltaY: i % 120 < 60 ? 4 : -4, clientX: x, clientY: y, bubbles: true, cancelable: true }
        : { deltaY: zoomIn ? -8 : 8, ctrlKey: true, clientX: x, clientY: y, bubbles: true, cancelable: true };
      target.dispatchEvent(new WheelEvent('wheel', init));
      if (t < end) requestAnimationFrame(tick);
      else resolve();
    };
    requestAnimationFrame(tick);
  });
  return intervals.slice(2);
}`;

function percentile(sorted: readonly number[], p: number): number {
  return sorted[Math.min(sorted.length - 1, Math.ceil((p / 100) * sorted.length) - 1)]!;
}

class Client {
  cookie = '';
  constructor(readonly base: string) {}
  async send(method: string, url: string, body?: unknown): Promise<{ status: number; json: any }> {
    const headers: Record<string, string> = { origin: this.base, accept: 'application/json' };
    if (body !== undefined) headers['content-type'] = 'application/json';
    if (this.cookie) headers['cookie'] = this.cookie;
    const res = await fetch(this.base + url, { method, headers, body: body === undefined ? null : JSON.stringify(body) });
    const set = res.headers.getSetCookie().find((c) => c.startsWith('tw_session='));
    if (set) this.cookie = set.split(';')[0]!;
    const text = await res.text();
    return { status: res.status, json: text ? JSON.parse(text) : null };
  }
}

/** The token of the sign-up link the fake mail server captured for `email` (sign-up is finished from the e-mail). */
async function signUpToken(mailDir: string, email: string): Promise<string> {
  for (let i = 0; i < 100; i += 1) {
    for (const file of readdirSync(mailDir).filter((f) => f.endsWith('.json'))) {
      const mail = JSON.parse(readFileSync(path.join(mailDir, file), 'utf8')) as { to: string[]; text: string };
      const token = /\/sign-up\/confirm\?token=([a-z2-7]{32})/.exec(mail.text)?.[1];
      if (token && mail.to.includes(email)) return token;
    }
    await new Promise((r) => setTimeout(r, 100));
  }
  throw new Error(`bench/workbench: no sign-up e-mail to ${email}`);
}

async function main(): Promise<void> {
  const stack = await startBenchStack({ rateLimitScale: '100', name: 'workbench' });
  const { env, cleanups, mailDir } = stack;
  try {
    const appPort = await findFreePort();
    const base = `http://127.0.0.1:${appPort}`;
    const server = serveApp({ port: appPort, env: { ...env, PUBLIC_ORIGIN: base }, quiet: true });
    cleanups.push(() => server.kill('SIGTERM'));
    await waitForHttp(base);

    const client = new Client(base);
    const email = `bench-${Date.now()}@guild.test`;
    const signUp = await client.send('POST', '/api/accounts', { email, password: 'quilting-is-fun-42', displayName: 'Bench Quilter', units: 'in' });
    if (signUp.status !== 202) throw new Error(`bench/workbench: sign-up failed (${signUp.status})`);
    const confirmed = await client.send('POST', '/api/accounts/confirm', { token: await signUpToken(mailDir, email) });
    if (confirmed.status !== 201) throw new Error(`bench/workbench: sign-up confirmation failed (${confirmed.status})`);

    // 1. Edit → route check round trip for a typical block.
    const typical = typicalDesign();
    const created = await client.send('POST', '/api/designs', { title: 'Typical block', design: typical });
    const typicalId = created.json.design.id as string;
    const times: number[] = [];
    const rand = mulberry32(7);
    for (let i = 0; i < ROUND_TRIPS + 5; i++) {
      const y = 0.5 + rand() * 3;
      const draft: Design = { ...typical, lines: [...typical.lines, [[0.5, y], [3.5, y + 0.2]]] };
      const t0 = performance.now();
      const res = await client.send('POST', `/api/designs/${typicalId}/check`, { design: draft });
      const t = performance.now() - t0;
      if (res.status !== 200) throw new Error(`bench/workbench: check answered ${res.status}`);
      if (i >= 5) times.push(t); // the first rounds warm the worker pool and JIT
    }
    times.sort((a, b) => a - b);

    // 1b. One burst of edits as the workbench sends it: before issue 11, a save (PUT) and a check of the same drawing
    // (POST …/check), each planning it (the save's figures in the background lane); now one PUT ?check=1 that plans
    // once. Wall time until the card has its figures, alternating the two ways round by round.
    const burst = { twoRequests: [] as number[], oneRequest: [] as number[] };
    let version = created.json.design.version as number;
    for (let i = 0; i < ROUND_TRIPS + 5; i++) {
      const y = 0.5 + rand() * 3;
      const draft: Design = { ...typical, lines: [...typical.lines, [[0.5, y], [3.5, y + 0.2]]] };
      const old = i % 2 === 0;
      const t0 = performance.now();
      const saved = await client.send('PUT', `/api/designs/${typicalId}${old ? '' : '?check=1'}`, { baseVersion: version, design: draft });
      if (saved.status !== 200) throw new Error(`bench/workbench: save answered ${saved.status}`);
      if (old) {
        const checked = await client.send('POST', `/api/designs/${typicalId}/check`, { design: draft });
        if (checked.status !== 200) throw new Error(`bench/workbench: check answered ${checked.status}`);
      } else if (saved.json.check === null) throw new Error('bench/workbench: the save answered without its check');
      const t = performance.now() - t0;
      version = saved.json.design.version as number;
      if (i >= 5) (old ? burst.twoRequests : burst.oneRequest).push(t);
    }
    burst.twoRequests.sort((a, b) => a - b);
    burst.oneRequest.sort((a, b) => a - b);

    // 2. Pan and zoom frame time with 5,000 strokes.
    const dense = await client.send('POST', '/api/designs', { title: 'Dense block', design: denseDesign(42) });
    if (dense.status !== 201) throw new Error(`bench/workbench: creating the dense design answered ${dense.status}`);
    const profile = mkdtempSync(path.join(os.tmpdir(), 'threadway-bench-chromium-'));
    cleanups.push(() => rmSync(profile, { recursive: true, force: true }));
    const context = await chromium.launchPersistentContext(profile, { executablePath: process.env['CHROMIUM_PATH'] || '/usr/bin/chromium', headless: true, args: CHROMIUM_ARGS, viewport: { width: 1440, height: 960 } });
    cleanups.push(() => context.close());
    await context.addCookies([{ name: 'tw_session', value: client.cookie.split('=')[1]!, url: base }]);
    const page = context.pages()[0] ?? (await context.newPage());
    await page.goto(`${base}/designs/${dense.json.design.id}`);
    const canvas = page.locator('[data-testid="block-canvas"] canvas').first();
    await canvas.waitFor({ timeout: 60_000 });
    await page.waitForTimeout(1500);
    const box = (await canvas.boundingBox())!;
    // Passed as source text: tsx would wrap named inner functions in a `__name` helper the page does not have.
    const profiling = process.env['BENCH_PROFILE'] === '1';
    const cdp = profiling ? await context.newCDPSession(page) : null;
    if (cdp) {
      await cdp.send('Profiler.enable');
      await cdp.send('Profiler.start');
    }
    const frames = (await page.evaluate(`(${PAN_ZOOM_SCRIPT})(${box.x + box.width / 2}, ${box.y + box.height / 2}, 6000)`)) as number[];
    if (cdp) {
      const { profile } = (await cdp.send('Profiler.stop')) as { profile: { nodes: { id: number; callFrame: { functionName: string; url: string; lineNumber: number } }[]; samples: number[] } };
      const byNode = new Map(profile.nodes.map((n) => [n.id, n]));
      const self = new Map<string, number>();
      for (const id of profile.samples) {
        const f = byNode.get(id)!.callFrame;
        const key = `${f.functionName || '(anonymous)'} ${f.url.split('/').pop()}:${f.lineNumber}`;
        self.set(key, (self.get(key) ?? 0) + 1);
      }
      console.log([...self].sort((a, b) => b[1] - a[1]).slice(0, 25).map(([k, v]) => `${v}\t${k}`).join('\n'));
    }
    const sortedFrames = [...frames].sort((a, b) => a - b);
    const mean = frames.reduce((s, v) => s + v, 0) / frames.length;

    console.log('\n## Workbench (bench/workbench.bench.ts)\n');
    console.log('| case | figure | target |');
    console.log('| --- | --- | --- |');
    console.log(`| pan + zoom, ${STROKES.toLocaleString('en')} strokes, headless Chromium (software raster) | ${(1000 / mean).toFixed(1)} fps (mean frame ${mean.toFixed(1)} ms, p95 ${percentile(sortedFrames, 95).toFixed(1)} ms, ${frames.length} frames) | ≥ 50 fps |`);
    console.log(`| edit → route check round trip, 12 in nine-patch + 37 lines (${times.length} rounds) | p50 ${percentile(times, 50).toFixed(1)} ms, p95 ${percentile(times, 95).toFixed(1)} ms | p95 < 150 ms |`);
    console.log(`| edit burst → saved and checked, 2 requests: PUT + POST check (${burst.twoRequests.length} rounds) | p50 ${percentile(burst.twoRequests, 50).toFixed(1)} ms, p95 ${percentile(burst.twoRequests, 95).toFixed(1)} ms | — |`);
    console.log(`| edit burst → saved and checked, 1 request: PUT ?check=1 (${burst.oneRequest.length} rounds) | p50 ${percentile(burst.oneRequest, 50).toFixed(1)} ms, p95 ${percentile(burst.oneRequest, 95).toFixed(1)} ms | p95 < 150 ms |`);
  } finally {
    await stack.close();
  }
}

await main();
