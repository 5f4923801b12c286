import type { Budget } from './budget.ts';
import type { ConnectivityCuts } from './connectivityCuts.ts';
import type { MipSession, MipSolver, SolveOutcome, SparseRows } from './mipSolver.ts';
import { separateOddCuts } from './oddCuts.ts';
import { objectiveOf, type SearchResult } from './branchAndCut.ts';
import { RowBuilder, type RppProgram } from './rppProgram.ts';

const INTEGRAL = 1e-6;
/** Relative tolerance under which a bound counts as meeting a route's cost (the solver's own is about 1e-9). */
const TIE = 1e-9;
const MAX_ROUNDS_AT_ROOT = 200;
const MAX_ROUNDS_AT_NODE = Number(process.env.NODE_ROUNDS ?? 20);
const MAX_AGE = Number(process.env.MAX_AGE ?? 0);
/** A cut row this far above its right-hand side is slack. */
const SLACK = 1e-6;

/** A node of the search tree: the branching bounds on its path from the root, and its parent's bound. */
interface TreeNode {
  readonly changes: readonly (readonly [col: number, lower: number, upper: number])[];
  readonly bound: number;
  readonly depth: number;
}

/**
 * Our own branch-and-cut (Ghiani & Laporte 2000, §3), with HiGHS as the linear-programming engine only. Every node of
 * the tree solves its linear relaxation and separates connectivity cuts (connectivityCuts.ts) and parity cuts
 * (oddCuts.ts) on its own point, so the cuts work inside the tree as well as at the root; the cuts are valid for every
 * route and stay in the program for all later nodes. Nodes are taken best bound first, so the search proves
 * optimality as soon as the least open bound meets the best route. Branching is on the most fractional travel count
 * (x ≤ ⌊v⌋ or x ≥ ⌈v⌉), and on a vertex's parity count z when every travel count is whole. After the root, travel
 * counts whose reduced cost alone would lift the bound past the best route are fixed (reduced-cost fixing, e.g.
 * Wolsey, "Integer Programming" (1998) §7.3; from memory).
 *
 * `upperCost` is the cost of a route already known (the heuristic's). When no better route exists the result has no
 * values and `proven` says whether the known route was proven least.
 */
