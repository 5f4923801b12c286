/**
 * Maximum flow on a small undirected graph with real capacities: Edmonds & Karp (J. ACM 19 (1972) 248–264),
 * shortest augmenting paths by breadth-first search. `run` stops as soon as the flow reaches `enough`, since the
 * cut separation only asks whether a cut is below 2. After `run`, `sourceSide()` marks the nodes the source still
 * reaches in the residual graph: the source side of a minimum cut when the flow stayed below `enough`.
 */
export class MaxFlow {
  private readonly head: Int32Array;
  private next: number[] = [];
  private to: number[] = [];
  private cap: number[] = [];
  private flow: Float64Array = new Float64Array(0);
  private reached: Uint8Array;

  constructor(private readonly n: number) {
    this.head = new Int32Array(n).fill(-1);
    this.reached = new Uint8Array(n);
  }

  /** An undirected edge: capacity c in both directions (arc 2i one way, 2i+1 the other). */
  addEdge(u: number, v: number, c: number): void {
    if (u === v) return;
    for (const [x, y] of [[u, v], [v, u]] as const) {
      this.to.push(y);
      this.cap.push(c);
      this.next.push(this.head[x]!);
      this.head[x] = this.to.length - 1;
    }
  }

  run(s: number, t: number, enough: number): number {
    this.flow = new Float64Array(this.to.length);
    const predArc = new Int32Array(this.n);
    const queue = new Int32Array(this.n);
    let total = 0;
    while (total < enough) {
      this.reached.fill(0);
      this.reached[s] = 1;
      let qh = 0;
      let qt = 0;
      queue[qt++] = s;
      while (qh < qt && !this.reached[t]) {
        const u = queue[qh++]!;
        for (let arc = this.head[u]!; arc !== -1; arc = this.next[arc]!) {
          const w = this.to[arc]!;
          if (this.reached[w] || this.residual(arc) <= 1e-12) continue;
          this.reached[w] = 1;
          predArc[w] = arc;
          queue[qt++] = w;
        }
      }
      if (!this.reached[t]) return total;
      let push = Infinity;
      for (let w = t; w !== s; w = this.to[predArc[w]! ^ 1]!) push = Math.min(push, this.residual(predArc[w]!));
      for (let w = t; w !== s; w = this.to[predArc[w]! ^ 1]!) {
        this.flow[predArc[w]!]! += push;
        this.flow[predArc[w]! ^ 1]! -= push;
      }
      total += push;
    }
    return total;
  }

  /** Nodes reachable from the source in the residual graph of the last run (1 = source side). */
  sourceSide(): Uint8Array {
    return Uint8Array.from(this.reached);
  }

  private residual(arc: number): number {
    return this.cap[arc]! - this.flow[arc]!;
  }
}
