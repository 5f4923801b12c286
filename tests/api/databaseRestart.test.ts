// Fault test (issue 10, defect 2): PostgreSQL stops and starts while the app serves. The app must stay up,
// answer 503 database_unavailable (with Retry-After) meanwhile — never 500 —, recover by itself once the
// database is back, and keep every save it confirmed with a 200. Runs on a second app instance with its own
// cluster (tests/helpers/throwawayApp.ts) so the shared test server is never disturbed. The cluster keeps
// fsync on: a confirmed commit must survive even the crash-like 'immediate' stop.
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { TestClient, type ApiResponse } from '../helpers/client.ts';
import { connectDatabase } from '@db/connect.ts';
import { createAccount } from '../helpers/accounts.ts';
import { startThrowawayApp, type ThrowawayApp } from '../helpers/throwawayApp.ts';

type Pt = [number, number];
const design = (n: number) => ({
  version: 1,
  units: 'in',
  width: 12,
  height: 12,
  seams: [[[6, 0], [6, 12]]],
  // n + 1 horizontal quilting lines, 0.05 in apart: each save adds one, so a save's content is its line count.
  lines: Array.from({ length: n + 1 }, (_, i): Pt[] => [[0, 0.5 + i * 0.05], [12, 0.5 + i * 0.05]]),
});

let app: ThrowawayApp;
let quilter: TestClient;
beforeAll(async () => {
  app = await startThrowawayApp();
  // Sign-up is confirmed by e-mail; this instance sends none, so the account is written to its database.
  const db = connectDatabase(app.databaseUrl, 1);
  try {
    quilter = (await createAccount({ email: 'restart@guild.test', displayName: 'Restart Quilter', target: { appUrl: app.url, db } })).client;
  } finally {
    await db.destroy();
  }
}, 180_000);
afterAll(async () => {
  await app?.close();
});

const sleep = (ms: number) => new Promise((r) => setTimeout(r, ms));

/** Every answer the app gave during the test, to prove none was a 500. */
const statuses: number[] = [];
async function send(method: 'GET' | 'POST' | 'PUT', path: string, body?: unknown): Promise<ApiResponse | null> {
  try {
    const res = await quilter.request(method, path, body === undefined ? {} : { body });
    statuses.push(res.status);
    return res;
  } catch {
    return null; // the app did not answer at all (it would have died): caught by the process checks below
  }
}

async function waitFor(what: string, probe: () => Promise<boolean>, timeoutMs = 60_000): Promise<void> {
  const deadline = Date.now() + timeoutMs;
  while (!(await probe())) {
    if (Date.now() > deadline) throw new Error(`timed out waiting for ${what}\n${app.stderr().slice(-2000)}`);
    await sleep(100);
  }
}

/**
 * Saves one design over and over like an autosaving workbench: a confirmed save (200) is recorded as committed;
 * a 503 or no answer keeps the edit and sends it again (same baseVersion); a 409 means an earlier attempt did
 * commit before the connection dropped, so it reloads and goes on.
 */
function autosaver(id: string, version: number, lines: number) {
  const committed = new Map<number, number>(); // version → line count confirmed by a 200
  let stop = false;
  let unavailable = 0;
  const done = (async () => {
    while (!stop) {
      const next = lines + 1;
      const res = await send('PUT', `/api/designs/${id}`, { baseVersion: version, design: design(next) });
      if (res?.status === 200) {
        version = res.body.design.version;
        lines = next;
        committed.set(version, res.body.design.design.lines.length);
      } else if (res?.status === 409) {
        version = res.body.design.version;
        lines = res.body.design.design.lines.length - 1;
      } else if (res?.status === 503) {
        unavailable += 1;
        await sleep(50);
      } else if (res) {
        throw new Error(`save answered ${res.status}: ${res.text}`);
      } else {
        await sleep(50);
      }
    }
  })();
  return { committed, stop: async () => ((stop = true), await done), unavailable: () => unavailable };
}

describe('a PostgreSQL restart while the app serves', () => {
  for (const mode of ['fast', 'immediate'] as const) {
    it(`stays up, answers 503 while the database is down (${mode} stop), recovers, and loses no confirmed save`, async () => {
      const created = await send('POST', '/api/designs', { title: `Restart ${mode}`, design: design(0) });
      expect(created?.status, created?.text).toBe(201);
      const id: string = created!.body.design.id;
      const saver = autosaver(id, 1, 0);
      await waitFor('a few confirmed saves', async () => saver.committed.size >= 3);

      app.stopDatabase(mode);
      // API: JSON 503 with the code and a Retry-After, for reads and writes alike.
      let down: ApiResponse | null = null;
      await waitFor('a 503 from the API', async () => {
        down = await send('GET', '/api/designs');
        return down?.status === 503;
      });
      expect(down!.body.error.code).toBe('database_unavailable');
      expect(down!.body.error.message).toMatch(/database is not answering/);
      expect(Number(down!.headers.get('retry-after'))).toBeGreaterThan(0);
      // Pages: a plain 503 page (no layout, no session lookup), also with Retry-After.
      const page = await quilter.get('/designs');
      statuses.push(page.status);
      expect(page.status).toBe(503);
      expect(page.headers.get('content-type')).toMatch(/text\/html/);
      expect(page.text).toContain('Threadway will be back shortly');
      expect(page.headers.get('retry-after')).not.toBeNull();
      const anonymousPage = await new TestClient(app.url).get('/templates');
      expect([503, 200]).toContain(anonymousPage.status); // 200 only if the page needs no database
      statuses.push(anonymousPage.status);
      await sleep(1_500); // the autosaver keeps trying all this while
      expect(saver.unavailable()).toBeGreaterThan(0);
      expect(app.process.exitCode, app.stderr().slice(-2000)).toBeNull();

      app.startDatabase();
      await waitFor('recovery (200 from the API)', async () => (await send('GET', '/api/designs'))?.status === 200);
      const before = saver.committed.size;
      await waitFor('saves going through again', async () => saver.committed.size >= before + 3);
      await saver.stop();

      expect(app.process.exitCode, app.stderr().slice(-2000)).toBeNull();
      expect(app.process.signalCode).toBeNull();
      expect(statuses.filter((s) => s >= 500 && s !== 503)).toEqual([]);
      // Every save the app confirmed is in the history with the content it confirmed.
      for (const [version, lineCount] of saver.committed) {
        const v = await send('GET', `/api/designs/${id}/versions/${version}`);
        expect(v?.status, `version ${version}`).toBe(200);
        expect(v!.body.version.design.lines).toHaveLength(lineCount);
      }
      const latest = Math.max(...saver.committed.keys());
      const current = await send('GET', `/api/designs/${id}`);
      expect(current!.body.design.version).toBeGreaterThanOrEqual(latest);
    }, 180_000);
  }
});
