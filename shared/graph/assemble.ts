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

  // Chains of atoms between kept vertices, in flat arrays: chain c runs from vertex chainFrom[c] over the atoms
  // chainAtoms[chainOff[c] .. chainOff[c+1]).
  const used = new Uint8Array(nA);
  const chainAtoms = new Int32Array(nA);
  const chainFrom: number[] = [];
  const chainOff: number[] = [0];
  let filled = 0;
  const otherEnd = (a: number, v: number): number => (atoms.u[a] === v ? atoms.v[a]! : atoms.u[a]!);
  const walk = (from: number, first: number): void => {
    const begin = filled;
    let a = first;
    let cur = from;
    for (;;) {
      used[a] = 1;
      chainAtoms[filled++] = a;
      const next = otherEnd(a, cur);
      if (keep[next]) {
        cur = next;
        break;
      }
      const s = start[next]!;
      a = adj[s] === a ? adj[s + 1]! : adj[s]!;
      cur = next;
    }
    chainFrom.push(from);
    if (cur === from) {
      // A closed chain has ≥ 3 atoms (two atoms between the same vertices were merged), so the middle is a bend.
      const mid = (filled - begin + 1) >> 1;
      let at = from;
      for (let k = begin; k < begin + mid; k++) at = otherEnd(chainAtoms[k]!, at);
      keep[at] = 1;
      chainOff.push(begin + mid);
      chainFrom.push(at);
    }
    chainOff.push(filled);
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

  // One shared Point per vertex (points are readonly), so edges and vertices do not copy coordinates.
  const pointOf: (Point | undefined)[] = new Array<Point | undefined>(nV);
  const point = (v: number): Point => (pointOf[v] ??= [xs[v]!, ys[v]!]);
  const newId = new Int32Array(nV).fill(-1);
  const vertices: Point[] = [];
  for (let v = 0; v < nV; v++) {
    if (keep[v] && start[v + 1]! > start[v]!) {
      newId[v] = vertices.length;
      vertices.push(point(v));
    }
  }
  const atomEdge = new Int32Array(nA);
  const atomPos = new Int32Array(nA);
  const atomForward = new Uint8Array(nA);
  const edges: GraphEdge[] = new Array<GraphEdge>(chainFrom.length);
  for (let id = 0; id < chainFrom.length; id++) {
    let cur = chainFrom[id]!;
    const points: Point[] = [point(cur)];
    let length = 0;
    const begin = chainOff[id]!;
    for (let k = begin; k < chainOff[id + 1]!; k++) {
      const a = chainAtoms[k]!;
      atomEdge[a] = id;
      atomPos[a] = k - begin;
      atomForward[a] = atoms.u[a] === cur ? 1 : 0;
      const next = otherEnd(a, cur);
      length += Math.hypot(xs[next]! - xs[cur]!, ys[next]! - ys[cur]!);
      points.push(point(next));
      cur = next;
    }
    const u = newId[chainFrom[id]!]!;
    const v = newId[cur]!;
    if (u < 0 || v < 0) throw new Error('graph/assemble: an edge ends at a vertex that was not kept');
    const first = chainAtoms[begin]!;
    edges[id] = { id, u, v, kind: atoms.kind[first]!, length, points, source: atoms.source[first]! };
  }
  return { graph: { vertices, edges }, atomEdge, atomPos, atomForward };
}
