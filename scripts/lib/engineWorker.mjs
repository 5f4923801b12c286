// Bundles the engine worker (src/server/engine/engine.worker.ts and the shared/ engine it imports) into one
// ES module, dist/engine/engine.worker.mjs. Astro bundles the server into dist/server, but a worker thread
// needs a file of its own; the server's engine pool loads this one (see src/server/engine/enginePool.ts).
import { createRequire } from 'node:module';
import path from 'node:path';
import { ROOT } from './system.mjs';

export const ENGINE_WORKER_OUT = path.join(ROOT, 'dist', 'engine', 'engine.worker.mjs');

export function bundleEngineWorker() {
  // Loaded here, not at the top: the scripts import this file before `npm ci` has installed esbuild.
  const { buildSync } = createRequire(import.meta.url)('esbuild');
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
}
