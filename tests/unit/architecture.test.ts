// The layer rules of DEVELOPERS.md's "Layout" table, checked on the repository's imports. Each rule is shown
// failing on a small fake tree with a planted violation (tests/unit/fixtures/architecture/<case>/), so a rule
// that stopped matching anything would fail here too; the `allowed` tree holds every seam the rules permit.
import { readFileSync } from 'node:fs';
import path from 'node:path';
import { fileURLToPath } from 'node:url';
import { describe, expect, it } from 'vitest';
import { importAliases } from '../../importAliases.mjs';
import { climbs, listSourceFiles, readImports, readTreeImports, resolveImport } from './architecture/imports.ts';
import { checkTree, folderRules, formatViolation, ruleFor, type Violation } from './architecture/rules.ts';

const ROOT = fileURLToPath(new URL('../../', import.meta.url));
const FIXTURES = path.join(ROOT, 'tests/unit/fixtures/architecture');
/** The aliases as folders relative to a tree's root, so the same map serves the repository and the fake trees. */
const aliases = Object.fromEntries(Object.entries(importAliases).map(([alias, folder]) => [alias, path.relative(ROOT, folder).split(path.sep).join('/')]));

const checkFixture = (name: string): Pick<Violation, 'rule' | 'file' | 'specifier'>[] =>
  checkTree(path.join(FIXTURES, name), aliases).map(({ rule, file, specifier }) => ({ rule, file, specifier }));

describe('reading imports', () => {
  it('counts every import form, type-only ones included, and nothing in comments, strings or regular expressions', () => {
    const text = [
      "// import commented from 'in-a-comment';",
      "/* import blocked from 'in-a-block-comment'; */",
      "import type { A } from './a.ts';",
      'import {',
      '  b,',
      '  type C,',
      "} from '../b.ts';",
      "export { d } from './d.ts';",
      "export type { E } from '@server/e.ts';",
      "import './side-effect.css';",
      'const quote = /[\'"]([^\'"]+)[\'"]/g;',
      "const text = `import t from 'in-a-template'`;",
      "const lazy = await import('./lazy.ts');",
    ].join('\n');
    expect(readImports('x.ts', text)).toEqual([
      { file: 'x.ts', line: 3, specifier: './a.ts' },
      { file: 'x.ts', line: 7, specifier: '../b.ts' },
      { file: 'x.ts', line: 8, specifier: './d.ts' },
      { file: 'x.ts', line: 9, specifier: '@server/e.ts' },
      { file: 'x.ts', line: 10, specifier: './side-effect.css' },
      { file: 'x.ts', line: 13, specifier: './lazy.ts' },
    ]);
  });

  it('reads an .astro file’s frontmatter and scripts, not its markup', () => {
    const text = ['---', "import type { T } from '@server/t.ts';", '---', "<p>import x from 'in-markup'</p>", '<script>', "  import { y } from './y.ts';", '</script>'].join('\n');
    expect(readImports('c.astro', text).map((s) => [s.line, s.specifier])).toEqual([[2, '@server/t.ts'], [6, './y.ts']]);
  });

  it('resolves relative paths and aliases to tree paths, and names packages and built-ins', () => {
    expect(resolveImport('src/components/a/b.tsx', '../../server/db.ts', aliases)).toEqual({ kind: 'file', path: 'src/server/db.ts' });
    expect(resolveImport('db/seed/x.ts', '@server/auth/password.ts', aliases)).toEqual({ kind: 'file', path: 'src/server/auth/password.ts' });
    expect(resolveImport('shared/x.ts', '@aws-sdk/client-s3/dist', aliases)).toEqual({ kind: 'package', name: '@aws-sdk/client-s3' });
    expect(resolveImport('shared/x.ts', 'highs/runtime', aliases)).toEqual({ kind: 'package', name: 'highs' });
    expect(resolveImport('shared/x.ts', 'fs', aliases)).toEqual({ kind: 'package', name: 'node:fs' });
    expect(resolveImport('shared/x.ts', 'node:fs/promises', aliases)).toEqual({ kind: 'package', name: 'node:fs' });
    expect(climbs('../../x.ts')).toBe(2);
    expect(climbs('./../../../x.ts')).toBe(3);
    expect(climbs('@shared/x.ts')).toBe(0);
  });
});

