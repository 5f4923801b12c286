// Building and serving the Astro app (Node standalone output in dist/).
import { spawn, spawnSync } from 'node:child_process';
import { existsSync, readdirSync, statSync, writeFileSync } from 'node:fs';
import path from 'node:path';
import { ROOT, fail, log } from './system.mjs';
import { ENGINE_WORKER_OUT, PLAN_WORKER_OUT, bundleEngineWorker } from './engineWorker.mjs';

const SOURCES = ['src', 'shared', 'db', 'public', 'astro.config.mjs', 'package-lock.json', 'tsconfig.json'];
const STAMP = path.join(ROOT, 'dist', '.threadway-build');

function newestMtime(entry) {
  if (!existsSync(entry)) return 0;
  const stat = statSync(entry);
  if (!stat.isDirectory()) return stat.mtimeMs;
  return readdirSync(entry).reduce((max, name) => Math.max(max, newestMtime(path.join(entry, name))), stat.mtimeMs);
}

/** Runs `astro build` and bundles the engine worker, unless dist/ is newer than every source file (or `force`). */
export function buildApp({ force = false } = {}) {
  const newest = Math.max(...SOURCES.map((s) => newestMtime(path.join(ROOT, s))));
  if (!force && existsSync(STAMP) && existsSync(ENGINE_WORKER_OUT) && existsSync(PLAN_WORKER_OUT) && statSync(STAMP).mtimeMs >= newest) {
    log('app build is up to date.');
    return;
  }
  log('building the app (astro build)…');
  const started = Date.now();
  const r = spawnSync(process.execPath, [path.join(ROOT, 'node_modules', 'astro', 'astro.js'), 'build'], {
    cwd: ROOT,
    stdio: ['ignore', 'pipe', 'pipe'],
    encoding: 'utf8',
    env: { ...process.env, ASTRO_TELEMETRY_DISABLED: '1' },
  });
  if (r.status !== 0) fail(`astro build failed:\n${r.stdout}\n${r.stderr}`);
  bundleEngineWorker();
  writeFileSync(STAMP, new Date().toISOString());
  log(`built in ${((Date.now() - started) / 1000).toFixed(1)} s.`);
}

/** Serves the build through scripts/serve.mjs (which fixes the client address) on 127.0.0.1:`port`; returns the child process. */
export function serveApp({ port, env, quiet = false }) {
  const child = spawn(process.execPath, [path.join(ROOT, 'scripts', 'serve.mjs')], {
    cwd: ROOT,
    env: { ...process.env, ...env, HOST: '127.0.0.1', PORT: String(port), ASTRO_TELEMETRY_DISABLED: '1' },
    stdio: quiet ? ['ignore', 'ignore', 'pipe'] : ['ignore', 'inherit', 'inherit'],
  });
  if (quiet) child.stderr.on('data', (d) => process.stderr.write(d));
  return child;
}

/**
 * Starts one planning worker process (scripts/plan-worker.mjs → dist/jobs/planWorker.mjs) against `env.DATABASE_URL`;
 * returns the child process. `threads`: its engine threads (default: the machine's cores).
 */
export function startPlanWorkerProcess({ env, threads, quiet = false }) {
  const child = spawn(process.execPath, [path.join(ROOT, 'scripts', 'plan-worker.mjs')], {
    cwd: ROOT,
    env: { ...process.env, ...env, ...(threads ? { PLAN_WORKER_THREADS: String(threads) } : {}) },
    stdio: quiet ? ['ignore', 'ignore', 'pipe'] : ['ignore', 'inherit', 'inherit'],
  });
  if (quiet) child.stderr.on('data', (d) => process.stderr.write(d));
  return child;
}

/** Runs a TypeScript entry (migrations, seed) through tsx; exits the process when it fails. */
export function runTs(file, env, args = []) {
  const r = spawnSync(process.execPath, [path.join(ROOT, 'node_modules', 'tsx', 'dist', 'cli.mjs'), path.join(ROOT, file), ...args], {
    cwd: ROOT,
    stdio: 'inherit',
    env: { ...process.env, ...env },
  });
  if (r.status !== 0) fail(`${file} failed (exit ${r.status}).`);
}
