// What every bench that serves the app starts first, on loopback and in a throwaway folder: a PostgreSQL cluster
// (fsync off) with the migrations applied, the mail sink and the object store's fake, and a built app. One place, so
// the benches start the same services npm start does and differ only in what they serve and measure.
import { chmodSync, mkdirSync, mkdtempSync, rmSync } from 'node:fs';
import path from 'node:path';
import { ensurePostgres } from '../scripts/lib/system.mjs';
import { databaseUrl, ensureDatabase, initCluster, startCluster, stopCluster } from '../scripts/lib/postgres.mjs';
import { findFreePort } from '../scripts/lib/ports.mjs';
import { buildApp, runTs } from '../scripts/lib/app.mjs';
import { startMailSink } from '../scripts/lib/mailSink.mjs';
import { startS3Fake } from '../scripts/lib/s3Fake.mjs';

export interface BenchStack {
  /** The throwaway folder (removed by close). */
  readonly scratch: string;
  /** Where the mail sink writes each message as JSON. */
  readonly mailDir: string;
  /** Settings for app instances and planning workers: database, mail capture and sink port, object store, rate-limit scale. */
  readonly env: Record<string, string>;
  readonly databaseUrl: string;
  /** Run at close, last added first (app instances, workers, browsers the bench starts). */
  readonly cleanups: (() => unknown)[];
  /** Runs the cleanups (a failing one is reported, the rest still run), stops the services, removes the folder. */
  close(): Promise<void>;
}

export async function startBenchStack(opts: { rateLimitScale: string; name: string }): Promise<BenchStack> {
  const pgBin = ensurePostgres();
  const scratch = mkdtempSync(`/tmp/threadway-bench-${opts.name}-`);
  chmodSync(scratch, 0o755);
  const cleanups: (() => unknown)[] = [];
  const close = async (): Promise<void> => {
    for (const c of cleanups.reverse()) {
      try {
        await c();
      } catch (error) {
        console.error(`bench/${opts.name}: cleanup failed:`, error);
      }
    }
    rmSync(scratch, { recursive: true, force: true });
  };
  try {
    const pgPort = await findFreePort();
    const pgDir = path.join(scratch, 'pg');
    initCluster(pgBin, pgDir, pgPort, { fast: true });
    startCluster(pgBin, pgDir);
    cleanups.push(() => stopCluster(pgBin, pgDir, 'immediate'));
    ensureDatabase(pgBin, pgPort, 'threadway');
    const url = databaseUrl(pgPort, 'threadway');
    const mailDir = path.join(scratch, 'mail');
    mkdirSync(mailDir);
    const env: Record<string, string> = { DATABASE_URL: url, MAIL_CAPTURE_DIR: mailDir, RATE_LIMIT_SCALE: opts.rateLimitScale };
    runTs('db/migrate.ts', env);
    const mail = await startMailSink({ dir: mailDir });
    cleanups.push(() => mail.close());
    env['SMTP_PORT'] = String(mail.port);
    // The object store's fake too, so the app's hourly photo sweep finds its bucket (as under npm start).
    const s3 = await startS3Fake({ dir: path.join(scratch, 's3') });
    cleanups.push(() => s3.close());
    Object.assign(env, s3.env);
    buildApp();
    return { scratch, mailDir, env, databaseUrl: url, cleanups, close };
  } catch (error) {
    await close();
    throw error;
  }
}
