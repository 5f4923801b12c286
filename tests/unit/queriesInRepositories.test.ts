// The layer rule "every query lives in a repository" (DEVELOPERS.md, "Queries and repositories"), made executable.
// A query is any call that reaches the database through Kysely: the four query builders, a sql`…` template (or
// sql.raw/ref/lit/join/id/table/val), or opening a transaction. Only `*.repository.ts` files may hold one; pages,
// endpoints, middleware, services and the demo seed call repositories. Tests beside modules are not app code.
import { readdirSync, readFileSync } from 'node:fs';
import path from 'node:path';
import { fileURLToPath } from 'node:url';
import { describe, expect, it } from 'vitest';

const ROOT = fileURLToPath(new URL('../../', import.meta.url));
/** Folders the rule covers (db/ holds the migrations, which are exempt: frozen in time, they query directly). */
const SCANNED = ['src', 'scripts/seed'];

const QUERY_PATTERNS: readonly { readonly name: string; readonly re: RegExp }[] = [
  { name: 'query builder', re: /\.\s*(selectFrom|insertInto|updateTable|deleteFrom|replaceInto|mergeInto|selectNoFrom)\s*\(/g },
  { name: 'sql template', re: /\bsql\s*(?:<[^`;]*?>)?\s*`/g },
  { name: 'sql helper', re: /\bsql\s*\.\s*(raw|ref|lit|join|id|table|val)\s*\(/g },
  { name: 'transaction', re: /\.\s*transaction\s*\(\s*\)/g },
];

interface QueryOutsideRepository {
  readonly file: string;
  readonly line: number;
  readonly kind: string;
  readonly text: string;
}

const isRepository = (file: string) => /\.repository\.ts$/.test(file);
const isTest = (file: string) => /\.test\.ts$/.test(file);

/** Blanks out comments, keeping line breaks so reported line numbers stay right. */
function stripComments(source: string): string {
  return source
    .replace(/\/\*[\s\S]*?\*\//g, (block) => block.replace(/[^\n]/g, ' '))
    .replace(/(^|[^:'"`\\])\/\/.*$/gm, '$1')
    .replace(/<!--[\s\S]*?-->/g, (block) => block.replace(/[^\n]/g, ' '));
}

/**
 * True when an `import … from 'kysely'` clause brings in a value (sql under another name, expression helpers),
 * not only types: whatever builds a query comes in that way.
 */
function importsKyselyValue(clause: string): boolean {
  const c = clause.trim();
  if (c.startsWith('type ')) return false;
  const named = /\{([^}]*)\}/.exec(c);
  const outside = c.replace(/\{[^}]*\}/, '').replace(/,/g, '').trim();
  if (outside.length > 0) return true; // a default or namespace import
  return (named?.[1] ?? '')
    .split(',')
    .map((n) => n.trim())
    .some((n) => n.length > 0 && !n.startsWith('type '));
}

/** Every query in `source` when `file` is not a repository (nor a test); none otherwise. */
function findQueries(file: string, source: string): QueryOutsideRepository[] {
  if (isRepository(file) || isTest(file)) return [];
  const code = stripComments(source);
  const found: QueryOutsideRepository[] = [];
  for (const { name, re } of QUERY_PATTERNS) {
    for (const m of code.matchAll(re)) {
      const line = code.slice(0, m.index).split('\n').length;
      found.push({ file, line, kind: name, text: source.split('\n')[line - 1]!.trim() });
    }
  }
  for (const m of code.matchAll(/import\s+([^;]*?)\s+from\s*['"]kysely['"]/g)) {
    if (!importsKyselyValue(m[1]!)) continue;
    const line = code.slice(0, m.index).split('\n').length;
    found.push({ file, line, kind: 'kysely value import', text: source.split('\n')[line - 1]!.trim() });
  }
  return found.sort((a, b) => a.line - b.line);
}

function listSources(dir: string): string[] {
  return readdirSync(dir, { withFileTypes: true }).flatMap((entry) => {
    const full = path.join(dir, entry.name);
    if (entry.isDirectory()) return listSources(full);
    return /\.(ts|astro)$/.test(entry.name) && !entry.name.endsWith('.d.ts') ? [full] : [];
  });
}

describe('every query lives in a repository', () => {
  it('catches planted queries outside repositories and leaves repositories, comments and plain words alone', () => {
    // A page with a query in its frontmatter, an endpoint, a service opening its own transaction, a raw sql helper.
    const page = "---\nimport { db } from '@server/db.ts';\nconst rows = await db.selectFrom('design').selectAll().execute();\n---\n<p>{rows.length}</p>";
    expect(findQueries('src/pages/designs/index.astro', page)).toMatchObject([{ line: 3, kind: 'query builder' }]);
    const endpoint = "export const POST = async () => {\n  await db\n    .updateTable('class')\n    .set({ title: 'x' });\n  await db.execute(sql<number>`select 1`);\n};";
    expect(findQueries('src/pages/api/classes/[id].ts', endpoint).map((q) => [q.line, q.kind])).toEqual([
      [3, 'query builder'],
      [5, 'sql template'],
    ]);
    const service = 'export async function save(db) {\n  return db.transaction().execute(async (trx) => trx.deleteFrom("session").execute());\n}';
    expect(findQueries('src/server/auth/session.service.ts', service).map((q) => q.kind).sort()).toEqual(['query builder', 'transaction']);
    expect(findQueries('scripts/seed/guild.ts', "const q = sql.raw('drop table account');")).toMatchObject([{ line: 1, kind: 'sql helper' }]);
    // The same calls are fine in a repository; comments and words such as "sql" or "selectFrom" in prose are not queries.
    expect(findQueries('src/server/designs/design.repository.ts', page + endpoint + service)).toEqual([]);
    // Type-only imports of kysely are fine anywhere; a value import (here sql renamed, dodging the template check) is not.
    expect(findQueries('src/server/x.service.ts', "import type { Kysely } from 'kysely';\nimport { type Transaction } from 'kysely';")).toEqual([]);
    expect(findQueries('src/server/x.service.ts', "import type { Kysely } from 'kysely';\nimport { sql as q, type Transaction } from 'kysely';")).toMatchObject([
      { line: 2, kind: 'kysely value import' },
    ]);
    const prose = "// db.selectFrom('x') used to live here\n/* sql`select 1` */\nconst sqlState = '23505'; // see sql error codes\nconst label = 'transaction';";
    expect(findQueries('src/server/classes/class.service.ts', prose)).toEqual([]);
  });

  it('holds on the repository: no query in src/ or scripts/seed/ outside *.repository.ts', () => {
    const files = SCANNED.flatMap((folder) => listSources(path.join(ROOT, folder)));
    expect(files.length).toBeGreaterThan(100);
    const found = files.flatMap((full) => findQueries(path.relative(ROOT, full), readFileSync(full, 'utf8')));
    expect(found.map((q) => `${q.file}:${q.line} ${q.kind}: ${q.text}`)).toEqual([]);
  });
});
