// The layer rules of DEVELOPERS.md's "Layout" table, as data, and the check that applies them to a source tree.
// One row per folder of that table (architecture.test.ts keeps the two lists equal). A file may import a target
// when one allowance of its folder's row, given for that file, names it; files outside every row, and the
// packages of a row without a package list, are free. One more rule holds everywhere: no import climbs three
// folders (`../../../`); past two, the import aliases say it shorter.
import { climbs, listSourceFiles, readTreeImports, resolveImport, type ImportSite, type ImportTarget } from './imports.ts';

export interface Allowance {
  /** The files this allowance is for (globs from the tree root); every file of the row when absent. */
  from?: readonly string[];
  /** Files they may import (globs). */
  files?: readonly string[];
  /** Files among `files` they may not import after all (globs). */
  filesExcept?: readonly string[];
  /** Packages they may import (globs: `graphology*`, `node:*`). */
  packages?: readonly string[];
  /** Why an exception exists. */
  why?: string;
}

export interface FolderRule {
  /** The folder (or file) as the Layout table's first column writes it. */
  folder: string;
  /** Which files the row covers (globs). */
  covers: readonly string[];
  /** Whether packages are checked at all for this row (false: any package). */
  checkPackages: boolean;
  allow: readonly Allowance[];
}

const TESTS_BESIDE = ['shared/**/*.test.ts'];
/** The core's test support: fixtures and builders only tests (and benches) use. */
const TEST_SUPPORT = ['shared/testing/**', 'shared/**/test*.ts'];

export const folderRules: readonly FolderRule[] = [
  {
    folder: 'shared/',
    covers: ['shared/**'],
    checkPackages: true,
    allow: [
      {
        files: ['shared/**'],
        filesExcept: TEST_SUPPORT,
        packages: ['zod', 'graphology', 'graphology-*', 'flatbush', 'robust-predicates', 'edmonds-blossom-fixed'],
      },
      { from: ['shared/motifs/inset.ts'], packages: ['clipper2-ts'], why: 'polygon offsets for non-convex echo rings' },
      { from: ['shared/route/exact/highsSolver.ts'], packages: ['highs'], why: 'the exact planner’s integer-program solver, behind one seam' },
      { from: ['shared/cli/**'], packages: ['node:*'], why: 'the command line reads and writes files' },
      {
        from: [...TESTS_BESIDE, ...TEST_SUPPORT],
        files: ['shared/**', 'tests/helpers/**'],
        packages: ['vitest', 'fast-check', 'node:child_process'],
        why: 'tests beside modules and their support run Vitest and fast-check, ask python3 oracles through child_process, and share long-run helpers',
      },
    ],
  },
  {
    folder: 'src/pages/',
    covers: ['src/pages/**'],
    checkPackages: false,
    allow: [{ files: ['src/pages/**', 'src/server/**', 'src/components/**', 'src/layouts/**', 'src/styles/**', 'shared/**'] }],
  },
  {
    folder: 'src/components/',
    covers: ['src/components/**'],
    checkPackages: false,
    allow: [{ files: ['src/components/**', 'src/styles/**', 'shared/**'] }],
  },
  {
    folder: 'src/layouts/',
    covers: ['src/layouts/**'],
    checkPackages: false,
    allow: [{ files: ['src/layouts/**', 'src/components/**', 'src/styles/**', 'shared/**'] }],
  },
  {
    folder: 'src/server/',
    covers: ['src/server/**'],
    checkPackages: false,
    allow: [{ files: ['src/server/**', 'db/**', 'shared/**'] }],
  },
  {
    folder: 'src/middleware.ts',
    covers: ['src/middleware.ts'],
    checkPackages: false,
    allow: [{ files: ['src/server/**', 'shared/**'] }],
  },
  {
    folder: 'db/',
    covers: ['db/**'],
    checkPackages: false,
    allow: [{ files: ['db/**'] }],
  },
  { folder: 'tests/', covers: ['tests/**'], checkPackages: false, allow: [{ files: ['**'] }] },
  {
    folder: 'bench/',
    covers: ['bench/**'],
    checkPackages: false,
    allow: [
      { files: ['bench/**', 'shared/**', 'scripts/lib/**'] },
      { from: ['bench/reliability.bench.ts', 'bench/cluster.bench.ts', 'bench/quiltPlan.bench.ts'], files: ['db/connect.ts', 'src/server/auth/password.ts'], why: 'it makes its own accounts' },
      {
        from: ['bench/printPlan.bench.ts'],
        files: ['src/server/print/planPdf.ts', 'src/server/print/quiltPrintPlan.ts', 'scripts/seed/guildDrawings.ts', 'scripts/seed/guildQuilt.ts'],
        why: 'it writes the demo quilt’s printed plan with the server’s own PDF writer, from the seed’s drawings and quilt map',
      },
    ],
  },
  {
    folder: 'scripts/',
    covers: ['scripts/**'],
    checkPackages: true,
    allow: [
      { files: ['scripts/**'], packages: ['node:*'] },
      { from: ['scripts/lib/mailSink.mjs'], packages: ['smtp-server', 'mailparser'], why: 'the local mail fake, started after npm ci' },
      { from: ['scripts/lib/s3Fake.mjs'], packages: ['s3rver'], why: 'the local object-storage fake, started after npm ci' },
      { from: ['scripts/lib/engineWorker.mjs'], packages: ['esbuild'], why: 'it bundles the engine worker, loading esbuild after npm ci' },
      { from: ['scripts/serve.mjs'], files: ['dist/server/entry.mjs'], why: 'it serves the build' },
      { from: ['scripts/plan-worker.mjs'], files: ['dist/jobs/planWorker.mjs'], why: 'it starts the built planning worker process' },
      {
        from: ['scripts/seed/**'],
        files: ['db/**', 'shared/**', 'src/server/**'],
        packages: ['kysely', 'node:*'],
        why: 'the demo seed (run with tsx after npm ci and the migrations) plans its designs with the engine and writes the guild through the server’s repositories and services, so the demo passes the rules a quilter’s save does',
      },
    ],
  },
];

