// `npm test`: the type check (`npm run check`) and the linter (`npm run lint`), then the same bootstrap as
// `npm start` on a throwaway cluster (temporary folder, free port, fsync off), then every test (unit, API against
// the real database, browser). Torn down even on failure. Extra arguments go to vitest, e.g.
// `npm test -- tests/api/auth.test.ts`; with them, the check and the linter are left out (a focused run).
import { mkdtempSync, mkdirSync, readFileSync, rmSync, existsSync, chmodSync } from 'node:fs';
import { spawn } from 'node:child_process';
import path from 'node:path';
import { ROOT, ensureDebianPackages, ensureNodeModules, ensurePostgres, log } from './lib/system.mjs';
import { databaseUrl, ensureDatabase, initCluster, startCluster, stopCluster } from './lib/postgres.mjs';
import { findFreePort, waitForHttp } from './lib/ports.mjs';
import { buildApp, runTs, serveApp, startPlanWorkerProcess } from './lib/app.mjs';
import { startMailSink } from './lib/mailSink.mjs';
import { startS3Fake } from './lib/s3Fake.mjs';
import { startPaymentsFake } from './lib/paymentsFake.mjs';

ensureNodeModules();
const pgBin = ensurePostgres();
// Browser tests drive Debian's chromium; reference tests use Debian's networkx and shapely, and an exact rural
// postman model solved by Debian's CBC through python3-pulp.
ensureDebianPackages(['chromium', 'fonts-liberation', 'python3-networkx', 'python3-shapely', 'python3-pulp', 'coinor-cbc', 'poppler-utils']);

const scratch = mkdtempSync('/tmp/threadway-test-');
chmodSync(scratch, 0o755);
const pgDir = path.join(scratch, 'pg');
const cleanups = [];
let exitCode = 1;
let tornDown = false;
async function tearDown() {
  if (tornDown) return;
  tornDown = true;
  for (const cleanup of cleanups.reverse()) {
    try {
      await cleanup();
    } catch (error) {
      console.error('cleanup failed:', error);
    }
  }
  rmSync(scratch, { recursive: true, force: true });
}
for (const signal of ['SIGINT', 'SIGTERM']) {
  process.on(signal, async () => {
    await tearDown();
    process.exit(130);
  });
}
/** Runs `npm run <script>` with its output kept; resolves to whether it passed, how long it took and what it printed. */
function runNpmScript(script) {
  return new Promise((resolve) => {
    const child = spawn('npm', ['run', '--silent', script], { cwd: ROOT, stdio: ['ignore', 'pipe', 'pipe'], env: { ...process.env, FORCE_COLOR: '1' } });
    const output = [];
    const started = Date.now();
    child.stdout.on('data', (chunk) => output.push(chunk));
    child.stderr.on('data', (chunk) => output.push(chunk));
    // 'close', not 'exit': the output pipes are drained by then.
    child.on('close', (code, signal) => resolve({ script, passed: code === 0 && !signal, seconds: (Date.now() - started) / 1000, output: Buffer.concat(output).toString() }));
    child.on('error', (error) => resolve({ script, passed: false, seconds: 0, output: String(error) }));
  });
}

// The type check and the linter first, side by side (each is single-threaded): they need no services, and their
// verdicts head the summary. A failure fails the run but does not stop the tests, so one run shows everything
// that is wrong.
const focused = process.argv.length > 2;
const gates = [];
if (!focused) {
  log('npm run check and npm run lint');
  for (const gate of await Promise.all(['check', 'lint'].map(runNpmScript))) {
    // A passing run's output (astro check's hints) is left out; a failing one is shown whole.
    if (!gate.passed) process.stdout.write(gate.output);
    log(`npm run ${gate.script}: ${gate.passed ? 'passed' : 'FAILED'} in ${gate.seconds.toFixed(0)} s`);
    gates.push(gate);
  }
}
const gateLine = focused
  ? 'check and lint skipped (a focused run)'
  : gates.map((g) => `${g.script} ${g.passed ? 'passed' : 'FAILED'}`).join(', ');

