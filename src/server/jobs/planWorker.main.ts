// Entry of a planning worker process (see planWorker.ts). Built to dist/jobs/planWorker.mjs by
// scripts/lib/engineWorker.mjs and started by `node scripts/plan-worker.mjs` (npm start and npm test start one;
// run more on this or other machines against the same PostgreSQL). From the sources: `npx tsx src/server/jobs/planWorker.main.ts`.
// Environment: DATABASE_URL (required), PLAN_WORKER_THREADS (engine threads; default: the machine's cores).
import { availableParallelism } from 'node:os';
import { installPlainMessages } from '@shared/forms/plainMessages.ts';
import { engineWorkerLocation } from '../engine/enginePool.ts';
import { startPlanWorker } from './planWorker.ts';

installPlainMessages();
const databaseUrl = process.env['DATABASE_URL'];
if (!databaseUrl) {
  console.error('[plan-worker] DATABASE_URL is not set');
  process.exit(1);
}
const threads = Number(process.env['PLAN_WORKER_THREADS'] ?? availableParallelism());
if (!Number.isInteger(threads) || threads < 1) {
  console.error(`[plan-worker] PLAN_WORKER_THREADS must be a whole number ≥ 1, not ${process.env['PLAN_WORKER_THREADS']}`);
  process.exit(1);
}
// Run from the TypeScript sources (tsx), engine threads load the TypeScript engine too; the bundle loads the built one.
const fromSources = import.meta.url.endsWith('.ts');
const worker = await startPlanWorker({ databaseUrl, threads, engine: engineWorkerLocation(fromSources) });

let stopping = false;
for (const signal of ['SIGINT', 'SIGTERM'] as const) {
  process.on(signal, () => {
    if (stopping) return;
    stopping = true;
    void worker.stop().then(
      () => process.exit(0),
      (error: unknown) => {
        console.error('[plan-worker] stop failed:', error);
        process.exit(1);
      },
    );
  });
}