const globCache = new Map<string, RegExp>();
/** `**` any run of folders, `*` any run of characters inside one name. */
export function globMatch(glob: string, value: string): boolean {
  let re = globCache.get(glob);
  if (!re) {
    const body = glob
      .split(/(\*\*\/|\*\*|\*)/)
      .map((part) => (part === '**/' ? '(?:.*/)?' : part === '**' ? '.*' : part === '*' ? '[^/]*' : part.replace(/[.+?^${}()|[\]\\]/g, '\\$&')))
      .join('');
    re = new RegExp(`^${body}$`);
    globCache.set(glob, re);
  }
  return re.test(value);
}

const anyMatch = (globs: readonly string[] | undefined, value: string): boolean => (globs ?? []).some((g) => globMatch(g, value));

export function ruleFor(file: string, rules: readonly FolderRule[] = folderRules): FolderRule | undefined {
  return rules.find((rule) => anyMatch(rule.covers, file));
}

export function isAllowed(rule: FolderRule, file: string, target: ImportTarget): boolean {
  if (target.kind === 'package' && !rule.checkPackages) return true;
  return rule.allow.some(
    (a) =>
      (a.from === undefined || anyMatch(a.from, file)) &&
      (target.kind === 'file' ? anyMatch(a.files, target.path) && !anyMatch(a.filesExcept, target.path) : anyMatch(a.packages, target.name)),
  );
}

export interface Violation {
  rule: string;
  file: string;
  line: number;
  specifier: string;
}

/** Every broken rule in the tree at `root`. `aliases` maps each alias to its folder relative to the root. */
export function checkTree(
  root: string,
  aliases: Readonly<Record<string, string>>,
  options: { skip?: readonly string[]; rules?: readonly FolderRule[] } = {},
): Violation[] {
  const rules = options.rules ?? folderRules;
  const sites: ImportSite[] = readTreeImports(root, listSourceFiles(root, options.skip));
  const violations: Violation[] = [];
  for (const site of sites) {
    const at = { file: site.file, line: site.line, specifier: site.specifier };
    if (climbs(site.specifier) >= 3) violations.push({ rule: 'climbs three folders', ...at });
    const rule = ruleFor(site.file, rules);
    if (rule && !isAllowed(rule, site.file, resolveImport(site.file, site.specifier, aliases))) {
      violations.push({ rule: rule.folder, ...at });
    }
  }
  return violations;
}

/** One line per violation, for failure messages. */
export const formatViolation = (v: Violation): string => `${v.file}:${v.line} imports '${v.specifier}' (${v.rule})`;
