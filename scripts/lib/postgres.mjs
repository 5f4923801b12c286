// A private PostgreSQL cluster on 127.0.0.1 (TCP only, no Unix socket). initdb and the server refuse
// to run as root, so as root they run as Debian's `postgres` system user, owning the data folder.
import { spawnSync } from 'node:child_process';
import { appendFileSync, existsSync, mkdirSync, chownSync, chmodSync } from 'node:fs';
import path from 'node:path';
import { isRoot, fail } from './system.mjs';

function asOwner(bin, args, options = {}) {
  const [cmd, argv] = isRoot() ? ['runuser', ['-u', 'postgres', '--', bin, ...args]] : [bin, args];
  return spawnSync(cmd, argv, { encoding: 'utf8', ...options });
}

function postgresIds() {
  const uid = Number(spawnSync('id', ['-u', 'postgres'], { encoding: 'utf8' }).stdout.trim());
  const gid = Number(spawnSync('id', ['-g', 'postgres'], { encoding: 'utf8' }).stdout.trim());
  if (!Number.isInteger(uid) || !Number.isInteger(gid)) fail('the postgres system user is missing (is postgresql installed?)');
  return { uid, gid };
}

/** Whether the server user can reach `dir` (every parent needs o+x when we run as root). */
export function canServerReach(dir) {
  if (!isRoot()) return true;
  mkdirSync(dir, { recursive: true });
  return asOwner('/usr/bin/test', ['-x', path.dirname(dir)]).status === 0;
}

/** Creates the cluster in `dir` when it holds none; `fast` turns fsync off (throwaway clusters). */
export function initCluster(bin, dir, port, { fast = false } = {}) {
  if (existsSync(path.join(dir, 'PG_VERSION'))) return false;
  mkdirSync(dir, { recursive: true });
  if (isRoot()) {
    const { uid, gid } = postgresIds();
    chownSync(dir, uid, gid);
  }
  chmodSync(dir, 0o700);
  const args = ['-D', dir, '-U', 'postgres', '--auth=trust', '-E', 'UTF8', '--locale=C.UTF-8'];
  if (fast) args.push('--no-sync');
  const r = asOwner(path.join(bin, 'initdb'), args);
  if (r.status !== 0) fail(`initdb failed:\n${r.stderr || r.stdout}`);
  const settings = [`listen_addresses='127.0.0.1'`, `port=${port}`, `unix_socket_directories=''`, 'max_connections=60'];
  if (fast) settings.push('fsync=off', 'synchronous_commit=off', 'full_page_writes=off');
  appendFileSync(path.join(dir, 'postgresql.conf'), `\n# threadway\n${settings.join('\n')}\n`);
  return true;
}

export function isClusterRunning(bin, dir) {
  return asOwner(path.join(bin, 'pg_ctl'), ['-D', dir, 'status']).status === 0;
}

export function startCluster(bin, dir) {
  if (isClusterRunning(bin, dir)) return false;
  const r = asOwner(path.join(bin, 'pg_ctl'), ['-D', dir, '-l', path.join(dir, 'server.log'), '-w', '-t', '60', 'start']);
  if (r.status !== 0) fail(`PostgreSQL did not start (see ${path.join(dir, 'server.log')}):\n${r.stderr || r.stdout}`);
  return true;
}

export function stopCluster(bin, dir, mode = 'fast') {
  if (!existsSync(path.join(dir, 'PG_VERSION'))) return;
  asOwner(path.join(bin, 'pg_ctl'), ['-D', dir, '-m', mode, '-w', 'stop']);
}

/** Creates database `name` when missing (connects as the trusted `postgres` role over TCP). */
export function ensureDatabase(bin, port, name) {
  const psql = (sql) => spawnSync(path.join(bin, 'psql'), ['-h', '127.0.0.1', '-p', String(port), '-U', 'postgres', '-d', 'postgres', '-tAc', sql], { encoding: 'utf8' });
  const found = psql(`select 1 from pg_database where datname = '${name}'`);
  if (found.status !== 0) fail(`cannot reach PostgreSQL on 127.0.0.1:${port}:\n${found.stderr}`);
  if (found.stdout.trim() === '1') return;
  const created = psql(`create database "${name}"`);
  if (created.status !== 0) fail(`create database ${name} failed:\n${created.stderr}`);
}

export function databaseUrl(port, name) {
  return `postgres://postgres@127.0.0.1:${port}/${name}`;
}
