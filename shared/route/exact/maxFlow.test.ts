// The cut tree against brute force over every vertex set, on small random graphs. What must hold is Gomory & Hu's
// theorem (J. SIAM 9 (1961) 551–570): each tree edge's cut is a minimum cut between its two ends, and the least
// u–v cut of the graph is the lightest edge on the tree path from u to v.
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { gomoryHuTree, MaxFlow, sideOf } from './maxFlow.ts';

type Edge = readonly [number, number, number];

const graphArb = fc.integer({ min: 2, max: 8 }).chain((n) =>
  fc.record({
    n: fc.constant(n),
    edges: fc.array(fc.tuple(fc.nat(n - 1), fc.nat(n - 1), fc.integer({ min: 1, max: 8 }).map((k) => k / 4)), { maxLength: 16 }),
  }),
);

function cutValue(edges: readonly Edge[], inside: (v: number) => boolean): number {
  return edges.reduce((sum, [a, b, c]) => (a !== b && inside(a) !== inside(b) ? sum + c : sum), 0);
}

/** The least cut between u and v over all 2^n vertex sets. */
function bruteMinCut(n: number, edges: readonly Edge[], u: number, v: number): number {
  let best = Infinity;
  for (let mask = 0; mask < 1 << n; mask++) {
    if (!(mask & (1 << u)) || mask & (1 << v)) continue;
    best = Math.min(best, cutValue(edges, (x) => (mask & (1 << x)) !== 0));
  }
  return best;
}

describe('Gomory–Hu cut tree (Gusfield)', () => {
  it('every tree edge is a minimum cut, and path minima give every pair its least cut', () => {
    fc.assert(
      fc.property(graphArb, ({ n, edges }) => {
        const flow = new MaxFlow(n);
        for (const [a, b, c] of edges) flow.addEdge(a, b, c);
        const { parent, weight } = gomoryHuTree(flow, n);
        for (let v = 1; v < n; v++) {
          const side = sideOf(parent, v);
          expect(side[v]).toBe(1);
          expect(side[parent[v]!]).toBe(0);
          expect(cutValue(edges, (x) => side[x] === 1)).toBeCloseTo(weight[v]!, 9);
          expect(weight[v]!).toBeCloseTo(bruteMinCut(n, edges, v, parent[v]!), 9);
        }
        const pathMin = (u: number, v: number): number => {
          const up = (x: number): number[] => (x === 0 ? [0] : [x, ...up(parent[x]!)]);
          const pu = up(u);
          const pv = up(v);
          const meet = pu.find((x) => pv.includes(x))!;
          let least = Infinity;
          for (const x of [...pu.slice(0, pu.indexOf(meet)), ...pv.slice(0, pv.indexOf(meet))]) least = Math.min(least, weight[x]!);
          return least;
        };
        for (let u = 0; u < n; u++) for (let v = u + 1; v < n; v++) expect(pathMin(u, v)).toBeCloseTo(bruteMinCut(n, edges, u, v), 9);
      }),
      { numRuns: 300 },
    );
  });
});
