import type { Budget } from './budget.ts';
import type { ConnectivityCuts } from './connectivityCuts.ts';
import type { LpSession, LpSolver, SolveOutcome, SparseRows } from './lpSolver.ts';
import { separateOddCuts } from './oddCuts.ts';
import { RowBuilder, type RppProgram } from './rppProgram.ts';

/** What the search proved and found. Objectives and bounds are in integer cost units (travel + end costs). */
export interface SearchResult {
  /** Column values of the best route found, or null when none beat the route given (`upperCost`). */
  readonly values: Float64Array | null;
  /** Cost of `values`, or `upperCost` when there are none. */
  readonly objective: number;
  /** No route has a smaller objective than this. */
  readonly bound: number;
  /** True when `objective` is proven least. */
  readonly proven: boolean;
  /** Bound of the root's linear relaxation with the cuts found there (the LP bound). */
  readonly lpBound: number;
  readonly cutRounds: number;
  readonly cuts: number;
  /** Nodes of the search tree solved (the root counts as one). */
  readonly nodes: number;
}

const INTEGRAL = 1e-6;
/** Relative tolerance under which a bound counts as meeting a route's cost (the solver's own is about 1e-9). */
const TIE = 1e-9;
const MAX_ROUNDS_AT_ROOT = 200;
const MAX_ROUNDS_AT_NODE = 20;

/** A node of the search tree: the branching bounds on its path from the root, and its bound (its own, or its parent's before it is solved). */
interface TreeNode {
  readonly changes: readonly (readonly [col: number, lower: number, upper: number])[];
  readonly bound: number;
  readonly depth: number;
}

/** How the search compares solver objectives with route costs (integer cost units), and the route to beat. */
export interface SearchUnits {
  /** A solver bound (design units, the solver's end costs) as a bound in cost units. */
  readonly toCost: (solverBound: number) => number;
  /** The inverse of toCost (used for differences only). */
  readonly toSolver: (cost: number) => number;
  /** Cost of a route already known (the heuristic's). */
  readonly upperCost: number;
}

/**
 * Branch-and-cut after Ghiani & Laporte (2000), with the branching our own and HiGHS as the linear-programming
 * engine only. Each node of the tree solves its linear relaxation and separates connectivity cuts
 * (connectivityCuts.ts) and parity cuts (oddCuts.ts) on its own point, round after round, so the cuts work inside
 * the tree as well as at the root; every cut is valid for every route and stays in the program for later nodes.
 * (Handing the program to HiGHS's own integer search, as before, meant it could not ask for our cuts inside its tree;
 * a flow formulation had to keep its routes connected and the search was 2–7 times slower on the hard designs.)
 *
 * Nodes are taken least bound first, so optimality is proven as soon as the least open bound meets the best route.
 * Branching is on the most fractional travel or end column (x ≤ ⌊v⌋ or x ≥ ⌈v⌉), and on a vertex's parity count z
 * only when every one of those is whole. After the root, columns whose reduced cost alone would lift the root bound
 * to the best route are held at the count that stays below it (reduced-cost fixing; e.g. Wolsey, "Integer
 * Programming" (1998), from memory). A whole-number point is a route only when it is connected: that is checked
 * exactly on every such point (ConnectivityCuts.separateInteger), so the fractional separators may miss cuts
 * without harm to the answer.
 *
 * When no route beats `units.upperCost` the result has no values and `proven` says whether that route was proven
 * least. Stops when `limitMs` of the budget is spent, with the least open bound as the bound.
 */
