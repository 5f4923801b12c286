// With DEV_TOOLS=false (a production start), the dev mail page must not exist. Starts a second
// instance of the built server on a free port against the same database.
import { spawn, type ChildProcess } from 'node:child_process';
import { createServer } from 'node:net';
import path from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { testEnv } from '../helpers/env.ts';

let server: ChildProcess | undefined;
let url = '';

function freePort(): Promise<number> {
  return new Promise((resolve, reject) => {
    const s = createServer();
    s.once('error', reject);
    s.listen(0, '127.0.0.1', () => {
      const address = s.address();
      s.close(() => (typeof address === 'object' && address ? resolve(address.port) : reject(new Error('no port'))));
    });
  });
}

beforeAll(async () => {
  const port = await freePort();
  url = `http://127.0.0.1:${port}`;
  const entry = path.resolve(import.meta.dirname, '../../dist/server/entry.mjs');
  server = spawn(process.execPath, [entry], {
    env: { ...process.env, DEV_TOOLS: 'false', HOST: '127.0.0.1', PORT: String(port), DATABASE_URL: testEnv.databaseUrl, PUBLIC_ORIGIN: url },
    stdio: 'ignore',
  });
  for (let i = 0; i < 200; i += 1) {
    if (await fetch(url).then(() => true, () => false)) return;
    await new Promise((r) => setTimeout(r, 100));
  }
  throw new Error('tests/api/devToolsOff: the second server did not start');
});
afterAll(() => {
  server?.kill('SIGTERM');
});

describe('DEV_TOOLS=false', () => {
  it('answers 404 for /dev/mail, and serves everything else', async () => {
    const res = await fetch(`${url}/dev/mail`);
    expect(res.status).toBe(404);
    expect(await res.text()).toContain('We could not find that page');
    expect((await fetch(`${url}/`)).status).toBe(200);
    expect((await fetch(`${url}/api/session`)).status).toBe(401);
  });
});
