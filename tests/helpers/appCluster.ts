// Several app instances and planning workers against one throwaway PostgreSQL cluster, behind the small balancer
// of scripts/lib/balancer.mjs: the way README's "More than one machine" runs Threadway, on loopback. The shared
// server of scripts/test.mjs is left alone (its own planning worker would otherwise take these jobs).
import type { ChildProcess } from 'node:child_process';
import { chmodSync, mkdirSync, mkdtempSync, rmSync } from 'node:fs';
import path from 'node:path';
import { databaseUrl, ensureDatabase, initCluster, startCluster, stopCluster } from '../../scripts/lib/postgres.mjs';
import { findFreePort, waitForHttp } from '../../scripts/lib/ports.mjs';
import { runTs, serveApp, startPlanWorkerProcess } from '../../scripts/lib/app.mjs';
import { startBalancer } from '../../scripts/lib/balancer.mjs';

export interface AppCluster {
  /** The balancer's address: what a browser would use. */
  readonly url: string;
  /** Each app instance's own address (a test may talk to one directly). */
  readonly instances: readonly string[];
  readonly databaseUrl: string;
  /** Requests each instance answered through the balancer. */
  served(): readonly number[];
  /** Starts one more planning worker process; returns its index. */
  startWorker(): number;
  /** Kills worker `index` at once (SIGKILL: no chance to finish or hand back its job). */
  killWorker(index: number): Promise<void>;
  close(): Promise<void>;
}

async function stopProcess(child: ChildProcess, signal: NodeJS.Signals = 'SIGTERM'): Promise<void> {
  if (child.exitCode !== null || child.signalCode !== null) return;
  const exited = new Promise((resolve) => child.once('exit', resolve));
  child.kill(signal);
  await Promise.race([exited, new Promise((r) => setTimeout(r, 5_000))]);
  if (child.exitCode === null && child.signalCode === null) child.kill('SIGKILL');
}

/**
 * Starts a throwaway cluster (fsync off), migrates it, starts `instances` app instances that trust the balancer
 * (TRUSTED_PROXIES=127.0.0.1, PUBLIC_ORIGIN = the balancer), `workers` planning workers with `workerThreads`
 * engine threads each, and the balancer in front of the instances.
 */
export async function startAppCluster(opts: { instances: number; workers: number; workerThreads?: number; env?: Record<string, string> }): Promise<AppCluster> {
  const pgBin = process.env['PG_BIN'];
  if (!pgBin) throw new Error('tests/helpers/appCluster: PG_BIN is not set; run the tests through `npm test`');
  const scratch = mkdtempSync('/tmp/threadway-cluster-');
  chmodSync(scratch, 0o755);
  const pgDir = path.join(scratch, 'pg');
  const mailDir = path.join(scratch, 'mail');
  mkdirSync(mailDir);
  const pgPort = await findFreePort();
  initCluster(pgBin, pgDir, pgPort, { fast: true });
  startCluster(pgBin, pgDir);
  const dbUrl = databaseUrl(pgPort, 'threadway');
  const children: ChildProcess[] = [];
  const workers: ChildProcess[] = [];
  let balancer: Awaited<ReturnType<typeof startBalancer>> | null = null;
  const close = async (): Promise<void> => {
    await balancer?.close();
    await Promise.all([...children, ...workers].map((c) => stopProcess(c)));
    stopCluster(pgBin, pgDir, 'immediate');
    rmSync(scratch, { recursive: true, force: true });
  };
  try {
    ensureDatabase(pgBin, pgPort, 'threadway');
    runTs('db/migrate.ts', { DATABASE_URL: dbUrl });
    const balancerPort = await findFreePort();
    const publicUrl = `http://127.0.0.1:${balancerPort}`;
    // Mail goes to a port nobody listens on: these tests send none. Files: the test run's S3 fake (process.env).
    const env = { DATABASE_URL: dbUrl, MAIL_CAPTURE_DIR: mailDir, SMTP_PORT: String(await findFreePort()), PUBLIC_ORIGIN: publicUrl, TRUSTED_PROXIES: '127.0.0.1', DEV_TOOLS: 'false', ...opts.env };
    const urls: string[] = [];
    for (let i = 0; i < opts.instances; i++) {
      const port = await findFreePort();
      urls.push(`http://127.0.0.1:${port}`);
      children.push(serveApp({ port, env, quiet: true }));
    }
    await Promise.all(urls.map((u) => waitForHttp(u)));
    const startWorker = (): number => {
      workers.push(startPlanWorkerProcess({ env, threads: opts.workerThreads ?? 1, quiet: true }));
      return workers.length - 1;
    };
    for (let i = 0; i < opts.workers; i++) startWorker();
    balancer = await startBalancer({ upstreams: urls, port: balancerPort });
    const started = balancer;
    return {
      url: started.url,
      instances: urls,
      databaseUrl: dbUrl,
      served: () => [...started.served],
      startWorker,
      killWorker: (index) => stopProcess(workers[index]!, 'SIGKILL'),
      close,
    };
  } catch (error) {
    await close();
    throw error;
  }
}
