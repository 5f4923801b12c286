// `npm start`: set up whatever is missing, then serve Threadway on http://127.0.0.1:4321.
// Reuses the cluster in .data/pg (or a folder under /var/tmp when root's postgres user cannot reach .data),
// migrates, seeds the demo (idempotent), runs the local fake mail server and serves the built app.
import { existsSync, mkdirSync, readFileSync, writeFileSync } from 'node:fs';
import path from 'node:path';
import { ROOT, ensureNodeModules, ensurePostgres, log } from './lib/system.mjs';
import { databaseUrl, ensureDatabase, initCluster, startCluster, stopCluster } from './lib/postgres.mjs';
import { findFreePort, waitForHttp } from './lib/ports.mjs';
import { buildApp, runTs, serveApp, startPlanWorkerProcess } from './lib/app.mjs';
import { startMailSink } from './lib/mailSink.mjs';
import { startS3Fake } from './lib/s3Fake.mjs';
import { startPaymentsFake } from './lib/paymentsFake.mjs';
import { clusterLocation } from './lib/cluster.mjs';
import { wantsDevTools } from './lib/devTools.mjs';
import { superviseApp } from './lib/supervise.mjs';

ensureNodeModules();
const pgBin = ensurePostgres();
const { dir: pgDir, portFile } = clusterLocation();
const port = existsSync(portFile) ? Number(readFileSync(portFile, 'utf8')) : await findFreePort(54329);
if (initCluster(pgBin, pgDir, port)) {
  writeFileSync(portFile, String(port));
  log(`created a PostgreSQL cluster in ${pgDir} (port ${port}).`);
}
startCluster(pgBin, pgDir);
ensureDatabase(pgBin, port, 'threadway');
const devTools = wantsDevTools(process.argv.slice(2), process.env);
const env = {
  DATABASE_URL: databaseUrl(port, 'threadway'),
  // The captured-mail page shows reset links: off unless asked for (`npm start -- --dev-tools`), admins only.
  DEV_TOOLS: devTools ? 'true' : 'false',
  MAIL_CAPTURE_DIR: path.join(ROOT, '.data', 'mail'),
};
runTs('db/migrate.ts', env);
runTs('scripts/seed/index.ts', env);
mkdirSync(env.MAIL_CAPTURE_DIR, { recursive: true });
const mail = await startMailSink({ dir: env.MAIL_CAPTURE_DIR, port: await findFreePort(2525) });
const s3 = await startS3Fake({ dir: path.join(ROOT, '.data', 's3') });
Object.assign(env, s3.env);
buildApp();

const appPort = Number(process.env.PORT ?? (await findFreePort(4321)));
const origin = `http://127.0.0.1:${appPort}`;
// The payments service's stand-in: paid classes are bought on its checkout page with the test card.
const payments = await startPaymentsFake({ webhookUrl: `${origin}/api/payments/webhook` });
Object.assign(env, payments.env);
// The app survives a database restart by itself (503 meanwhile); should it still crash, it is started again
// rather than taking the database and the fakes down with it.
const app = superviseApp({
  start: () => serveApp({ port: appPort, env: { ...env, SMTP_PORT: String(mail.port), PUBLIC_ORIGIN: origin } }),
  onGiveUp: () => shutdown(),
});
// One planning worker process beside the app (whole-quilt plans from the job queue), restarted like the app.
const planWorker = superviseApp({ start: () => startPlanWorkerProcess({ env }), onGiveUp: () => shutdown(), name: 'planning worker' });
await waitForHttp(origin);

console.log(`
  Threadway is running at ${origin}

  Demo sign-ins (password for all: ${readDemoPassword()}):
${readDemoAccounts().map((a) => `    ${a.role.padEnd(8)} ${a.email.padEnd(36)} ${a.displayName}`).join('\n')}

  One planning worker takes whole-quilt plans from the job queue (more: node scripts/plan-worker.mjs, see README).
  Captured e-mail (fake mail server on 127.0.0.1:${mail.port}) is kept in ${env.MAIL_CAPTURE_DIR}
  ${devTools ? `and shown to admins at ${origin}/dev/mail.` : 'To read it in the browser as an admin: npm start -- --dev-tools, then /dev/mail.'}
  Paid classes check out on the local payments fake at ${payments.url} (test card 4242 4242 4242 4242).
  Stop with Ctrl-C (the database stops too; or later: npm run db:stop).
`);

let stopping = false;
async function shutdown() {
  if (stopping) return;
  stopping = true;
  log('stopping…');
  await planWorker.stop();
  await app.stop();
  await mail.close();
  await s3.close();
  await payments.close();
  stopCluster(pgBin, pgDir);
  log('stopped.');
  process.exit(0);
}
process.on('SIGINT', shutdown);
process.on('SIGTERM', shutdown);

function readDemoAccounts() {
  return JSON.parse(readFileSync(path.join(ROOT, 'scripts', 'seed', 'demo-accounts.json'), 'utf8')).accounts;
}
function readDemoPassword() {
  return JSON.parse(readFileSync(path.join(ROOT, 'scripts', 'seed', 'demo-accounts.json'), 'utf8')).password;
}
