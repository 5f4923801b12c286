import type { Budget } from './budget.ts';
import type { ConnectivityCuts } from './connectivityCuts.ts';
import type { MipSolver, SolveOutcome } from './mipSolver.ts';
import { withFlowConnectivity } from './flowConnectivity.ts';
import { separateOddCuts } from './oddCuts.ts';
import { RowBuilder, type RppProgram } from './rppProgram.ts';

/** What the search proved and found. Objectives and bounds are in integer cost units (travel + end costs). */
export interface SearchResult {
  /** Column values of the best connected integer point, or null when the solver found none in time. */
  readonly values: Float64Array | null;
  readonly objective: number;
  /** No route has a smaller objective than this. */
  readonly bound: number;
  /** True when `values` is proven optimal. */
  readonly proven: boolean;
  /** Best bound of the linear relaxation with the cuts found (the LP bound). */
  readonly lpBound: number;
  readonly cutRounds: number;
  readonly cuts: number;
  readonly integerSolves: number;
}

const MAX_LP_ROUNDS = 200;
const MAX_INTEGER_SOLVES = 200;

/**
 * Branch-and-cut after Ghiani & Laporte (2000). First the linear relaxation: solve, separate violated
 * connectivity cuts by minimum cuts on the support graph and violated parity (odd-set) cuts (oddCuts.ts), add them,
 * repeat until none is violated (that value is the LP bound). Then the integer program with those cuts, solved by HiGHS's own branch-and-cut (its mod-2 cuts
 * and branching settle parity); an integer solution whose route falls apart gets one cut per part, the relaxation
 * goes round again, and the program is solved again, until the route is connected. Each program solved is a relaxation of the full one, so every
 * bound met on the way is a valid lower bound. Stops when `limitMs` of the budget is spent. `toCost` turns a
 * solver bound (design units, solver end costs) into a bound in integer cost units.
 */
export function searchRoute(
  solver: MipSolver,
  rpp: RppProgram,
  cuts: ConnectivityCuts,
  budget: Budget,
  limitMs: number,
  toCost: (solverBound: number) => number,
): SearchResult {
  const until = budget.spentMs() + limitMs;
  const left = (): number => Math.max(0, until - budget.spentMs()) / 1000;
  const session = solver.open(withFlowConnectivity(rpp, cuts));
  let bound = -Infinity;
  let lpBound = -Infinity;
  let cutRounds = 0;
  let cutCount = 0;
  let integerSolves = 0;
  const solve = (integer: boolean): SolveOutcome => {
    const out = integer ? session.solveInteger(left()) : session.solveRelaxation(left());
    budget.charge(out.seconds);
    return out;
  };
  // Linear relaxation with cut rounds until no cut is violated; returns false when the budget ran out first.
  const cutLoop = (): boolean => {
    for (let round = 0; round < MAX_LP_ROUNDS; round++, cutRounds++) {
      if (left() <= 0) return false;
      const lp = solve(false);
      if (lp.status !== 'optimal' || !lp.values) return lp.status !== 'time-limit';
      lpBound = Math.max(lpBound, toCost(lp.bound));
      const builder = new RowBuilder();
      if (cuts.needed) cuts.separateFractional(lp.values, builder);
      separateOddCuts(rpp, lp.values, builder);
      if (builder.size === 0) return true;
      const rows = builder.build();
      cutCount += rows.lower.length;
      session.addRows(rows);
    }
    return true;
  };
  try {
    while (integerSolves < MAX_INTEGER_SOLVES && cutLoop()) {
      bound = Math.max(bound, lpBound);
      const mip = solve(true);
      integerSolves++;
      if (Number.isFinite(mip.bound)) bound = Math.max(bound, toCost(mip.bound));
      if (!mip.values) break;
      const rows = cuts.separateInteger(mip.values);
      if (rows === null) {
        const objective = objectiveOf(rpp, mip.values);
        const proven = mip.status === 'optimal';
        // The solver's bound carries its tolerances; the proof is the status, the bound never exceeds the route.
        return { values: mip.values, objective, bound: proven ? objective : Math.min(objective, shave(bound)), proven, lpBound, cutRounds, cuts: cutCount, integerSolves };
      }
      if (mip.status !== 'optimal') break;
      // The parts of this route get their cuts; the relaxation then goes round again before the next integer solve.
      cutCount += rows.lower.length;
      session.addRows(rows);
    }
    bound = Math.max(bound, lpBound);
    return { values: null, objective: Infinity, bound: shave(bound), proven: false, lpBound, cutRounds, cuts: cutCount, integerSolves };
  } finally {
    session.dispose();
  }
}

/** Integer objective of a solution (edge columns only; z columns cost nothing). */
export function objectiveOf(rpp: RppProgram, values: Float64Array): number {
  let sum = 0;
  for (let c = 0; c < rpp.edgeCols; c++) sum += rpp.colCost[c]! * Math.round(values[c]!);
  return sum;
}

/** A solver bound, made safe against its floating-point tolerances (relative 1e-9). */
function shave(bound: number): number {
  return Number.isFinite(bound) ? bound - Math.abs(bound) * 1e-9 : bound;
}
