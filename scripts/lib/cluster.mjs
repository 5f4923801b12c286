// Where `npm start` keeps its cluster: .data/pg in the project, unless the project sits under a folder
// the postgres user cannot enter (e.g. /root, as root): then /var/tmp/threadway-<hash of the path>/pg.
import { createHash } from 'node:crypto';
import { mkdirSync, writeFileSync, existsSync, readFileSync } from 'node:fs';
import path from 'node:path';
import { ROOT, isRoot } from './system.mjs';
import { canServerReach } from './postgres.mjs';

export function clusterLocation() {
  const data = path.join(ROOT, '.data');
  mkdirSync(data, { recursive: true });
  const pointer = path.join(data, 'pg-location');
  if (existsSync(pointer)) {
    const dir = readFileSync(pointer, 'utf8').trim();
    return { dir, portFile: path.join(data, 'pg-port') };
  }
  let dir = path.join(data, 'pg');
  if (isRoot() && !canServerReach(dir)) {
    const hash = createHash('sha256').update(ROOT).digest('hex').slice(0, 12);
    dir = path.join('/var/tmp', `threadway-${hash}`, 'pg');
    mkdirSync(path.dirname(dir), { recursive: true, mode: 0o755 });
  }
  writeFileSync(pointer, dir);
  return { dir, portFile: path.join(data, 'pg-port') };
}
