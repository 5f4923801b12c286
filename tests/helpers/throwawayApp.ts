// A second app instance on its own throwaway PostgreSQL cluster, for tests that must disturb the database
// (stop it, restart it) without touching the shared server that scripts/test.mjs runs for every other file.
// It serves the same build (dist/, built by scripts/test.mjs before the tests start).
import type { ChildProcess } from 'node:child_process';
import { chmodSync, mkdirSync, mkdtempSync, rmSync } from 'node:fs';
import path from 'node:path';
import { databaseUrl, ensureDatabase, initCluster, startCluster, stopCluster } from '../../scripts/lib/postgres.mjs';
import { findFreePort, waitForHttp } from '../../scripts/lib/ports.mjs';
import { runTs, serveApp } from '../../scripts/lib/app.mjs';

export interface ThrowawayApp {
  readonly url: string;
  readonly databaseUrl: string;
  readonly process: ChildProcess;
  /** Everything the app wrote to stderr so far. */
  stderr(): string;
  /** pg_ctl stop: 'fast' is an operator's restart, 'immediate' is a crash (no shutdown checkpoint). */
  stopDatabase(mode: 'fast' | 'immediate'): void;
  startDatabase(): void;
  close(): Promise<void>;
}

/**
 * Starts a cluster (fsync on unless `fast`: a crash must not lose committed work), migrates it, and serves
 * the built app against it on a free port. `env` adds settings for the app.
 */
export async function startThrowawayApp(opts: { fast?: boolean; env?: Record<string, string> } = {}): Promise<ThrowawayApp> {
  const pgBin = process.env['PG_BIN'];
  if (!pgBin) throw new Error('tests/helpers/throwawayApp: PG_BIN is not set; run the tests through `npm test`');
  const scratch = mkdtempSync('/tmp/threadway-throwaway-');
  chmodSync(scratch, 0o755);
  const pgDir = path.join(scratch, 'pg');
  const mailDir = path.join(scratch, 'mail');
  mkdirSync(mailDir);
  const pgPort = await findFreePort();
  initCluster(pgBin, pgDir, pgPort, { fast: opts.fast ?? false });
  startCluster(pgBin, pgDir);
  const dbUrl = databaseUrl(pgPort, 'threadway');
  try {
    ensureDatabase(pgBin, pgPort, 'threadway');
    runTs('db/migrate.ts', { DATABASE_URL: dbUrl });
  } catch (error) {
    stopCluster(pgBin, pgDir, 'immediate');
    throw error;
  }
  const appPort = await findFreePort();
  const url = `http://127.0.0.1:${appPort}`;
  // Mail goes nowhere (no sink on this port): these tests send none.
  const child = serveApp({
    port: appPort,
    env: { DATABASE_URL: dbUrl, MAIL_CAPTURE_DIR: mailDir, SMTP_PORT: String(await findFreePort()), PUBLIC_ORIGIN: url, DEV_TOOLS: 'false', ...opts.env },
    quiet: true,
  });
  let stderr = '';
  child.stderr?.on('data', (d: Buffer) => (stderr += d.toString('utf8')));
  await waitForHttp(url);
  return {
    url,
    databaseUrl: dbUrl,
    process: child,
    stderr: () => stderr,
    stopDatabase: (mode) => stopCluster(pgBin, pgDir, mode),
    startDatabase: () => void startCluster(pgBin, pgDir),
    close: async () => {
      if (child.exitCode === null && child.signalCode === null) {
        const exited = new Promise((resolve) => child.once('exit', resolve));
        child.kill('SIGTERM');
        await Promise.race([exited, new Promise((r) => setTimeout(r, 5_000))]);
        if (child.exitCode === null && child.signalCode === null) child.kill('SIGKILL');
      }
      stopCluster(pgBin, pgDir, 'immediate');
      rmSync(scratch, { recursive: true, force: true });
    },
  };
}
