// Every route the app serves, read from the file system (src/pages), so a new endpoint or page cannot be left out
// of the access matrix: tests/api/security/accessMatrix.test.ts fails until the new route has a row.
// Endpoints: every `export const GET|POST|PUT|PATCH|DELETE` in a .ts file; pages: every .astro file (GET),
// except Astro's own error pages. Patterns keep Astro's bracket syntax: /api/designs/[id]/versions/[version].
import { readdirSync, readFileSync } from 'node:fs';
import path from 'node:path';
import { fileURLToPath } from 'node:url';

export type Method = 'GET' | 'POST' | 'PUT' | 'PATCH' | 'DELETE';
export interface RouteEntry {
  kind: 'api' | 'page';
  method: Method;
  /** e.g. "/api/classes/[id]/roster.csv" */
  pattern: string;
  file: string;
}

const PAGES = fileURLToPath(new URL('../../../src/pages/', import.meta.url));
const ERROR_PAGES = new Set(['/404', '/500']);

function walk(dir: string): string[] {
  return readdirSync(dir, { withFileTypes: true }).flatMap((e) => (e.isDirectory() ? walk(path.join(dir, e.name)) : [path.join(dir, e.name)]));
}

function patternOf(file: string): string {
  const rel = path.relative(PAGES, file).split(path.sep).join('/');
  const noExt = rel.replace(/\.(ts|astro)$/, '');
  const route = `/${noExt}`.replace(/\/index$/, '');
  return route === '' ? '/' : route;
}

/** The key rows are filed under: "GET /api/designs/[id]". */
export const routeKey = (r: { method: string; pattern: string }) => `${r.method} ${r.pattern}`;

export function listRoutes(): RouteEntry[] {
  const out: RouteEntry[] = [];
  for (const file of walk(PAGES).sort()) {
    const pattern = patternOf(file);
    if (file.endsWith('.astro')) {
      if (!ERROR_PAGES.has(pattern)) out.push({ kind: 'page', method: 'GET', pattern, file });
      continue;
    }
    if (!file.endsWith('.ts')) continue;
    const source = readFileSync(file, 'utf8');
    const methods = new Set([...source.matchAll(/^export\s+(?:const|async\s+function|function)\s+(GET|POST|PUT|PATCH|DELETE|ALL)\b/gm)].map((m) => m[1]!));
    if (methods.has('ALL')) throw new Error(`tests/api/security/routeInventory: ${file} exports ALL; list its methods instead`);
    for (const method of methods) out.push({ kind: pattern.startsWith('/api/') ? 'api' : 'page', method: method as Method, pattern, file });
  }
  return out;
}

/** Whether a concrete path (no query) matches a pattern: [x] stands for one non-empty segment. */
export function matchesPattern(pattern: string, concrete: string): boolean {
  const p = pattern.split('/');
  const c = concrete.split('/');
  return p.length === c.length && p.every((seg, i) => (/^\[[^\]]+\]$/.test(seg) ? c[i]!.length > 0 : seg === c[i]));
}
