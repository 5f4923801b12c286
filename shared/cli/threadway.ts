/**
 * Threadway command line, for batch use and scripting:
 *   npm run --silent threadway -- check FILE          route check of the design's own `route`
 *   npm run --silent threadway -- plan FILE [--time-budget MS] [--extra-stops N] [--hidden-end-allowance LEN]
 *                                                   the planner's route, its proof (optimal, lower bound, gap) and
 *                                                   the stops-vs-travel table
 *   npm run --silent threadway -- fill FILE FILLS     the design with motifs added to its patches
 * FILE is a design JSON (shared/design/design.schema.ts); FILLS is `{ "fills": [{ "patch": "all" | n, "motif": {…} }] }`
 * (shared/motifs/fillDesign.ts; patches numbered in reading order). check and plan print one JSON object of
 * figures, fill prints the filled design (the same schema check and plan read); lengths are in the design's
 * units. A bad file or bad usage prints a message naming the field to stderr and exits with code 2.
 */
import { readFileSync } from 'node:fs';
import { designSchema, type Design } from '../design/design.schema.ts';
import { fillDesign, fillsSchema, type Fills } from '../motifs/fillDesign.ts';
import { checkRoute } from '../route/checkRoute.ts';
import { loadHighsSolver } from '../route/exact/highsSolver.ts';
import { toPlanResult } from '../route/routeAnswers.ts';
import { planDesign } from '../route/planDesign.ts';
import { planSettingsSchema, type PlanSettings } from '../route/planSettings.ts';

const USAGE =
  'usage: threadway check FILE | threadway plan FILE [--time-budget MS] [--extra-stops N] [--hidden-end-allowance LEN] | threadway fill FILE FILLS';

function fail(message: string): never {
  process.stderr.write(`threadway: ${message}\n`);
  process.exit(2);
}

function readJson(file: string): unknown {
  let text: string;
  try {
    text = readFileSync(file, 'utf8');
  } catch (e) {
    fail(`cannot read ${file}: ${(e as Error).message}`);
  }
  try {
    return JSON.parse(text);
  } catch (e) {
    fail(`${file} is not valid JSON: ${(e as Error).message}`);
  }
}

function readDesign(file: string): Design {
  const parsed = designSchema.safeParse(readJson(file));
  if (!parsed.success) {
    const issues = parsed.error.issues.slice(0, 10).map((i) => `  ${i.path.join('.') || '(design)'}: ${i.message}`);
    fail(`${file} is not a valid design:\n${issues.join('\n')}`);
  }
  return parsed.data;
}

function readFills(file: string): Fills {
  const parsed = fillsSchema.safeParse(readJson(file));
  if (!parsed.success) {
    const issues = parsed.error.issues.slice(0, 10).map((i) => `  ${i.path.join('.') || '(fills file)'}: ${i.message}`);
    fail(`${file} is not a valid fills file:\n${issues.join('\n')}`);
  }
  return parsed.data;
}

const PLAN_FLAGS: Record<string, keyof PlanSettings> = {
  '--time-budget': 'timeBudgetMs',
  '--extra-stops': 'extraStops',
  '--hidden-end-allowance': 'hiddenEndAllowance',
};

function readSettings(args: readonly string[]): PlanSettings {
  const raw: Record<string, number> = {};
  for (let i = 0; i < args.length; i += 2) {
    const key = PLAN_FLAGS[args[i]!];
    const value = args[i + 1];
    if (!key || value === undefined || value.trim() === '' || !Number.isFinite(Number(value))) fail(USAGE);
    raw[key] = Number(value);
  }
  const parsed = planSettingsSchema.safeParse(raw);
  if (!parsed.success) fail(parsed.error.issues.map((i) => `${i.path.join('.')}: ${i.message}`).join('\n'));
  return parsed.data;
}

async function plan(design: Design, settings: PlanSettings): Promise<object> {
  const solver = await loadHighsSolver();
  const planned = planDesign(design, { solver, settings, stopsTable: true, clock: () => performance.now() });
  if (!planned.ok) fail(planned.error.message);
  // The API's plan answer (shared/contract/plan.ts), built by the same function, plus the solver's name.
  return { command: 'plan', ...toPlanResult(planned.value), solver: solver.name };
}

function check(design: Design): object {
  if (!design.route || design.route.length === 0) fail('the design has no `route` to check (use `plan` for a planned route)');
  const checked = checkRoute(design);
  if (!checked.ok) fail(checked.error.message);
  const c = checked.value;
  return { command: 'check', ...c };
}

function fill(design: Design, fillsFile: string): Design {
  const filled = fillDesign(design, readFills(fillsFile));
  if (!filled.ok) fail(`${fillsFile}: ${filled.error.path}: ${filled.error.message}`);
  return filled.value;
}

const [command, file, ...rest] = process.argv.slice(2);
if ((command !== 'check' && command !== 'plan' && command !== 'fill') || file === undefined) fail(USAGE);
if ((command === 'check' && rest.length > 0) || (command === 'fill' && rest.length !== 1)) fail(USAGE);
const settings = command === 'plan' ? readSettings(rest) : null;
const design = readDesign(file);
const output = command === 'fill' ? fill(design, rest[0]!) : settings ? await plan(design, settings) : check(design);
process.stdout.write(`${JSON.stringify(output)}\n`);
