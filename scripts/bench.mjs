// `npm run bench`: runs every bench/*.bench.ts with tsx (each prints its own Markdown table). Extra arguments are
// ignored; BENCH_RUNS sets the runs per case (default 5). Needs Debian's /usr/bin/python3 with networkx and shapely.
import { readdirSync } from 'node:fs';
import { spawnSync } from 'node:child_process';
import path from 'node:path';
import { fileURLToPath } from 'node:url';

const root = path.resolve(path.dirname(fileURLToPath(import.meta.url)), '..');
const benches = readdirSync(path.join(root, 'bench')).filter((f) => f.endsWith('.bench.ts')).sort();
let failed = false;
for (const file of benches) {
  const run = spawnSync(path.join(root, 'node_modules', '.bin', 'tsx'), [path.join('bench', file)], { cwd: root, stdio: 'inherit' });
  if (run.status !== 0) failed = true;
}
process.exit(failed ? 1 : 0);