export function searchTree(
  solver: MipSolver,
  rpp: RppProgram,
  cuts: ConnectivityCuts,
  budget: Budget,
  limitMs: number,
  toCost: (solverBound: number) => number,
  toSolver: (cost: number) => number,
  upperCost: number,
): SearchResult {
  const until = budget.spentMs() + limitMs;
  const left = (): number => Math.max(0, until - budget.spentMs()) / 1000;
  const program = rpp.program;
  const n = program.cost.length;
  const session: MipSession = solver.open(program);
  const rootLower = Float64Array.from(program.lower);
  const rootUpper = Float64Array.from(program.upper);
  // Cut rows follow the program's own rows; each has an age: how many solves in a row it has not been tight.
  const baseRows = program.rows.lower.length;
  const cutLower: number[] = [];
  const cutAge: number[] = [];
  let best: Float64Array | null = null;
  let bestCost = upperCost;
  let lpBound = -Infinity;
  let cutRounds = 0;
  let cutCount = 0;
  let lpSolves = 0;
  const beaten = (cost: number): boolean => cost >= bestCost - TIE * Math.abs(bestCost);

  const solve = (): SolveOutcome => {
    const out = session.solveRelaxation(left());
    lpSolves++;
    budget.charge(out.seconds);
    if (out.rowValues) {
      for (let i = 0; i < cutAge.length; i++) cutAge[i] = out.rowValues[baseRows + i]! > cutLower[i]! + SLACK ? cutAge[i]! + 1 : 0;
    }
    return out;
  };
  const separate = (values: Float64Array): boolean => {
    const builder = new RowBuilder();
    if (cuts.needed) cuts.separateFractional(values, builder);
    separateOddCuts(rpp, values, builder);
    if (builder.size === 0) return false;
    addCuts(builder.build());
    return true;
  };
  const addCuts = (rows: SparseRows): void => {
    cutCount += rows.lower.length;
    session.addRows(rows);
    for (const lo of rows.lower) {
      cutLower.push(lo);
      cutAge.push(0);
    }
  };
  /** Drops cuts that have stayed slack for a while (their slack is basic, so the basis survives): smaller programs solve faster. */
  const purge = (): void => {
    const drop: number[] = [];
    for (let i = 0; i < cutAge.length; i++) if (cutAge[i]! >= MAX_AGE) drop.push(i);
    if (drop.length === 0) return;
    session.deleteRows(Int32Array.from(drop, (i) => baseRows + i));
    let w = 0;
    for (let i = 0, d = 0; i < cutAge.length; i++) {
      if (d < drop.length && drop[d] === i) {
        d++;
        continue;
      }
      cutAge[w] = cutAge[i]!;
      cutLower[w++] = cutLower[i]!;
    }
    cutAge.length = cutLower.length = w;
  };

  type Outcome = { kind: 'pruned' } | { kind: 'stopped' } | { kind: 'solved'; lp: SolveOutcome; bound: number };
  /** Solves a node's relaxation with cut rounds; 'pruned' when infeasible or no better than the best route. */
  const relax = (maxRounds: number): Outcome => {
    for (let round = 0; ; round++) {
      if (left() <= 0) return { kind: 'stopped' };
      const lp = solve();
      if (lp.status === 'infeasible') return { kind: 'pruned' };
      if (lp.status !== 'optimal' || !lp.values) return { kind: 'stopped' };
      const bound = toCost(lp.bound);
      if (beaten(bound)) return { kind: 'pruned' };
      if (round >= maxRounds || !separate(lp.values)) {
        // An integer point may still split into parts that no fractional cut showed (it has none then: the
        // Gomory–Hu tree sees every cut under 2); the check below is cheap and keeps the route whole.
        if (isIntegral(lp.values)) {
          const rows = cuts.separateInteger(lp.values);
          if (rows !== null && rows.lower.length > 0) {
            addCuts(rows);
            continue;
          }
        }
        return { kind: 'solved', lp, bound };
      }
      cutRounds++;
    }
  };
  const isIntegral = (values: Float64Array): boolean => {
    for (let c = 0; c < n; c++) if (Math.abs(values[c]! - Math.round(values[c]!)) > INTEGRAL) return false;
    return true;
  };
  const branchColumn = (values: Float64Array): number => {
    let pick = -1;
    let score = -1;
    // Travel and end columns first; the parity counts z only once every one of those is whole.
    for (let c = 0; c < rpp.edgeCols; c++) {
      const f = values[c]! - Math.floor(values[c]!);
      if (f <= INTEGRAL || f >= 1 - INTEGRAL) continue;
      const s = process.env.SCORE === "cost" ? Math.min(f, 1 - f) * (rpp.colCost[c]! + 1) : process.env.SCORE === "half" ? (Math.min(f, 1 - f) > 0.4 ? 1 : Math.min(f, 1 - f)) * (rpp.colCost[c]! + 1) : Math.min(f, 1 - f) * (1 + 1e-3 * rpp.colCost[c]! / (rpp.colCost[c]! + 1));
      if (s > score) {
        score = s;
        pick = c;
      }
    }
    if (pick >= 0) return pick;
    for (let c = rpp.edgeCols; c < n; c++) {
      const f = values[c]! - Math.floor(values[c]!);
      if (f > INTEGRAL && f < 1 - INTEGRAL) return c;
    }
    return -1;
  };

  const lower = new Float64Array(n);
  const upper = new Float64Array(n);
  const applyBounds = (node: TreeNode): boolean => {
    lower.set(rootLower);
    upper.set(rootUpper);
    for (const [c, lo, hi] of node.changes) {
      lower[c] = Math.max(lower[c]!, lo);
      upper[c] = Math.min(upper[c]!, hi);
      if (lower[c]! > upper[c]!) return false;
    }
    session.setBounds(lower, upper);
    return true;
  };

  const open = new NodeHeap();
  let stoppedEarly = false;
  let nodes = 0;
  try {
    // Root: cut rounds until no cut is violated; that value is the LP bound.
    const root = relax(MAX_ROUNDS_AT_ROOT);
    nodes++;
    if (root.kind === 'stopped') stoppedEarly = true;
    if (root.kind === 'solved') {
      lpBound = root.bound;
      fixByReducedCosts(root.lp, root.bound);
      const node: TreeNode = { changes: [], bound: root.bound, depth: 0 };
      if (!settle(node, root)) open.push(node, root.lp.values!);
    }
    while (open.size > 0 && !stoppedEarly) {
      const { node, hint } = open.pop()!;
      if (beaten(node.bound)) continue;
      const col = branchColumn(hint);
      if (col < 0) continue;
      const v = hint[col]!;
      for (const [lo, hi] of [
        [Math.ceil(v), Infinity],
        [-Infinity, Math.floor(v)],
      ] as const) {
        const child: TreeNode = { changes: [...node.changes, [col, lo, hi]], bound: node.bound, depth: node.depth + 1 };
        if (!applyBounds(child)) continue;
        if (MAX_AGE > 0) purge();
        const out = relax(MAX_ROUNDS_AT_NODE);
        nodes++;
        if (out.kind === 'stopped') {
          stoppedEarly = true;
          open.push(child, hint);
          break;
        }
        if (out.kind === 'pruned') continue;
        const solved: TreeNode = { ...child, bound: Math.max(child.bound, out.bound) };
        if (!settle(solved, out)) open.push(solved, out.lp.values!);
      }
    }
    const openBound = open.minBound();
    const bound = Math.min(bestCost, Math.max(lpBound, openBound));
    const proven = !stoppedEarly && open.size === 0;
    if (process.env.TREE_DEBUG) console.log(`tree: rows=${cutAge.length} nodes=${nodes} lps=${lpSolves} cuts=${cutCount} best=${bestCost} lp=${lpBound}`);
    return {
      values: best,
      objective: best ? bestCost : upperCost,
      bound: proven ? bestCost : shave(bound),
      proven,
      lpBound,
      cutRounds,
      cuts: cutCount,
      integerSolves: nodes,
    };
  } finally {
    session.dispose();
  }

  /** An integral node point is a connected route (relax checked): keep it if better; true when the node is done. */
  function settle(node: TreeNode, out: { lp: SolveOutcome; bound: number }): boolean {
    const values = out.lp.values!;
    if (!isIntegral(values)) return false;
    const cost = objectiveOf(rpp, values);
    if (cost < bestCost) {
      bestCost = cost;
      best = values;
    }
    void node;
    return true;
  }

  /** Fixes the upper bound of columns whose root reduced cost exceeds the room between the root bound and the best route. */
  function fixByReducedCosts(lp: SolveOutcome, rootBound: number): void {
    const d = lp.reducedCosts;
    if (!d || !Number.isFinite(bestCost)) return;
    const room = toSolver(bestCost) - toSolver(rootBound);
    for (let c = 0; c < rpp.edgeCols; c++) {
      if (d[c]! <= 0 || lp.values![c]! > INTEGRAL) continue;
      const most = Math.floor((room * (1 + TIE)) / d[c]! + TIE);
      if (most < rootUpper[c]!) rootUpper[c] = Math.max(0, most);
    }
    session.setBounds(rootLower, rootUpper);
  }
}

