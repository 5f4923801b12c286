import type { LinearProgram, SparseRows } from './lpSolver.ts';
import type { ReducedGraph } from './reduceGraph.ts';

/** One travel group's rural postman instance over its reduced graph. Costs are integers in TravelGraph units. */
export interface RppInstance {
  readonly reduced: ReducedGraph;
  /** Kept index of the fixed start and end, or −1 where the end is free. */
  readonly start: number;
  readonly end: number;
  readonly extraStops: number;
  /** Cost of a free thread end at each kept vertex (−1: no free end may be there). */
  readonly endCost: Float64Array;
  /** The same in design units as the solver sees it (threadEnds.ts: solverEndCostAt). */
  readonly solverEndCost: Float64Array;
  /** Design units per cost unit (the solver works in design units to keep its tolerances meaningful). */
  readonly quantum: number;
}

/**
 * The integer program (every column a whole number; branchAndCut.ts branches to make them so) (Ghiani & Laporte, Math. Programming 87 (2000) 467–481, with the free ends of
 * docs/engine.md §3.1 through a dummy vertex D):
 *   x_e ∈ {0,1,2} travel count on each reduced travel edge (≤ 1 inside one piece), x_r ∈ {0,1} extra traversal of
 *   each required edge,
 *   y_v ∈ {0,1} a free thread end at kept vertex v (an edge v–D), z_v ≥ 0 integer;
 *   parity: Σ_{e∋v} x_e + y_v + b_v = 2 z_v at every kept vertex (b_v: quilting-line ends and fixed ends at v, mod 2),
 *   and Σ_{e∋v} x_e + y_v ≥ 1 where b_v is odd (implied for integers, and it tightens the relaxation);
 *   ends: Σ y_v ≤ (free route ends) + 2·(extra stops);
 *   connectivity (added as cuts): every vertex set S holding some but not all pieces has x(δ(S)) + y(δ(S)) ≥ 2 − c(S),
 *   where c(S) counts the closing edge (start–end, or fixed end–D) crossing S;
 *   minimise Σ cost·x + Σ endCost·y.
 * A solution is a route: quilting lines + travel + closing edge + D-edges form one connected Eulerian multigraph,
 * whose Euler circuit, cut at the closing edge and at D, gives the passes (see buildPasses.ts).
 */
export interface RppProgram {
  readonly program: LinearProgram;
  /** Support-graph node of D (kept vertices are nodes 0..kept−1). */
  readonly d: number;
  /** Column, ends (support nodes) and integer cost of every x and y column; z columns come after them. */
  readonly colA: Int32Array;
  readonly colB: Int32Array;
  readonly colCost: Float64Array;
  /** Number of x and y columns (the edge columns). */
  readonly edgeCols: number;
  /** Columns [0, travelCols) are the travel edges, in reduced.travel order. */
  readonly travelCols: number;
  readonly requiredCol: Int32Array;
  readonly endCol: Int32Array;
  /** The closing edge as support nodes, or null. */
  readonly closing: readonly [number, number] | null;
  /** Per support node (kept vertices, then D): 1 where quilting-line ends plus closing edge ends are odd. */
  readonly odd: Uint8Array;
}

