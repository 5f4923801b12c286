/**
 * What the exact planner needs from a linear-programming solver, and nothing more. The core depends on this port
 * only; `highsSolver.ts` fills it with HiGHS compiled to WebAssembly (loaded once per process or worker, then
 * synchronous), and tests may fill it with anything that solves the same programs exactly. The branching that makes
 * the answers whole numbers is the planner's own (branchAndCut.ts).
 */

/** Rows in compressed sparse row form: row r is `lower[r] ≤ Σ values[k]·x[indices[k]] ≤ upper[r]` for k in [starts[r], starts[r+1]). */
export interface SparseRows {
  readonly lower: Float64Array;
  readonly upper: Float64Array;
  readonly starts: Int32Array;
  readonly indices: Int32Array;
  readonly values: Float64Array;
}

/** Minimise Σ cost·x subject to the rows and column bounds. */
export interface LinearProgram {
  readonly cost: Float64Array;
  readonly lower: Float64Array;
  readonly upper: Float64Array;
  readonly rows: SparseRows;
}

/**
 * - `optimal`: solved to optimality;
 * - `time-limit`: stopped by the time limit;
 * - `infeasible`: proven to have no solution;
 * - `failed`: anything else (numerical trouble, an unexpected status); treat as no information.
 */
export type SolveStatus = 'optimal' | 'time-limit' | 'infeasible' | 'failed';

export interface SolveOutcome {
  readonly status: SolveStatus;
  /** Column values of the optimum, or null unless `optimal`. */
  readonly values: Float64Array | null;
  /** The optimum's objective when `optimal` (a lower bound for every point of the program), Infinity when infeasible, else −Infinity. */
  readonly bound: number;
  /** Reduced cost of every column at the optimum, or null unless `optimal`. */
  readonly reducedCosts: Float64Array | null;
  /** Solver wall time of this call, in seconds (measured by the solver). */
  readonly seconds: number;
}

/** One program kept in the solver between calls, so rows can be added and bounds changed, and it solved again. */
export interface LpSession {
  /** Appends rows over the existing columns. */
  addRows(rows: SparseRows): void;
  /** Replaces the bounds of every column (the program's own bounds until first called). */
  setBounds(lower: Float64Array, upper: Float64Array): void;
  solve(timeLimitSeconds: number): SolveOutcome;
  /** Frees the solver's memory; the session is unusable afterwards. */
  dispose(): void;
}

export interface LpSolver {
  /** Name and version, for reports ("HiGHS 1.15.3"). */
  readonly name: string;
  open(program: LinearProgram): LpSession;
}
