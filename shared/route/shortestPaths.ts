import type { TravelGraph } from './travelGraph.ts';

/**
 * Dijkstra's algorithm (Numer. Math. 1, 1959) over a TravelGraph with a binary heap and lazy deletion.
 * One PathSearch object reuses its typed buffers across many searches; each search only resets what it touched.
 */
export class PathSearch {
  private readonly dist: Float64Array;
  private readonly pred: Int32Array;
  private readonly done: Uint8Array;
  private touched: Int32Array;
  private touchedCount = 0;
  private heapKey: Float64Array;
  private heapVal: Int32Array;
  private heapSize = 0;

  /** Number of vertices of the travel graph. */
  get vertexCount(): number {
    return this.graph.vertexCount;
  }

  constructor(private readonly graph: TravelGraph) {
    const n = graph.vertexCount;
    this.dist = new Float64Array(n).fill(Infinity);
    this.pred = new Int32Array(n).fill(-1);
    this.done = new Uint8Array(n);
    this.touched = new Int32Array(Math.max(16, n));
    this.heapKey = new Float64Array(64);
    this.heapVal = new Int32Array(64);
  }

  /**
   * Settles vertices from `sources` (all at distance 0) in order of distance. `onSettle(v, d)` returns true to stop.
   * Returns the last settled distance (the search radius: every unsettled vertex is at least this far) or Infinity
   * when the reachable part was exhausted.
   */
  run(sources: Iterable<number>, onSettle: (v: number, d: number) => boolean): number {
    this.reset();
    for (const s of sources) this.relax(s, 0, -1);
    const { offset, adjEdge, adjVertex, cost } = this.graph;
    while (this.heapSize > 0) {
      const d = this.heapKey[0]!;
      const v = this.heapVal[0]!;
      this.pop();
      if (this.done[v] || d > this.dist[v]!) continue;
      this.done[v] = 1;
      if (onSettle(v, d)) return d;
      for (let q = offset[v]!; q < offset[v + 1]!; q++) {
        const w = adjVertex[q]!;
        if (!this.done[w]) this.relax(w, d + cost[adjEdge[q]!]!, adjEdge[q]!);
      }
    }
    return Infinity;
  }

  distanceTo(v: number): number {
    return this.dist[v]!;
  }

  /** Graph edge ids of the shortest path from the search's sources to v (v must be settled), source side first. */
  pathTo(v: number): number[] {
    const path: number[] = [];
    const { adjEdge, offset, adjVertex } = this.graph;
    let at = v;
    for (let e = this.pred[at]!; e !== -1; e = this.pred[at]!) {
      path.push(e);
      // The predecessor is the other end of e; find it through the adjacency of `at`.
      let next = -1;
      for (let q = offset[at]!; q < offset[at + 1]!; q++) if (adjEdge[q] === e) next = adjVertex[q]!;
      at = next;
    }
    return path.reverse();
  }

  /** Source vertex that the path to v starts from. */
  originOf(v: number): number {
    const { adjEdge, offset, adjVertex } = this.graph;
    let at = v;
    for (let e = this.pred[at]!; e !== -1; e = this.pred[at]!) {
      for (let q = offset[at]!; q < offset[at + 1]!; q++) if (adjEdge[q] === e) at = adjVertex[q]!;
    }
    return at;
  }

  private reset(): void {
    for (let i = 0; i < this.touchedCount; i++) {
      const v = this.touched[i]!;
      this.dist[v] = Infinity;
      this.pred[v] = -1;
      this.done[v] = 0;
    }
    this.touchedCount = 0;
    this.heapSize = 0;
  }

  private relax(v: number, d: number, viaEdge: number): void {
    if (d >= this.dist[v]!) return;
    if (this.dist[v] === Infinity) {
      if (this.touchedCount === this.touched.length) this.touched = grow(this.touched);
      this.touched[this.touchedCount++] = v;
    }
    this.dist[v] = d;
    this.pred[v] = viaEdge;
    this.push(d, v);
  }

  private push(key: number, val: number): void {
    if (this.heapSize === this.heapKey.length) {
      const k = new Float64Array(this.heapKey.length * 2);
      k.set(this.heapKey);
      this.heapKey = k;
      this.heapVal = grow(this.heapVal);
    }
    const keys = this.heapKey;
    const vals = this.heapVal;
    let i = this.heapSize++;
    while (i > 0) {
      const parent = (i - 1) >> 1;
      if (keys[parent]! <= key) break;
      keys[i] = keys[parent]!;
      vals[i] = vals[parent]!;
      i = parent;
    }
    keys[i] = key;
    vals[i] = val;
  }

  private pop(): void {
    const keys = this.heapKey;
    const vals = this.heapVal;
    const size = --this.heapSize;
    if (size === 0) return;
    const key = keys[size]!;
    const val = vals[size]!;
    let i = 0;
    for (;;) {
      let child = 2 * i + 1;
      if (child >= size) break;
      if (child + 1 < size && keys[child + 1]! < keys[child]!) child++;
      if (keys[child]! >= key) break;
      keys[i] = keys[child]!;
      vals[i] = vals[child]!;
      i = child;
    }
    keys[i] = key;
    vals[i] = val;
  }
}

function grow(a: Int32Array): Int32Array {
  const b = new Int32Array(a.length * 2);
  b.set(a);
  return b;
}
