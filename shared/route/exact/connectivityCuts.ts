import type { SparseRows } from './lpSolver.ts';
import type { ReducedGraph } from './reduceGraph.ts';
import { RowBuilder, type RppProgram } from './rppProgram.ts';
import { UnionFind } from '../unionFind.ts';
import { MaxFlow } from './maxFlow.ts';

const EPS = 1e-6;

/**
 * Connectivity cuts x(δ(S)) + y(δ(S)) ≥ 2 − c(S) for vertex sets S that hold some but not all pieces (Ghiani &
 * Laporte 2000). Pieces are contracted first (their quilting lines are always in the route), so the support graph
 * has one node per piece, one per fixed end off the lines, and D.
 */
export class ConnectivityCuts {
  /** Support node of each kept vertex (and D, last): pieces contracted. */
  readonly nodeOf: Int32Array;
  readonly nodeCount: number;
  /** Support nodes that the route must join: pieces and fixed ends off the lines. */
  readonly targets: readonly number[];

  constructor(
    reduced: ReducedGraph,
    private readonly rpp: RppProgram,
    fixedEnds: readonly number[],
  ) {
    const k = reduced.kept.length;
    const uf = new UnionFind(k + 1);
    for (const r of reduced.required) uf.union(r.a, r.b);
    const ids = new Map<number, number>();
    this.nodeOf = new Int32Array(k + 1);
    for (let v = 0; v <= k; v++) {
      const root = uf.find(v);
      if (!ids.has(root)) ids.set(root, ids.size);
      this.nodeOf[v] = ids.get(root)!;
    }
    this.nodeCount = ids.size;
    const targets = new Set<number>();
    for (let v = 0; v < k; v++) if (reduced.pieceOf[v]! >= 0 || fixedEnds.includes(v)) targets.add(this.nodeOf[v]!);
    this.targets = [...targets];
  }

  /** Whether the route must join several parts at all. */
  get needed(): boolean {
    return this.targets.length > 1;
  }

  /**
   * Cuts violated by a fractional point, from a cheap tree of the support graph (capacities = column values,
   * closing edge 1): Gusfield's n − 1 max-flows without his re-hanging step, each flow stopped at 3. Its subtrees are
   * candidate sets, each checked on the point against its parity-strengthened right-hand side (see addCut). This may
   * miss a violated cut, which only weakens a bound, never the answer: every integer point is checked exactly
   * (separateInteger). Measured against the exact Gomory–Hu tree (maxFlow.ts, as the parity cuts use): the exact tree
   * lifts the bounds a little but adds many more rows, and the search took about 20 % longer over the hard designs.
   */
  separateFractional(values: Float64Array, rows: RowBuilder): void {
    const n = this.nodeCount;
    const flow = new MaxFlow(n);
    this.addSupport(flow, values, EPS);
    const parent = new Int32Array(n);
    const weight = new Float64Array(n);
    for (let s = 1; s < n; s++) {
      weight[s] = flow.run(s, parent[s]!, 3);
      const side = flow.sourceSide();
      for (let j = s + 1; j < n; j++) if (parent[j] === parent[s] && side[j]) parent[j] = s;
    }
    const isTarget = new Uint8Array(n);
    for (const t of this.targets) isTarget[t] = 1;
    for (let v = 1; v < n; v++) {
      if (weight[v]! >= 3 - EPS) continue;
      const side = new Uint8Array(n);
      const stack = [v];
      while (stack.length > 0) {
        const u = stack.pop()!;
        side[u] = 1;
        for (let w = u + 1; w < n; w++) if (parent[w] === u) stack.push(w);
      }
      let inside = 0;
      for (const t of this.targets) inside += side[t]!;
      if (inside === 0 || inside === this.targets.length) continue;
      // The flow counts the closing edge too; the cut's right-hand side is for the columns alone. The subtree's cut
      // is checked on the point itself (addCut): its value may be above the flow's, and only violated cuts are added.
      if (weight[v]! - this.closingAcross(side) < this.rhsOf(side) - EPS) this.addCut(rows, side, values);
    }
  }

  /** For an integer point: null when the route is connected, else one cut per part that holds a target. */
  separateInteger(values: Float64Array): SparseRows | null {
    const uf = new UnionFind(this.nodeCount);
    const { colA, colB, edgeCols, closing } = this.rpp;
    for (let c = 0; c < edgeCols; c++) if (values[c]! > 0.5) uf.union(this.nodeOf[colA[c]!]!, this.nodeOf[colB[c]!]!);
    if (closing) uf.union(this.nodeOf[closing[0]]!, this.nodeOf[closing[1]]!);
    const parts = new Set(this.targets.map((t) => uf.find(t)));
    if (parts.size <= 1) return null;
    const rows = new RowBuilder();
    for (const part of parts) {
      const side = new Uint8Array(this.nodeCount);
      for (let u = 0; u < this.nodeCount; u++) if (uf.find(u) === part) side[u] = 1;
      this.addCut(rows, side);
    }
    return rows.build();
  }

  private addSupport(flow: MaxFlow, values: Float64Array, eps: number): void {
    const { colA, colB, edgeCols, closing } = this.rpp;
    for (let c = 0; c < edgeCols; c++) {
      const x = values[c]!;
      if (x > eps) flow.addEdge(this.nodeOf[colA[c]!]!, this.nodeOf[colB[c]!]!, x);
    }
    if (closing) flow.addEdge(this.nodeOf[closing[0]]!, this.nodeOf[closing[1]]!, 1);
  }

  /**
   * Adds x(δ(S)) + y(δ(S)) ≥ r for S = nodes marked in `side`, once per builder (S and its complement are one cut),
   * and with `values` only when that point violates it (a cut already in the program never is). The route crosses S
   * at least twice (closing edge included) and, by parity, x(δ(S)) + y(δ(S)) ≡ Σ_{v∈S} odd(v) (mod 2): so r is the least number
   * of that parity that is at least 2 − c(S), i.e. 2 or 3 without the closing edge across S, 2 or 1 with it.
   */
  private addCut(rows: RowBuilder, side: Uint8Array, values?: Float64Array): void {
    // Key the side that does not hold D (the last node), so S and its complement share one key.
    const key = `c${(side[this.nodeCount - 1] ? side.map((s) => 1 - s) : side).join('')}`;
    if (rows.has(key)) return;
    const { colA, colB, edgeCols } = this.rpp;
    const cols: number[] = [];
    for (let c = 0; c < edgeCols; c++) if (side[this.nodeOf[colA[c]!]!] !== side[this.nodeOf[colB[c]!]!]) cols.push(c);
    const rhs = this.rhsOf(side);
    if (values && cols.reduce((sum, c) => sum + values[c]!, 0) >= rhs - EPS) return;
    rows.add(cols, cols.map(() => 1), rhs, Infinity, key);
  }

  private closingAcross(side: Uint8Array): number {
    const { closing } = this.rpp;
    return closing && side[this.nodeOf[closing[0]]!] !== side[this.nodeOf[closing[1]]!] ? 1 : 0;
  }

  /** The right-hand side for S (see addCut). */
  private rhsOf(side: Uint8Array): number {
    const { odd } = this.rpp;
    const crossing = this.closingAcross(side);
    let parity = 0;
    for (let v = 0; v < odd.length; v++) if (side[this.nodeOf[v]!]) parity ^= odd[v]!;
    const least = 2 - crossing;
    return least % 2 === parity ? least : least + 1;
  }
}
