// Bundles the engine worker (src/server/engine/engine.worker.ts and the shared/ engine it imports) into one
// ES module, dist/engine/engine.worker.mjs, and the planning worker process into dist/jobs/planWorker.mjs. Astro bundles the server into dist/server, but a worker thread
// needs a file of its own; the server's engine pool loads this one (see src/server/engine/enginePool.ts).
// The exact search's solver (npm `highs`) loads its WebAssembly file from beside the module that imports it,
// so the build copies highs.wasm next to the bundle: the built app reads it from disk, never from the network.
import { copyFileSync } from 'node:fs';
import { createRequire } from 'node:module';
import path from 'node:path';
import { ROOT } from './system.mjs';

export const ENGINE_WORKER_OUT = path.join(ROOT, 'dist', 'engine', 'engine.worker.mjs');
/** The planning worker process (src/server/jobs/planWorker.main.ts); its engine threads load ENGINE_WORKER_OUT. */
export const PLAN_WORKER_OUT = path.join(ROOT, 'dist', 'jobs', 'planWorker.mjs');

export function bundleEngineWorker() {
  // Loaded here, not at the top: the scripts import this file before `npm ci` has installed esbuild.
  const require = createRequire(import.meta.url);
  const { buildSync } = require('esbuild');
  buildSync({
    entryPoints: [path.join(ROOT, 'src', 'server', 'engine', 'engine.worker.ts')],
    outfile: ENGINE_WORKER_OUT,
    bundle: true,
    platform: 'node',
    format: 'esm',
    target: 'node20',
    sourcemap: true,
    logLevel: 'warning',
  });
  copyFileSync(require.resolve('highs/runtime'), path.join(path.dirname(ENGINE_WORKER_OUT), 'highs.wasm'));
  // The planning worker process: our code bundled (path aliases resolved), packages (pg-boss, pg, kysely, zod…)
  // loaded from node_modules at run time like the app's own server bundle does.
  buildSync({
    entryPoints: [path.join(ROOT, 'src', 'server', 'jobs', 'planWorker.main.ts')],
    outfile: PLAN_WORKER_OUT,
    bundle: true,
    packages: 'external',
    platform: 'node',
    format: 'esm',
    target: 'node20',
    sourcemap: true,
    logLevel: 'warning',
  });
}
