import type { LinearProgram } from './mipSolver.ts';
import type { ConnectivityCuts } from './connectivityCuts.ts';
import { RowBuilder, type RppProgram } from './rppProgram.ts';

/**
 * Makes every integer solution a connected route, so one integer solve suffices: a single-commodity flow on the
 * support graph (pieces contracted) sends one unit from the first piece to every other piece and fixed end, and
 * may use an edge only if the route travels it: f_ab + f_ba ≤ (T − 1)·x_e, with T the number of pieces to join
 * (the closing edge, always there, carries flow freely). This is the classic flow formulation of connectivity
 * (e.g. Magnanti & Wolsey, "Optimal trees", Handbooks in OR & MS 7 (1995) 503–615; from memory); it is weak on its own, but
 * the connectivity and parity cuts added before it (connectivityCuts.ts, oddCuts.ts) carry the strength, and the
 * flow only rules out the routes that fall apart, which would otherwise each cost another integer solve.
 * Returns the program with the flow columns (cost 0) and rows appended; the edge columns keep their indices.
 */
export function withFlowConnectivity(rpp: RppProgram, cuts: ConnectivityCuts): LinearProgram {
  const base = rpp.program;
  const targets = cuts.targets;
  const T = targets.length;
  if (T <= 1) return base;
  const n0 = base.cost.length;
  const { colA, colB, edgeCols, closing } = rpp;
  const node = (v: number): number => cuts.nodeOf[v]!;
  const arcs: { from: number; to: number; link: number }[] = [];
  for (let c = 0; c < edgeCols; c++) {
    const a = node(colA[c]!);
    const b = node(colB[c]!);
    if (a === b) continue;
    arcs.push({ from: a, to: b, link: c }, { from: b, to: a, link: c });
  }
  if (closing && node(closing[0]) !== node(closing[1])) {
    arcs.push({ from: node(closing[0]), to: node(closing[1]), link: -1 }, { from: node(closing[1]), to: node(closing[0]), link: -1 });
  }
  const rows = new RowBuilder();
  // Linking: both directions of an edge together carry at most (T − 1) times its travel count.
  for (let i = 0; i < arcs.length; i += 2) {
    const link = arcs[i]!.link;
    if (link >= 0) rows.add([n0 + i, n0 + i + 1, link], [1, 1, -(T - 1)], -Infinity, 0);
  }
  // Balance: out − in = T − 1 at the first target, −1 at the others, 0 elsewhere.
  const out: number[][] = Array.from({ length: cuts.nodeCount }, () => []);
  const into: number[][] = Array.from({ length: cuts.nodeCount }, () => []);
  arcs.forEach((arc, i) => {
    out[arc.from]!.push(n0 + i);
    into[arc.to]!.push(n0 + i);
  });
  const isTarget = new Uint8Array(cuts.nodeCount);
  for (const t of targets) isTarget[t] = 1;
  for (let u = 0; u < cuts.nodeCount; u++) {
    const supply = u === targets[0] ? T - 1 : isTarget[u] ? -1 : 0;
    rows.add([...out[u]!, ...into[u]!], [...out[u]!.map(() => 1), ...into[u]!.map(() => -1)], supply, supply);
  }
  const extra = rows.build();
  const m = arcs.length;
  const baseRows = base.rows;
  const shift = baseRows.indices.length;
  return {
    cost: concat(base.cost, new Float64Array(m)),
    lower: concat(base.lower, new Float64Array(m)),
    upper: concat(base.upper, new Float64Array(m).fill(T - 1)),
    integer: Uint8Array.from([...base.integer, ...new Uint8Array(m)]),
    rows: {
      lower: concat(baseRows.lower, extra.lower),
      upper: concat(baseRows.upper, extra.upper),
      starts: Int32Array.from([...baseRows.starts, ...Array.from(extra.starts.subarray(1), (s) => s + shift)]),
      indices: Int32Array.from([...baseRows.indices, ...extra.indices]),
      values: concat(baseRows.values, extra.values),
    },
  };
}

function concat(a: Float64Array, b: Float64Array): Float64Array {
  const out = new Float64Array(a.length + b.length);
  out.set(a);
  out.set(b, a.length);
  return out;
}