describe('the rules on planted violations', () => {
  it('pass every seam the rules allow', () => {
    expect(checkFixture('allowed')).toEqual([]);
  });

  it('shared/ imports only shared/: not the server, not a component (types included)', () => {
    expect(checkFixture('shared-imports-app')).toEqual([
      { rule: 'shared/', file: 'shared/route/plan.ts', specifier: '@server/db.ts' },
      { rule: 'shared/', file: 'shared/route/plan.ts', specifier: '../../src/components/card.ts' },
    ]);
  });

  it('shared/ uses only its listed packages (a type-only react import counts)', () => {
    expect(checkFixture('shared-uses-a-package')).toEqual([
      { rule: 'shared/', file: 'shared/editor/tool.ts', specifier: 'react' },
      { rule: 'shared/', file: 'shared/editor/tool.ts', specifier: 'kysely' },
    ]);
  });

  it('clipper2-ts and highs only behind their one file each', () => {
    expect(checkFixture('shared-package-outside-its-seam')).toEqual([
      { rule: 'shared/', file: 'shared/geometry/offset.ts', specifier: 'clipper2-ts' },
      { rule: 'shared/', file: 'shared/route/planRoute.ts', specifier: 'highs' },
    ]);
  });

  it('Node built-ins only in shared/cli/, and tests beside modules only child_process', () => {
    expect(checkFixture('shared-uses-node')).toEqual([
      { rule: 'shared/', file: 'shared/geometry/load.test.ts', specifier: 'node:fs' },
      { rule: 'shared/', file: 'shared/geometry/load.ts', specifier: 'fs' },
    ]);
  });

  it('src/components/ never imports src/server/, types included', () => {
    expect(checkFixture('components-import-server')).toEqual([
      { rule: 'src/components/', file: 'src/components/TemplateView.astro', specifier: '@server/templates/templateDetail.ts' },
      { rule: 'src/components/', file: 'src/components/editor/useSave.ts', specifier: '../../server/designs/design.service.ts' },
    ]);
  });

  it('db/ never imports src/', () => {
    expect(checkFixture('db-imports-src')).toEqual([
      { rule: 'db/', file: 'db/migrations/001_accounts.ts', specifier: '@server/auth/password.ts' },
      { rule: 'db/', file: 'db/schema.ts', specifier: '../src/components/units.ts' },
      // The demo seed lived here once and called the server; it moved to scripts/seed/, and db/ has no exception.
      { rule: 'db/', file: 'db/seed/index.ts', specifier: '@server/auth/password.ts' },
    ]);
  });

  it('no import climbs three folders, wherever it sits', () => {
    expect(checkFixture('climbs-three-folders')).toEqual([
      { rule: 'climbs three folders', file: 'src/components/editor/canvas/layers/RouteLayer.tsx', specifier: '../../../../../shared/geometry/point.ts' },
      { rule: 'climbs three folders', file: 'tests/api/designs/save/save.test.ts', specifier: '../../../../src/server/db.ts' },
      { rule: 'climbs three folders', file: 'tests/api/designs/save/save.test.ts', specifier: '../../../helpers/client.ts' },
    ]);
  });

  it('the other rows: the server never imports views, the bootstrap only Node built-ins, benches not the server', () => {
    expect(checkFixture('server-imports-views')).toEqual([{ rule: 'src/server/', file: 'src/server/mail/render.ts', specifier: '@components/Card.tsx' }]);
    expect(checkFixture('scripts-use-packages')).toEqual([{ rule: 'scripts/', file: 'scripts/start.mjs', specifier: 'kysely' }]);
    expect(checkFixture('bench-imports-server')).toEqual([{ rule: 'bench/', file: 'bench/save.bench.ts', specifier: '@server/designs/design.service.ts' }]);
  });
});

describe('the repository', () => {
  const skip = ['tests/unit/fixtures'];

  it('keeps every rule', () => {
    expect(checkTree(ROOT, aliases, { skip }).map(formatViolation)).toEqual([]);
  });

  it('is really read: every row of the rules covers files, and the imports number in the thousands', () => {
    const files = listSourceFiles(ROOT, skip);
    for (const rule of folderRules) expect(files.some((f) => ruleFor(f) === rule), rule.folder).toBe(true);
    expect(readTreeImports(ROOT, files).length).toBeGreaterThan(1500);
  });

  it('has one rule per row of the Layout table in DEVELOPERS.md, and no other', () => {
    const guide = readFileSync(path.join(ROOT, 'DEVELOPERS.md'), 'utf8');
    const section = guide.split(/^## /m).find((s) => s.startsWith('Layout\n')) ?? '';
    const rows = [...section.matchAll(/^\| `([^`]+)` \|/gm)].map((m) => m[1]);
    expect(rows.sort()).toEqual(folderRules.map((r) => r.folder).sort());
  });
});
