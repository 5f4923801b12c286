// Builds what a deployment runs, without starting anything: the app (`astro build`, served by scripts/serve.mjs),
// the engine worker and the planning worker process (scripts/plan-worker.mjs). `node scripts/build.mjs`.
import { buildApp } from './lib/app.mjs';

buildApp({ force: process.argv.includes('--force') });
