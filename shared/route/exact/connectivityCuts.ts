import type { SparseRows } from './mipSolver.ts';
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
  private readonly nodeOf: Int32Array;
  private readonly nodeCount: number;
  private readonly targets: number[];
  private readonly seen = new Set<string>();

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
   * Cuts violated by a fractional point: a max-flow from the first target to each other one on the support graph
   * (capacities = column values, closing edge 1); a flow below 2 gives the cut on the source side.
   */
  separateFractional(values: Float64Array, rows: RowBuilder): void {
    const flow = new MaxFlow(this.nodeCount);
    this.addSupport(flow, values, EPS);
    const root = this.targets[0]!;
    for (let i = 1; i < this.targets.length; i++) {
      const value = flow.run(root, this.targets[i]!, 2);
      if (value < 2 - EPS) this.addCut(rows, flow.sourceSide());
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

  /** Adds x(δ(S)) + y(δ(S)) ≥ 2 − c(S) for S = nodes marked in `side`, once per distinct S. */
  private addCut(rows: RowBuilder, side: Uint8Array): void {
    const key = side.join('');
    const complement = side.map((s) => 1 - s).join('');
    if (this.seen.has(key) || this.seen.has(complement)) return;
    this.seen.add(key);
    const { colA, colB, edgeCols, closing } = this.rpp;
    const cols: number[] = [];
    for (let c = 0; c < edgeCols; c++) if (side[this.nodeOf[colA[c]!]!] !== side[this.nodeOf[colB[c]!]!]) cols.push(c);
    const crossing = closing && side[this.nodeOf[closing[0]]!] !== side[this.nodeOf[closing[1]]!] ? 1 : 0;
    rows.add(cols, cols.map(() => 1), 2 - crossing, Infinity);
  }
}