export function buildRppProgram(inst: RppInstance): RppProgram {
  const { reduced, start, end, extraStops, endCost, solverEndCost, quantum } = inst;
  const k = reduced.kept.length;
  const d = k;
  const freeEnds = (start < 0 ? 1 : 0) + (end < 0 ? 1 : 0);
  const maxEnds = freeEnds + 2 * extraStops;
  const a: number[] = [];
  const b: number[] = [];
  const cost: number[] = [];
  const solverCost: number[] = [];
  const upper: number[] = [];
  const add = (u: number, v: number, c: number, sc: number, ub: number): number => {
    a.push(u);
    b.push(v);
    cost.push(c);
    solverCost.push(sc);
    upper.push(ub);
    return a.length - 1;
  };
  // Two traversals of a path inside one piece are never needed: dropping both keeps parity, and the piece's own
  // lines still join the two ends (Ghiani & Laporte 2000 bound such edges by 1). Between pieces, up to 2.
  for (const t of reduced.travel) {
    const samePiece = reduced.pieceOf[t.a]! >= 0 && reduced.pieceOf[t.a] === reduced.pieceOf[t.b];
    add(t.a, t.b, t.cost, t.cost * quantum, samePiece ? 1 : 2);
  }
  const travelCols = a.length;
  const requiredCol = Int32Array.from(reduced.required, (r) => (r.a === r.b ? -1 : add(r.a, r.b, r.cost, r.cost * quantum, 1)));
  const endCol = new Int32Array(k).fill(-1);
  if (maxEnds > 0) for (let v = 0; v < k; v++) if (endCost[v]! >= 0) endCol[v] = add(v, d, endCost[v]!, solverEndCost[v]!, 1);
  const edgeCols = a.length;

  let closing: readonly [number, number] | null = null;
  if (start >= 0 && end >= 0 && start !== end) closing = [start, end];
  else if (start >= 0 && end < 0) closing = [start, d];
  else if (end >= 0 && start < 0) closing = [end, d];
  const parityConst = Uint8Array.from([...reduced.parity, 0]);
  if (closing) for (const v of closing) parityConst[v]! ^= 1;

  // Parity rows: one per kept vertex with an edge column or an odd constant; each gets its own z column.
  const incident: number[][] = Array.from({ length: k }, () => []);
  for (let c = 0; c < edgeCols; c++) {
    incident[a[c]!]!.push(c);
    if (b[c]! < k) incident[b[c]!]!.push(c);
  }
  const rows = new RowBuilder();
  let zCol = edgeCols;
  for (let v = 0; v < k; v++) {
    const cols = incident[v]!;
    if (cols.length === 0 && parityConst[v] === 0) continue;
    const degreeCap = cols.reduce((s, c) => s + upper[c]!, 0) + parityConst[v]!;
    rows.add([...cols, zCol], [...cols.map(() => 1), -2], -parityConst[v]!, -parityConst[v]!);
    // Parity leaves the linear relaxation almost free (z is continuous there); an odd vertex needs ≥ 1 traversal.
    if (parityConst[v] === 1) rows.add(cols, cols.map(() => 1), 1, Infinity);
    a.push(v);
    b.push(v);
    cost.push(0);
    solverCost.push(0);
    upper.push(Math.floor(degreeCap / 2));
    zCol++;
  }
  const ends = Array.from(endCol).filter((c) => c >= 0);
  if (ends.length > 0) rows.add(ends, ends.map(() => 1), -Infinity, maxEnds);

  const n = a.length;
  const colCost = Float64Array.from(cost);
  const program: LinearProgram = {
    cost: Float64Array.from(solverCost),
    lower: new Float64Array(n),
    upper: Float64Array.from(upper),
    rows: rows.build(),
  };
  return { program, d, colA: Int32Array.from(a), colB: Int32Array.from(b), colCost, edgeCols, travelCols, requiredCol, endCol, closing, odd: parityConst };
}

/** Accumulates sparse rows; a row with a key is added once per builder (cut separators find some sets twice). */
export class RowBuilder {
  private readonly keys = new Set<string>();
  private lower: number[] = [];
  private upper: number[] = [];
  private starts: number[] = [0];
  private indices: number[] = [];
  private values: number[] = [];

  get size(): number {
    return this.lower.length;
  }

  /** Whether a row with this key is already here. */
  has(key: string): boolean {
    return this.keys.has(key);
  }

  add(cols: readonly number[], coefs: readonly number[], lower: number, upper: number, key?: string): void {
    if (key !== undefined) {
      if (this.keys.has(key)) return;
      this.keys.add(key);
    }
    this.indices.push(...cols);
    this.values.push(...coefs);
    this.starts.push(this.indices.length);
    this.lower.push(lower);
    this.upper.push(upper);
  }

  build(): SparseRows {
    return {
      lower: Float64Array.from(this.lower),
      upper: Float64Array.from(this.upper),
      starts: Int32Array.from(this.starts),
      indices: Int32Array.from(this.indices),
      values: Float64Array.from(this.values),
    };
  }
}