/** A solver bound, made safe against its floating-point tolerances (relative 1e-9). */
function shave(bound: number): number {
  return Number.isFinite(bound) ? bound - Math.abs(bound) * 1e-9 : bound;
}

/** Open nodes, least bound first (deeper first among equals), each with its parent's point to branch on. */
class NodeHeap {
  private items: { node: TreeNode; hint: Float64Array }[] = [];

  get size(): number {
    return this.items.length;
  }

  minBound(): number {
    return this.items.length === 0 ? Infinity : this.items[0]!.node.bound;
  }

  push(node: TreeNode, hint: Float64Array): void {
    const items = this.items;
    items.push({ node, hint });
    let i = items.length - 1;
    while (i > 0) {
      const p = (i - 1) >> 1;
      if (!before(items[i]!.node, items[p]!.node)) break;
      [items[i], items[p]] = [items[p]!, items[i]!];
      i = p;
    }
  }

  pop(): { node: TreeNode; hint: Float64Array } | undefined {
    const items = this.items;
    if (items.length === 0) return undefined;
    const top = items[0]!;
    const last = items.pop()!;
    if (items.length > 0) {
      items[0] = last;
      let i = 0;
      for (;;) {
        const l = 2 * i + 1;
        const r = l + 1;
        let m = i;
        if (l < items.length && before(items[l]!.node, items[m]!.node)) m = l;
        if (r < items.length && before(items[r]!.node, items[m]!.node)) m = r;
        if (m === i) break;
        [items[i], items[m]] = [items[m]!, items[i]!];
        i = m;
      }
    }
    return top;
  }
}

function before(a: TreeNode, b: TreeNode): boolean {
  return a.bound < b.bound || (a.bound === b.bound && a.depth > b.depth);
}
