// Machine set-up for `npm start` and `npm test`: Node modules from the lockfile and Debian packages.
// Node built-ins only: this runs before `npm ci` has installed anything.
import { execFileSync, spawnSync } from 'node:child_process';
import { existsSync, lstatSync, statSync, readdirSync } from 'node:fs';
import path from 'node:path';

export const ROOT = path.resolve(import.meta.dirname, '..', '..');
export const isRoot = () => process.getuid?.() === 0;

export function log(message) {
  console.log(`[threadway] ${message}`);
}

export function fail(message) {
  console.error(`[threadway] ${message}`);
  process.exit(1);
}

/** Runs `npm ci` when node_modules is missing or older than package-lock.json. */
export function ensureNodeModules() {
  const marker = path.join(ROOT, 'node_modules', '.package-lock.json');
  const lock = path.join(ROOT, 'package-lock.json');
  if (existsSync(marker) && statSync(marker).mtimeMs >= statSync(lock).mtimeMs) return;
  // A copy of the project whose node_modules links to another checkout's must not run `npm ci`:
  // npm would empty the linked folder for everyone who uses it.
  const modules = path.join(ROOT, 'node_modules');
  if (existsSync(modules) && lstatSync(modules).isSymbolicLink()) {
    log('node_modules is a symbolic link: not running npm ci here (install in the linked checkout instead).');
    return;
  }
  log('installing npm dependencies from package-lock.json (npm ci)…');
  const result = spawnSync('npm', ['ci', '--no-audit', '--no-fund'], { cwd: ROOT, stdio: 'inherit' });
  if (result.status !== 0) fail('npm ci failed; see the output above.');
}

function isInstalled(pkg) {
  const r = spawnSync('dpkg-query', ['-W', '-f=${Status}', pkg], { encoding: 'utf8' });
  return r.status === 0 && r.stdout.includes('install ok installed');
}

/**
 * Installs Debian packages that are missing (as root, through apt-get). As an ordinary user it names
 * the command to run instead, since it cannot install system packages itself.
 */
export function ensureDebianPackages(packages) {
  const missing = packages.filter((p) => !isInstalled(p));
  if (missing.length === 0) return;
  if (!isRoot()) fail(`missing system packages: ${missing.join(' ')}. Install them with: sudo apt-get install -y --no-install-recommends ${missing.join(' ')}`);
  log(`installing Debian packages: ${missing.join(' ')} …`);
  const env = { ...process.env, DEBIAN_FRONTEND: 'noninteractive' };
  const update = spawnSync('apt-get', ['update', '-qq'], { stdio: 'inherit', env });
  if (update.status !== 0) fail('apt-get update failed.');
  const install = spawnSync('apt-get', ['install', '-y', '-qq', '--no-install-recommends', ...missing], { stdio: 'inherit', env });
  if (install.status !== 0) fail(`apt-get install ${missing.join(' ')} failed.`);
}

/** The newest PostgreSQL server binaries Debian installed, or null. */
export function findPostgresBin() {
  const base = '/usr/lib/postgresql';
  if (!existsSync(base)) return null;
  const versions = readdirSync(base).filter((v) => existsSync(path.join(base, v, 'bin', 'initdb'))).sort((a, b) => Number(a) - Number(b));
  const newest = versions.at(-1);
  return newest ? path.join(base, newest, 'bin') : null;
}

export function ensurePostgres() {
  if (findPostgresBin()) return findPostgresBin();
  ensureDebianPackages(['postgresql-15']);
  const bin = findPostgresBin();
  if (!bin) fail('PostgreSQL binaries not found after installing postgresql-15.');
  return bin;
}

export function commandOutput(cmd, args) {
  return execFileSync(cmd, args, { encoding: 'utf8' }).trim();
}
