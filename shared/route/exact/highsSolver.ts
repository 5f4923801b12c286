/**
 * The LpSolver port filled by HiGHS (Huangfu & Hall's solver from the University of Edinburgh) compiled to
 * WebAssembly: npm package `highs` (MIT), pinned in package.json. The wasm file ships inside the package (about
 * 3.5 MB); nothing is downloaded at install or run time. The planner uses its dual simplex for linear programs only:
 * the branching is our own (branchAndCut.ts), so cuts can be added at every node of the tree. Loading is
 * asynchronous (compile the wasm, ~0.1 s); every call after that is synchronous, so the planner itself stays synchronous. One loaded instance serves one
 * thread: the engine worker loads its own (HiGHS in wasm is single-threaded and not reentrant).
 *
 * In the bundled worker (scripts/lib/engineWorker.mjs) the loader finds `highs.wasm` beside the bundle, where the
 * build copies it.
 */
import loadHighs, { type Highs, type InitOptions, type Model } from 'highs';
import type { LinearProgram, LpSession, LpSolver, SolveOutcome, SparseRows, SolveStatus } from './lpSolver.ts';

/** HiGHS options for every solve: silent, and the same seed each time so a plan is repeatable. */
const BASE_OPTIONS = {
  output_flag: false,
  random_seed: 1,
} as const;

export async function loadHighsSolver(init?: InitOptions): Promise<LpSolver> {
  const highs = await loadHighs(init);
  return {
    name: `HiGHS ${highs.version.string}`,
    open: (program) => openSession(highs, program),
  };
}

function openSession(highs: Highs, program: LinearProgram): LpSession {
  const n = program.cost.length;
  const inf = highs.infinity;
  const model = highs.createModel();
  const finite = (a: Float64Array): Float64Array => a.map((v) => (v === Infinity ? inf : v === -Infinity ? -inf : v));
  model.options.set(BASE_OPTIONS);
  model.passModel({
    numCols: n,
    numRows: program.rows.lower.length,
    colCost: program.cost,
    colLower: finite(program.lower),
    colUpper: finite(program.upper),
    rowLower: finite(program.rows.lower),
    rowUpper: finite(program.rows.upper),
    matrix: { format: 'csr', numRows: program.rows.lower.length, numCols: n, ...csrOf(program.rows) },
  });
  const all = { kind: 'range', from: 0, to: n - 1 } as const;
  return {
    addRows(rows: SparseRows): void {
      if (rows.lower.length === 0) return;
      model.addRows({
        lower: finite(rows.lower),
        upper: finite(rows.upper),
        matrix: { format: 'csr', numRows: rows.lower.length, numCols: n, ...csrOf(rows) },
      });
    },
    setBounds(lower: Float64Array, upper: Float64Array): void {
      if (n > 0) model.changeColsBounds(all, finite(lower), finite(upper));
    },
    solve(timeLimitSeconds: number): SolveOutcome {
      // HiGHS keeps the last basis across added rows and changed bounds, so each solve starts from the one before.
      model.zeroAllClocks();
      model.options.set({ time_limit: Math.max(timeLimitSeconds, 1e-3) });
      const result = model.run();
      return outcomeOf(highs, model, result.modelStatus);
    },
    dispose: () => model.dispose(),
  };
}

function csrOf(rows: SparseRows): { starts: Int32Array; indices: Int32Array; values: Float64Array } {
  return { starts: rows.starts, indices: rows.indices, values: rows.values };
}

function outcomeOf(highs: Highs, model: Model, code: number): SolveOutcome {
  const codes = highs.constants.modelStatus;
  const status: SolveStatus = code === codes.optimal ? 'optimal' : code === codes.timeLimit ? 'time-limit' : code === codes.infeasible ? 'infeasible' : 'failed';
  const seconds = model.getRunTime();
  if (status !== 'optimal') return { status, values: null, bound: status === 'infeasible' ? Infinity : -Infinity, reducedCosts: null, seconds };
  const solution = model.getSolution();
  return { status, values: Float64Array.from(solution.colValue), bound: model.getObjectiveValue(), reducedCosts: Float64Array.from(solution.colDual), seconds };
}
