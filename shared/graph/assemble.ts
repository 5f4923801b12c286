import type { Point } from '../geometry/point.ts';
import { PairTable } from './pairTable.ts';
import type { GraphEdge, LineKind, PlanarGraph } from './planarGraph.types.ts';

/**
 * Straight pieces between noded vertices, each stored once. When lines overlap, the piece keeps the
 * kind of highest priority (quilting > seam > edge: a quilting line laid over a seam is a quilting line
 * there) and, among equals, the first line's source.
 */
export interface Atoms {
  readonly u: number[];
  readonly v: number[];
  readonly kind: LineKind[];
  readonly source: number[];
  /** Unordered vertex pair → atom id. */
  readonly byPair: PairTable;
}

const RANK: Readonly<Record<LineKind, number>> = { quilting: 0, seam: 1, edge: 2 };

export function createAtoms(expected: number): Atoms {
  return { u: [], v: [], kind: [], source: [], byPair: new PairTable(expected) };
}

/** Adds the pieces of one line chain (zero-length pieces never occur: chains have no repeats). */
export function addChain(atoms: Atoms, chain: readonly number[], kind: LineKind, source: number): void {
  for (let k = 1; k < chain.length; k++) {
    const a = chain[k - 1]!;
    const b = chain[k]!;
    const found = atoms.byPair.get(a, b);
    if (found < 0) {
      atoms.byPair.insert(a, b, atoms.u.length);
      atoms.u.push(a);
      atoms.v.push(b);
      atoms.kind.push(kind);
      atoms.source.push(source);
    } else if (RANK[kind] < RANK[atoms.kind[found]!]) {
      atoms.kind[found] = kind;
      atoms.source[found] = source;
    }
  }
}

/** The planar graph plus where each atom ended up (for tracing routes onto it). */
export interface Assembled {
  readonly graph: PlanarGraph;
  /** Edge id holding each atom. */
  readonly atomEdge: Int32Array;
  /** Position of the atom along its edge's points (0 = first piece). */
  readonly atomPos: Int32Array;
  /** 1 when the atom's u→v runs the same way as its edge. */
  readonly atomForward: Uint8Array;
}

/**
 * Joins atoms into edges. A vertex survives when `keep` marks it (line ends, markers, route needs),
 * when its degree is not 2, or when its two atoms differ in kind or source; every other vertex is a
 * bend inside an edge. Closed chains are cut at their middle vertex so no edge is a self-loop (parallel
 * edges remain possible). Degree-2 bends never change parity, so the choice does not affect odd points.
 * Deterministic: surviving vertices keep their noding order, edges follow the vertex order.
 */
export function assembleGraph(xs: readonly number[], ys: readonly number[], atoms: Atoms, keepIn: Uint8Array): Assembled {
  const nV = xs.length;
  const nA = atoms.u.length;
  const start = new Int32Array(nV + 1);
  for (let a = 0; a < nA; a++) {
    start[atoms.u[a]! + 1]!++;
    start[atoms.v[a]! + 1]!++;
  }
  for (let v = 0; v < nV; v++) start[v + 1]! += start[v]!;
  const fill = start.slice(0, nV);
  const adj = new Int32Array(2 * nA);
  for (let a = 0; a < nA; a++) {
    adj[fill[atoms.u[a]!]!++] = a;
    adj[fill[atoms.v[a]!]!++] = a;
  }
  const keep = Uint8Array.from(keepIn);
  for (let v = 0; v < nV; v++) {
    const deg = start[v + 1]! - start[v]!;
    if (deg === 2) {
      const a = adj[start[v]!]!;
      const b = adj[start[v]! + 1]!;
      if (atoms.kind[a] !== atoms.kind[b] || atoms.source[a] !== atoms.source[b]) keep[v] = 1;
    } else if (deg > 0) keep[v] = 1;
  }

  const used = new Uint8Array(nA);
  const chains: { verts: number[]; atoms: number[] }[] = [];
  const walk = (from: number, first: number): void => {
    const verts = [from];
    const list: number[] = [];
    let a = first;
    let cur = from;
    for (;;) {
      used[a] = 1;
      list.push(a);
      const next = atoms.u[a] === cur ? atoms.v[a]! : atoms.u[a]!;
      verts.push(next);
      if (keep[next]) break;
      const s = start[next]!;
      a = adj[s] === a ? adj[s + 1]! : adj[s]!;
      cur = next;
    }
    if (verts[0] === verts[verts.length - 1]) {
      // A closed chain has ≥ 3 atoms (two atoms between the same vertices were merged), so the middle is a bend.
      const mid = verts.length >> 1;
      keep[verts[mid]!] = 1;
      chains.push({ verts: verts.slice(0, mid + 1), atoms: list.slice(0, mid) });
      chains.push({ verts: verts.slice(mid), atoms: list.slice(mid) });
    } else chains.push({ verts, atoms: list });
  };
  for (let v = 0; v < nV; v++) {
    if (!keep[v]) continue;
    for (let k = start[v]!; k < start[v + 1]!; k++) if (!used[adj[k]!]) walk(v, adj[k]!);
  }
  for (let a = 0; a < nA; a++) {
    if (used[a]) continue;
    keep[atoms.u[a]!] = 1; // a closed ring of bends: open it at one of its vertices
    walk(atoms.u[a]!, a);
  }

  const newId = new Int32Array(nV).fill(-1);
  const vertices: Point[] = [];
  for (let v = 0; v < nV; v++) {
    if (keep[v] && start[v + 1]! > start[v]!) {
      newId[v] = vertices.length;
      vertices.push([xs[v]!, ys[v]!]);
    }
  }
  const atomEdge = new Int32Array(nA);
  const atomPos = new Int32Array(nA);
  const atomForward = new Uint8Array(nA);
  const edges: GraphEdge[] = chains.map((chain, id) => {
    const points: Point[] = chain.verts.map((v) => [xs[v]!, ys[v]!]);
    let length = 0;
    chain.atoms.forEach((a, pos) => {
      atomEdge[a] = id;
      atomPos[a] = pos;
      atomForward[a] = atoms.u[a] === chain.verts[pos] ? 1 : 0;
      const p = points[pos]!;
      const q = points[pos + 1]!;
      length += Math.hypot(q[0] - p[0], q[1] - p[1]);
    });
    const u = newId[chain.verts[0]!]!;
    const v = newId[chain.verts[chain.verts.length - 1]!]!;
    if (u < 0 || v < 0) throw new Error('graph/assemble: an edge ends at a vertex that was not kept');
    const first = chain.atoms[0]!;
    return { id, u, v, kind: atoms.kind[first]!, length, points, source: atoms.source[first]! };
  });
  return { graph: { vertices, edges }, atomEdge, atomPos, atomForward };
}