try {
  const pgPort = await findFreePort();
  initCluster(pgBin, pgDir, pgPort, { fast: true });
  startCluster(pgBin, pgDir);
  cleanups.push(() => stopCluster(pgBin, pgDir, 'immediate'));
  ensureDatabase(pgBin, pgPort, 'threadway');
  const mailDir = path.join(scratch, 'mail');
  mkdirSync(mailDir);
  const env = { DATABASE_URL: databaseUrl(pgPort, 'threadway'), DEV_TOOLS: 'true', MAIL_CAPTURE_DIR: mailDir, RATE_LIMIT_SCALE: '1' };
  runTs('db/migrate.ts', env);
  runTs('scripts/seed/index.ts', env);
  const mail = await startMailSink({ dir: mailDir });
  cleanups.push(() => mail.close());
  const s3Dir = path.join(scratch, 's3');
  const s3 = await startS3Fake({ dir: s3Dir });
  cleanups.push(() => s3.close());
  Object.assign(env, s3.env);
  buildApp({ force: process.env.CI === 'true' });
  const appPort = await findFreePort();
  const appUrl = `http://127.0.0.1:${appPort}`;
  const payments = await startPaymentsFake({ webhookUrl: `${appUrl}/api/payments/webhook` });
  cleanups.push(() => payments.close());
  Object.assign(env, payments.env);
  const server = serveApp({ port: appPort, env: { ...env, SMTP_PORT: String(mail.port), PUBLIC_ORIGIN: appUrl }, quiet: true });
  cleanups.push(() => server.kill('SIGTERM'));
  // One planning worker process takes whole-quilt plans from the job queue, as under npm start.
  const planWorker = startPlanWorkerProcess({ env, quiet: true });
  cleanups.push(() => planWorker.kill('SIGTERM'));
  await waitForHttp(appUrl);
  log(`app under test at ${appUrl}; database ${env.DATABASE_URL}`);

  const outputDir = path.join(ROOT, 'test-output');
  rmSync(outputDir, { recursive: true, force: true });
  mkdirSync(outputDir, { recursive: true });
  const vitestEnv = {
    ...process.env,
    ...env,
    SMTP_PORT: String(mail.port),
    APP_URL: appUrl,
    TEST_OUTPUT_DIR: outputDir,
    CHROMIUM_PATH: '/usr/bin/chromium',
    PG_BIN: pgBin,
    // Where the S3 fake keeps objects as files: tests age an object (its mtime is its LastModified).
    S3_FAKE_DIR: s3Dir,
  };
  // Two Vitest runs, `unit` then `app`: the CPU-heavy unit files (property tests, outside solvers) never compete
  // with the browser tests for the two cores, and a failure in one run never hides the other's results.
  const totals = { passed: 0, failed: 0, skipped: 0, failedFiles: 0 };
  exitCode = 0;
  for (const project of ['unit', 'app']) {
    const jsonReport = path.join(outputDir, `vitest-${project}.json`);
    const args = [
      path.join(ROOT, 'node_modules', 'vitest', 'vitest.mjs'), 'run', '--project', project, '--passWithNoTests',
      '--reporter=default', '--reporter=json', `--outputFile.json=${jsonReport}`, ...process.argv.slice(2),
    ];
    const code = await new Promise((resolve) => {
      const child = spawn(process.execPath, args, { cwd: ROOT, env: vitestEnv, stdio: 'inherit' });
      child.on('exit', (c, signal) => resolve(c ?? (signal ? 1 : 0)));
    });
    if (code !== 0) exitCode = 1;
    if (existsSync(jsonReport)) {
      const report = JSON.parse(readFileSync(jsonReport, 'utf8'));
      totals.passed += report.numPassedTests;
      totals.failed += report.numFailedTests;
      totals.skipped += report.numPendingTests + report.numTodoTests;
      // A file that fails before its tests run (a beforeAll) counts no failed test: report it too. Files, not
      // numFailedTestSuites: that one counts every failing describe block as well.
      totals.failedFiles += report.testResults.filter((file) => file.status === 'failed').length;
    } else {
      exitCode = 1;
    }
  }
  if (gates.some((g) => !g.passed)) exitCode = 1;
  console.log(`\n${gateLine}; ${totals.passed} passed, ${totals.failed} failed, ${totals.skipped} skipped; ${totals.failedFiles} test files failed`);
} catch (error) {
  console.error(error);
  exitCode = 1;
} finally {
  await tearDown();
}
process.exit(exitCode);
