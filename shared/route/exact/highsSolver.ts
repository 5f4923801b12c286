/**
 * The MipSolver port filled by HiGHS (Huangfu & Hall's solver from the University of Edinburgh) compiled to
 * WebAssembly: npm package `highs` (MIT), pinned in package.json. The wasm file ships inside the package (about
 * 3.5 MB); nothing is downloaded at install or run time. Loading is asynchronous (compile the wasm, ~0.1 s);
 * every call after that is synchronous, so the planner itself stays synchronous. One loaded instance serves one
 * thread: the engine worker loads its own (HiGHS in wasm is single-threaded and not reentrant).
 *
 * In the bundled worker (scripts/lib/engineWorker.mjs) the loader finds `highs.wasm` beside the bundle, where the
 * build copies it.
 */
import loadHighs, { type Highs, type InitOptions, type Model } from 'highs';
import type { LinearProgram, MipSession, MipSolver, SolveOutcome, SparseRows, SolveStatus } from './mipSolver.ts';

/**
 * HiGHS options for every solve: silent, exact MIP optimality (no relative or absolute gap allowed beyond rounding).
 * Its primal heuristics and symmetry detection are off: the planner brings its own first route, and on these small
 * programs they cost more than they save (measured on shared/testing/multiPieceDesigns.ts: about 20 % less search time).
 */
const BASE_OPTIONS = {
  output_flag: false,
  mip_rel_gap: 0,
  mip_abs_gap: 1e-9,
  random_seed: 1,
  mip_heuristic_run_feasibility_jump: false,
  mip_heuristic_run_rins: false,
  mip_heuristic_run_rens: false,
  mip_heuristic_run_root_reduced_cost: false,
  mip_detect_symmetry: false,
} as const;

export async function loadHighsSolver(init?: InitOptions): Promise<MipSolver> {
  const highs = await loadHighs(init);
  return {
    name: `HiGHS ${highs.version.string}`,
    open: (program) => openSession(highs, program),
  };
}

function openSession(highs: Highs, program: LinearProgram): MipSession {
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
    integrality: Int32Array.from(program.integer),
  });
  const all = { kind: 'range', from: 0, to: n - 1 } as const;
  const integrality = Int32Array.from(program.integer);
  let integerNow = true;
  const run = (timeLimitSeconds: number, integer: boolean): SolveOutcome => {
    // The relaxation is the same model with every column continuous (HiGHS keeps its basis for the next LP).
    if (integer !== integerNow && n > 0) {
      model.changeColsIntegrality(all, integer ? integrality : new Int32Array(n));
      integerNow = integer;
    }
    model.zeroAllClocks();
    model.options.set({ time_limit: Math.max(timeLimitSeconds, 1e-3) });
    const result = model.run();
    return outcomeOf(highs, model, result.modelStatus, integer);
  };
  return {
    addRows(rows: SparseRows): void {
      if (rows.lower.length === 0) return;
      model.addRows({
        lower: finite(rows.lower),
        upper: finite(rows.upper),
        matrix: { format: 'csr', numRows: rows.lower.length, numCols: n, ...csrOf(rows) },
      });
    },
    deleteRows(indices: Int32Array): void {
      if (indices.length > 0) model.deleteRows({ kind: 'set', indices });
    },
    setBounds(lower: Float64Array, upper: Float64Array): void {
      if (n > 0) model.changeColsBounds(all, finite(lower), finite(upper));
    },
    solveRelaxation: (limit) => run(limit, false),
    solveInteger: (limit) => run(limit, true),
    dispose: () => model.dispose(),
  };
}

function csrOf(rows: SparseRows): { starts: Int32Array; indices: Int32Array; values: Float64Array } {
  return { starts: rows.starts, indices: rows.indices, values: rows.values };
}

function outcomeOf(highs: Highs, model: Model, code: number, integer: boolean): SolveOutcome {
  const codes = highs.constants.modelStatus;
  const status: SolveStatus = code === codes.optimal ? 'optimal' : code === codes.timeLimit ? 'time-limit' : code === codes.infeasible ? 'infeasible' : 'failed';
  const seconds = model.getRunTime();
  const hasPoint = Number(model.info.get('primal_solution_status')) === highs.constants.solutionStatus.feasible;
  const solution = hasPoint ? model.getSolution() : null;
  const values = solution ? Float64Array.from(solution.colValue) : null;
  const objective = values ? model.getObjectiveValue() : Infinity;
  let bound = -Infinity;
  if (integer) {
    const b = Number(model.info.get('mip_dual_bound'));
    if (Number.isFinite(b)) bound = b;
  } else if (status === 'optimal') {
    bound = objective;
  }
  if (status === 'infeasible') bound = Infinity;
  const duals = !integer && status === 'optimal' && solution !== null;
  const reducedCosts = duals ? Float64Array.from(solution.colDual) : null;
  const rowValues = duals ? Float64Array.from(solution.rowValue) : null;
  return { status, values, objective, bound, seconds, reducedCosts, rowValues };
}
