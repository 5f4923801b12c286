/**
 * What the exact planner needs from a linear and mixed-integer solver, and nothing more. The core depends on this
 * port only; `highsSolver.ts` fills it with HiGHS compiled to WebAssembly (loaded once per process or worker, then
 * synchronous), and tests may fill it with anything that solves the same programs exactly.
 */

/** Rows in compressed sparse row form: row r is `lower[r] ≤ Σ values[k]·x[indices[k]] ≤ upper[r]` for k in [starts[r], starts[r+1]). */
export interface SparseRows {
  readonly lower: Float64Array;
  readonly upper: Float64Array;
  readonly starts: Int32Array;
  readonly indices: Int32Array;
  readonly values: Float64Array;
}

/** Minimise Σ cost·x subject to the rows and column bounds; columns with `integer[j] = 1` must be whole numbers. */
export interface LinearProgram {
  readonly cost: Float64Array;
  readonly lower: Float64Array;
  readonly upper: Float64Array;
  readonly integer: Uint8Array;
  readonly rows: SparseRows;
}

/**
 * - `optimal`: solved to optimality (for a MIP: the bound met the incumbent, no gap tolerance);
 * - `time-limit`: stopped by the time limit; `values` is the best point found, if any;
 * - `infeasible`: proven to have no solution;
 * - `failed`: anything else (numerical trouble, an unexpected status); treat as no information.
 */
export type SolveStatus = 'optimal' | 'time-limit' | 'infeasible' | 'failed';

export interface SolveOutcome {
  readonly status: SolveStatus;
  /** Column values of the best point found, or null when there is none. */
  readonly values: Float64Array | null;
  /** Objective of `values` (Infinity when none). */
  readonly objective: number;
  /** A proven lower bound on the objective of the program as solved (−Infinity when nothing is known). */
  readonly bound: number;
  /** Solver wall time of this call, in seconds (measured by the solver). */
  readonly seconds: number;
  /** Reduced cost of every column at an optimal linear relaxation (null for integer solves and other statuses). */
  readonly reducedCosts: Float64Array | null;
  /** Activity (left-hand side) of every row at an optimal linear relaxation (null otherwise). */
  readonly rowValues: Float64Array | null;
}

/** One program kept in the solver between calls, so cuts can be added and the program solved again. */
export interface MipSession {
  /** Appends rows over the existing columns. */
  addRows(rows: SparseRows): void;
  /** Removes rows by index (strictly increasing); later rows move up to close the gaps. */
  deleteRows(indices: Int32Array): void;
  /** Replaces the bounds of every column (the program's own bounds until first called). */
  setBounds(lower: Float64Array, upper: Float64Array): void;
  /** Solves the linear relaxation (integrality ignored). */
  solveRelaxation(timeLimitSeconds: number): SolveOutcome;
  /** Solves the mixed-integer program. */
  solveInteger(timeLimitSeconds: number): SolveOutcome;
  /** Frees the solver's memory; the session is unusable afterwards. */
  dispose(): void;
}

export interface MipSolver {
  /** Name and version, for reports ("HiGHS 1.15.1"). */
  readonly name: string;
  open(program: LinearProgram): MipSession;
}
