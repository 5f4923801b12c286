// A second instance of the built app on a free port, against the same database and fakes, with some settings
// changed (e.g. DEV_TOOLS=false, or TRUSTED_PROXIES so a test can act as the reverse proxy in front of it).
// It is served the way npm start and npm test serve the app: through scripts/serve.mjs.
import { spawn, type ChildProcess } from 'node:child_process';
import { createServer } from 'node:net';
import path from 'node:path';
import { testEnv } from './env.ts';

export interface ExtraServer {
  readonly url: string;
  stop(): Promise<void>;
}

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

/** Starts scripts/serve.mjs with `env` over the test run's own environment; resolves once it answers. */
export async function startExtraServer(env: Record<string, string>): Promise<ExtraServer> {
  const port = await freePort();
  const url = `http://127.0.0.1:${port}`;
  const serve = path.resolve(import.meta.dirname, '../../scripts/serve.mjs');
  const child: ChildProcess = spawn(process.execPath, [serve], {
    env: { ...process.env, DATABASE_URL: testEnv.databaseUrl, PUBLIC_ORIGIN: url, ...env, HOST: '127.0.0.1', PORT: String(port), ASTRO_TELEMETRY_DISABLED: '1' },
    stdio: ['ignore', 'ignore', 'inherit'],
  });
  const stop = () =>
    new Promise<void>((resolve) => {
      if (child.exitCode !== null || child.signalCode !== null) return resolve();
      child.once('exit', () => resolve());
      child.kill('SIGTERM');
    });
  for (let i = 0; i < 300; i += 1) {
    if (child.exitCode !== null) throw new Error(`tests/helpers/extraServer: the server exited (code ${child.exitCode})`);
    if (await fetch(url).then(() => true, () => false)) return { url, stop };
    await new Promise((r) => setTimeout(r, 100));
  }
  await stop();
  throw new Error('tests/helpers/extraServer: the second server did not start');
}
