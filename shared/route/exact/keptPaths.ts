import type { TravelGraph } from '../travelGraph.ts';
import type { ReducedEdge } from './reduceGraph.ts';

/**
 * The travel edges of the reduced graph (Christofides et al. 1981): for kept vertices i < j, the shortest travel
 * path from i to j, unless a shortest path passes through another kept vertex k (then d(i,k) + d(k,j) = d(i,j) and
 * the two shorter edges already offer that path; this is the "dominated path" rule).
 *
 * One Dijkstra per kept vertex, with a flag per vertex: "some shortest path from the source to here passes through
 * a kept vertex". Flags propagate along ties (integer costs make ties exact). The search stops once every vertex
 * still waiting is flagged, so it only explores up to the kept vertices around the source.
 */
export function findKeptPaths(travel: TravelGraph, kept: Int32Array, keptIndex: Int32Array): ReducedEdge[] {
  const search = new FlaggedSearch(travel);
  const out: ReducedEdge[] = [];
  for (let i = 0; i < kept.length; i++) {
    search.run(kept[i]!, keptIndex, (v, d) => {
      const j = keptIndex[v]!;
      if (j > i) out.push({ a: i, b: j, edges: search.pathTo(v), cost: d });
    });
  }
  return out;
}

class FlaggedSearch {
  private readonly dist: Float64Array;
  private readonly pred: Int32Array;
  private readonly flag: Uint8Array;
  private readonly done: Uint8Array;
  private touched: number[] = [];
  private heap = new MinHeap();

  constructor(private readonly graph: TravelGraph) {
    const n = graph.vertexCount;
    this.dist = new Float64Array(n).fill(Infinity);
    this.pred = new Int32Array(n).fill(-1);
    this.flag = new Uint8Array(n);
    this.done = new Uint8Array(n);
  }

  /** Calls `onKept(v, d)` for every kept vertex v ≠ source reached by an unflagged shortest path. */
  run(source: number, keptIndex: Int32Array, onKept: (v: number, d: number) => void): void {
    for (const v of this.touched) {
      this.dist[v] = Infinity;
      this.pred[v] = -1;
      this.flag[v] = 0;
      this.done[v] = 0;
    }
    this.touched = [source];
    this.heap.clear();
    this.dist[source] = 0;
    this.heap.push(0, source);
    let unflaggedWaiting = 1;
    const { offset, adjEdge, adjVertex, cost } = this.graph;
    while (this.heap.size > 0 && unflaggedWaiting > 0) {
      const [d, v] = this.heap.pop();
      if (this.done[v] || d > this.dist[v]!) continue;
      this.done[v] = 1;
      if (!this.flag[v]) unflaggedWaiting--;
      const isKept = v !== source && keptIndex[v]! >= 0;
      if (isKept && !this.flag[v]) onKept(v, d);
      // Everything reached through v is flagged if v is kept or flagged itself.
      const passFlag = isKept || this.flag[v] === 1 ? 1 : 0;
      for (let q = offset[v]!; q < offset[v + 1]!; q++) {
        const w = adjVertex[q]!;
        if (this.done[w]) continue;
        const nd = d + cost[adjEdge[q]!]!;
        const old = this.dist[w]!;
        if (nd < old) {
          if (old === Infinity) this.touched.push(w);
          else if (!this.flag[w]) unflaggedWaiting--;
          this.dist[w] = nd;
          this.pred[w] = adjEdge[q]!;
          this.flag[w] = passFlag;
          if (!passFlag) unflaggedWaiting++;
          this.heap.push(nd, w);
        } else if (nd === old && passFlag && !this.flag[w]) {
          this.flag[w] = 1;
          unflaggedWaiting--;
        }
      }
    }
  }

  /** Planar edge ids of the recorded shortest path from the source to v, source side first. */
  pathTo(v: number): number[] {
    const path: number[] = [];
    const { offset, adjEdge, adjVertex } = this.graph;
    for (let at = v, e = this.pred[at]!; e !== -1; e = this.pred[at]!) {
      path.push(e);
      for (let q = offset[at]!; q < offset[at + 1]!; q++) {
        if (adjEdge[q] === e) {
          at = adjVertex[q]!;
          break;
        }
      }
    }
    return path.reverse();
  }
}

/** A binary min-heap of (key, vertex) with lazy deletion left to the caller. */
class MinHeap {
  private keys: number[] = [];
  private vals: number[] = [];

  get size(): number {
    return this.keys.length;
  }

  clear(): void {
    this.keys.length = 0;
    this.vals.length = 0;
  }

  push(key: number, val: number): void {
    const keys = this.keys;
    const vals = this.vals;
    let i = keys.length;
    keys.push(key);
    vals.push(val);
    while (i > 0) {
      const p = (i - 1) >> 1;
      if (keys[p]! <= key) break;
      keys[i] = keys[p]!;
      vals[i] = vals[p]!;
      i = p;
    }
    keys[i] = key;
    vals[i] = val;
  }

  pop(): [number, number] {
    const keys = this.keys;
    const vals = this.vals;
    const top: [number, number] = [keys[0]!, vals[0]!];
    const key = keys.pop()!;
    const val = vals.pop()!;
    const size = keys.length;
    if (size === 0) return top;
    let i = 0;
    for (;;) {
      let c = 2 * i + 1;
      if (c >= size) break;
      if (c + 1 < size && keys[c + 1]! < keys[c]!) c++;
      if (keys[c]! >= key) break;
      keys[i] = keys[c]!;
      vals[i] = vals[c]!;
      i = c;
    }
    keys[i] = key;
    vals[i] = val;
    return top;
  }
}
