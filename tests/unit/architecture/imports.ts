// Reads the imports of every source file under a folder: what each file names (`import`, `import type`,
// `export … from`, side-effect imports, `import()`), and what that name points to — a file inside the tree
// (relative paths and the import aliases) or a package. TypeScript's own pre-processor does the reading, so
// comments, strings and regular expressions that merely look like imports are never counted.
import { readdirSync, readFileSync } from 'node:fs';
import { builtinModules } from 'node:module';
import path from 'node:path';
import ts from 'typescript';

/** Source files the rules look at. */
const SOURCE = /\.(ts|tsx|mts|cts|astro|mjs|cjs|js)$/;
/** Generated, installed or scratch folders, never read. */
const SKIPPED = new Set(['node_modules', 'dist', '.astro', '.data', '.git', 'test-output']);

export interface ImportSite {
  /** The importing file, relative to the tree root, with `/` separators. */
  file: string;
  /** 1-based line of the module name. */
  line: number;
  /** The module name as written. */
  specifier: string;
}

/** What an import points to: a file path relative to the tree root, or a package (`node:fs` for built-ins). */
export type ImportTarget = { kind: 'file'; path: string } | { kind: 'package'; name: string };

/** Every source file under `root` (relative paths, sorted), leaving out the `skip` folders (relative too). */
export function listSourceFiles(root: string, skip: readonly string[] = []): string[] {
  const found: string[] = [];
  const walk = (folder: string): void => {
    for (const entry of readdirSync(path.join(root, folder), { withFileTypes: true })) {
      const rel = folder ? `${folder}/${entry.name}` : entry.name;
      if (entry.isDirectory()) {
        if (!SKIPPED.has(entry.name) && !skip.includes(rel)) walk(rel);
      } else if (entry.isFile() && SOURCE.test(entry.name)) {
        found.push(rel);
      }
    }
  };
  walk('');
  return found.sort();
}

/**
 * The code parts of an .astro file — its frontmatter and its `<script>` bodies — with everything else blanked
 * to spaces, so positions (and line numbers) stay those of the original file.
 */
export function astroCode(text: string): string {
  const keep: [number, number][] = [];
  const fence = /^---[ \t]*\r?$/gm;
  const open = fence.exec(text);
  if (open && text.slice(0, open.index).trim() === '') {
    const close = fence.exec(text);
    if (close) keep.push([open.index + open[0].length, close.index]);
  }
  for (const m of text.matchAll(/<script\b[^>]*>([\s\S]*?)<\/script>/g)) {
    const start = m.index + m[0].indexOf('>') + 1;
    keep.push([start, start + (m[1] ?? '').length]);
  }
  let out = text.replace(/[^\n]/g, ' ');
  for (const [a, b] of keep) out = out.slice(0, a) + text.slice(a, b) + out.slice(b);
  return out;
}

/** The imports of one file's text. */
export function readImports(file: string, text: string): ImportSite[] {
  const code = file.endsWith('.astro') ? astroCode(text) : text;
  const lineStarts = [0];
  for (let i = 0; i < code.length; i++) if (code[i] === '\n') lineStarts.push(i + 1);
  const lineOf = (pos: number): number => {
    let lo = 0;
    let hi = lineStarts.length - 1;
    while (lo < hi) {
      const mid = (lo + hi + 1) >> 1;
      if ((lineStarts[mid] ?? 0) <= pos) lo = mid;
      else hi = mid - 1;
    }
    return lo + 1;
  };
  return ts
    .preProcessFile(code, true, true)
    .importedFiles.map((f) => ({ file, line: lineOf(f.pos), specifier: f.fileName }));
}

/** The imports of every file in `files` (relative to `root`). */
export function readTreeImports(root: string, files: readonly string[]): ImportSite[] {
  return files.flatMap((file) => readImports(file, readFileSync(path.join(root, file), 'utf8')));
}

const builtins = new Set(builtinModules);

/**
 * Where `specifier`, written in `file`, points. `aliases` maps an alias (`@shared`) to its folder relative to the
 * tree root (`shared`). A relative path that leaves the tree keeps its leading `../` and so matches no folder.
 */
export function resolveImport(file: string, specifier: string, aliases: Readonly<Record<string, string>>): ImportTarget {
  if (specifier.startsWith('./') || specifier.startsWith('../') || specifier === '.' || specifier === '..') {
    return { kind: 'file', path: path.posix.normalize(path.posix.join(path.posix.dirname(file), specifier)) };
  }
  for (const [alias, folder] of Object.entries(aliases)) {
    if (specifier.startsWith(`${alias}/`)) return { kind: 'file', path: path.posix.join(folder, specifier.slice(alias.length + 1)) };
  }
  if (specifier.startsWith('node:')) return { kind: 'package', name: specifier.split('/')[0] ?? specifier };
  const parts = specifier.split('/');
  const name = specifier.startsWith('@') ? parts.slice(0, 2).join('/') : (parts[0] ?? specifier);
  return { kind: 'package', name: builtins.has(name) ? `node:${name}` : name };
}

/** How many folders a relative specifier climbs (`../../x` climbs 2). */
export function climbs(specifier: string): number {
  if (!specifier.startsWith('.')) return 0;
  const normalized = path.posix.normalize(specifier);
  return normalized.split('/').filter((part) => part === '..').length;
}
