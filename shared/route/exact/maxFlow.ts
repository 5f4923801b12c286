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

/**
 * A Gomory–Hu cut tree by Gusfield's method (SIAM J. Comput. 19 (1990) 143–155): n − 1 maximum flows, no
 * contractions. `parent[v]` is v's neighbour towards node 0 and `weight[v]` the least cut between them; the nodes
 * left with v when the edge v–parent[v] is removed (`sideOf`) form a minimum cut between the two. Every flow runs to
 * the end: the re-hanging step needs each cut to be a minimum one.
 */
export function gomoryHuTree(flow: MaxFlow, n: number): { parent: Int32Array; weight: Float64Array } {
  const parent = new Int32Array(n);
  const weight = new Float64Array(n);
  for (let s = 1; s < n; s++) {
    const t = parent[s]!;
    const value = flow.run(s, t, Infinity);
    weight[s] = value;
    const side = flow.sourceSide();
    for (let i = 0; i < n; i++) if (i !== s && side[i] && parent[i] === t) parent[i] = s;
    // Re-hanging: when t's own parent lies on s's side, s takes t's place in the tree.
    if (t !== 0 && side[parent[t]!]) {
      parent[s] = parent[t]!;
      parent[t] = s;
      weight[s] = weight[t]!;
      weight[t] = value;
    }
  }
  return { parent, weight };
}

/** The nodes on v's side of the tree edge v–parent[v] (node 0 is the root). */
export function sideOf(parent: Int32Array, v: number): Uint8Array {
  const n = parent.length;
  const children: number[][] = Array.from({ length: n }, () => []);
  for (let u = 1; u < n; u++) children[parent[u]!]!.push(u);
  const inside = new Uint8Array(n);
  const stack = [v];
  while (stack.length > 0) {
    const u = stack.pop()!;
    inside[u] = 1;
    stack.push(...children[u]!);
  }
  return inside;
}
