// Starts a TypeScript worker through tsx, for `astro dev` and unit tests (the built app runs the bundled
// dist/engine/engine.worker.mjs instead). Node 20 ignores `--import tsx` in a worker's execArgv, so the
// worker loads this plain module, which imports the .ts file named in workerData.tsFile through tsx's API.
import { workerData } from 'node:worker_threads';
import { tsImport } from 'tsx/esm/api';

await tsImport(workerData.tsFile, import.meta.url);
