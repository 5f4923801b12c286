// A planning worker process: takes whole-quilt plans from the job queue in PostgreSQL and plans them with its own
// engine threads (src/server/jobs/planWorker.ts). npm start and npm test start one; a deployment runs as many as it
// likes, on any machine that reaches the database: `DATABASE_URL=… node scripts/plan-worker.mjs` from the project
// folder after the build (`npm start` or `npx astro build` + the bundle step). PLAN_WORKER_THREADS sets its engine threads.
await import('../dist/jobs/planWorker.mjs');
