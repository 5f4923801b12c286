import { gomoryHuTree, MaxFlow, sideOf } from './maxFlow.ts';
import type { RowBuilder, RppProgram } from './rppProgram.ts';

const EPS = 1e-6;

/**
 * Parity cuts for the linear relaxation. At the integer optimum, a vertex set S whose quilting-line ends and fixed
 * ends are odd in number must be left or entered by travel or a free end at least once: x(δ(S)) + y(δ(S)) ≥ 1.
 * These are Edmonds & Johnson's T-join (blossom) inequalities (Math. Programming 5 (1973) 88–124), with T the
 * odd kept vertices (and D when its closing edge makes it odd). Separated exactly by Padberg & Rao's method
 * (Math. of Operations Research 7 (1982) 67–80; venue from memory): a violated odd cut, if any, is among the fundamental cuts of a
 * Gomory–Hu tree of the support graph, built here by Gusfield's n − 1 max-flows (SIAM J. Comput. 19 (1990) 143–155).
 */
export function separateOddCuts(rpp: RppProgram, values: Float64Array, rows: RowBuilder): void {
  const { colA, colB, edgeCols, odd } = rpp;
  const n = odd.length;
  if (!odd.includes(1)) return;
  const flow = new MaxFlow(n);
  for (let c = 0; c < edgeCols; c++) if (values[c]! > EPS) flow.addEdge(colA[c]!, colB[c]!, values[c]!);
  const { parent, weight } = gomoryHuTree(flow, n);
  for (let v = 1; v < n; v++) {
    if (weight[v]! >= 1 - EPS) continue;
    const inside = sideOf(parent, v);
    let oddCount = 0;
    for (let u = 0; u < n; u++) if (inside[u]) oddCount += odd[u]!;
    if (oddCount % 2 === 0) continue;
    // S and its complement are one cut (the complement of an odd set is odd too: T is even).
    const key = `o${(inside[n - 1] ? inside.map((s) => 1 - s) : inside).join('')}`;
    if (rows.has(key)) continue;
    const cols: number[] = [];
    for (let c = 0; c < edgeCols; c++) if (inside[colA[c]!] !== inside[colB[c]!]) cols.push(c);
    // Checked on the point: the tree's weight is a flow value, the subtree's cut may be larger.
    if (cols.reduce((sum, c) => sum + values[c]!, 0) >= 1 - EPS) continue;
    rows.add(cols, cols.map(() => 1), 1, Infinity, key);
  }
}