export function searchRoute(
  solver: LpSolver,
  rpp: RppProgram,
  cuts: ConnectivityCuts,
  budget: Budget,
  limitMs: number,
  units: SearchUnits,
): SearchResult {
  const { toCost, toSolver, upperCost } = units;
  const until = budget.spentMs() + limitMs;
  const left = (): number => Math.max(0, until - budget.spentMs()) / 1000;
  const program = rpp.program;
  const n = program.cost.length;
  const session: LpSession = solver.open(program);
  const rootLower = Float64Array.from(program.lower);
  const rootUpper = Float64Array.from(program.upper);
  let best: Float64Array | null = null;
  let bestCost = upperCost;
  let lpBound = -Infinity;
  let cutRounds = 0;
  let cutCount = 0;
  const beaten = (cost: number): boolean => cost >= bestCost - TIE * Math.abs(bestCost);

  const solve = (): SolveOutcome => {
    const out = session.solve(left());
    budget.charge(out.seconds);
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
  };
  // Each outcome carries the node's best bound so far (cost units): −Infinity before its first solve, Infinity when infeasible.
  type Outcome = { kind: 'pruned'; bound: number } | { kind: 'stopped'; bound: number } | { kind: 'solved'; lp: SolveOutcome; bound: number };
  /** Solves a node's relaxation with cut rounds; 'pruned' when infeasible or no better than the best route. */
  const relax = (maxRounds: number, from: number): Outcome => {
    let known = from;
    for (let round = 0; ; round++) {
      if (left() <= 0) return { kind: 'stopped', bound: known };
      const lp = solve();
      if (lp.status === 'infeasible') return { kind: 'pruned', bound: Infinity };
      if (lp.status !== 'optimal' || !lp.values) return { kind: 'stopped', bound: known };
      const bound = Math.max(known, toCost(lp.bound));
      known = bound;
      if (beaten(bound)) return { kind: 'pruned', bound };
      if (round >= maxRounds || !separate(lp.values)) {
        // The fractional separators may miss a cut; on a whole-number point the parts are checked exactly.
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
    // Travel and end columns first, the most fractional; the parity counts z only once every one of those is whole.
    for (let c = 0; c < rpp.edgeCols; c++) {
      const f = values[c]! - Math.floor(values[c]!);
      if (f <= INTEGRAL || f >= 1 - INTEGRAL) continue;
      // The factor is about 1.001 for a travel column (costs run to 1e10 units and more) and 1.0005–1.00075 for an
      // end column (1 to a few units): among (nearly) equally fractional columns travel goes first. Measured on the
      // benchmark designs: without it the hardest (square in a square ≤8) took about twice as long.
      const s = Math.min(f, 1 - f) * (1 + (1e-3 * rpp.colCost[c]!) / (rpp.colCost[c]! + 1));
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
  // Least bound of the nodes closed on a whole-number point. That point is least in the solver's units, which weigh
  // thread ends a little differently from cost units (planGroupExact.ts: slack), so another route in the node may
  // cost a shade less in cost units: a stopped search's bound must not pass over it.
  let closedFloor = Infinity;
  try {
    // Root: cut rounds until no cut is violated; that value is the LP bound.
    const root = relax(MAX_ROUNDS_AT_ROOT, -Infinity);
    nodes++;
    lpBound = root.bound;
    if (root.kind === 'stopped') {
      // The root stays open with the bound it reached (none if it never solved).
      stoppedEarly = true;
      open.push({ changes: [], bound: root.bound, depth: 0 }, new Float64Array(n));
    }
    if (root.kind === 'solved') {
      fixByReducedCosts(root.lp, root.bound);
      const node: TreeNode = { changes: [], bound: root.bound, depth: 0 };
      if (settle(root)) closedFloor = Math.min(closedFloor, root.bound);
      else open.push(node, root.lp.values!);
    }
    while (open.size > 0 && !stoppedEarly) {
      const { node, hint } = open.pop()!;
      if (beaten(node.bound)) continue;
      const col = branchColumn(hint);
      if (col < 0) {
        // Not reached (a whole point was closed when solved); if float rounding ever gets here, keep the bound honest.
        closedFloor = Math.min(closedFloor, node.bound);
        continue;
      }
      const v = hint[col]!;
      for (const [lo, hi] of [
        [Math.ceil(v), Infinity],
        [-Infinity, Math.floor(v)],
      ] as const) {
        const child: TreeNode = { changes: [...node.changes, [col, lo, hi]], bound: node.bound, depth: node.depth + 1 };
        if (!applyBounds(child)) continue;
        const out = relax(MAX_ROUNDS_AT_NODE, node.bound);
        nodes++;
        if (out.kind === 'stopped') {
          // The node goes back unbranched: its bound covers both children, whatever the first one found.
          stoppedEarly = true;
          open.push(node, hint);
          break;
        }
        if (out.kind === 'pruned') continue;
        const solved: TreeNode = { ...child, bound: out.bound };
        if (settle(out)) closedFloor = Math.min(closedFloor, out.bound);
        else open.push(solved, out.lp.values!);
      }
    }
    const proven = !stoppedEarly && open.size === 0;
    const bound = Math.min(bestCost, open.minBound(), closedFloor);
    return {
      values: best,
      objective: best ? bestCost : upperCost,
      bound: proven ? bestCost : shave(bound),
      proven,
      lpBound,
      cutRounds,
      cuts: cutCount,
      nodes,
    };
  } finally {
    session.dispose();
  }

  /** An integral node point is a connected route (relax checked): keep it if better; true when the node is done. */
  function settle(out: { lp: SolveOutcome; bound: number }): boolean {
    const values = out.lp.values!;
    if (!isIntegral(values)) return false;
    const cost = objectiveOf(rpp, values);
    if (cost < bestCost) {
      bestCost = cost;
      best = values;
    }
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

/** Open nodes, least bound first (deeper first among equals), each with its own relaxation's point to branch on. */
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
