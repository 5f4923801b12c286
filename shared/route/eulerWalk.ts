import type { PlanarGraph } from '../graph/planarGraph.types.ts';

/** One traversal of a planar-graph edge: `forward` means from edge.u to edge.v. */
export interface Traversal {
  readonly edge: number;
  readonly forward: boolean;
}

/**
 * Hierholzer's algorithm (Hierholzer & Wiener, Math. Annalen 6 (1873) 30–32), iterative with an explicit stack so
 * 30,000-edge walks cannot overflow the call stack. `copies` lists planar-graph edge ids; an id may repeat (travel
 * copies). The copies must form a connected multigraph with 0 odd vertices, or 2 with `start` one of them.
 *
 * Every Euler walk of the same multigraph has the same length, so the choice at each vertex only shapes the route:
 * we take the unused copy with the smallest turning angle from the direction the needle arrived in (straight on
 * first), which keeps sharp turns few. Ties go to the copy listed first (stitching copies are listed first).
 */
export function findEulerWalk(graph: PlanarGraph, copies: readonly number[], start: number): Traversal[] {
  const n = graph.vertices.length;
  const m = copies.length;
  const dirs = edgeDirections(graph);
  const cu = new Int32Array(m);
  const cv = new Int32Array(m);
  const degree = new Int32Array(n + 1);
  copies.forEach((e, c) => {
    const { u, v } = graph.edges[e]!;
    cu[c] = u;
    cv[c] = v;
    degree[u]!++;
    if (v !== u) degree[v]!++;
  });
  const offset = new Int32Array(n + 1);
  for (let v = 0; v < n; v++) offset[v + 1] = offset[v]! + degree[v]!;
  const live = new Int32Array(n);
  const slot = new Int32Array(offset[n]!);
  const posU = new Int32Array(m);
  const posV = new Int32Array(m);
  copies.forEach((_, c) => {
    const u = cu[c]!;
    const v = cv[c]!;
    posU[c] = offset[u]! + live[u]!;
    slot[offset[u]! + live[u]!++] = c;
    if (v !== u) {
      posV[c] = offset[v]! + live[v]!;
      slot[offset[v]! + live[v]!++] = c;
    }
  });
  const removeAt = (vertex: number, c: number): void => {
    const pos = vertex === cu[c] ? posU[c]! : posV[c]!;
    const lastPos = offset[vertex]! + --live[vertex]!;
    const moved = slot[lastPos]!;
    slot[pos] = moved;
    if (cu[moved] === vertex) posU[moved] = pos;
    else posV[moved] = pos;
  };

  const stackV: number[] = [start];
  const stackC: number[] = [-1];
  const stackF: boolean[] = [true];
  const out: Traversal[] = [];
  while (stackV.length > 0) {
    const v = stackV[stackV.length - 1]!;
    const cin = stackC[stackC.length - 1]!;
    if (live[v]! > 0) {
      // Arrival direction at v: opposite of the direction that leaves v back along the incoming edge.
      let ax = 0;
      let ay = 0;
      if (cin >= 0) {
        const e = copies[cin]!;
        const atU = stackF[stackF.length - 1] === false;
        ax = -dirs[4 * e + (atU ? 0 : 2)]!;
        ay = -dirs[4 * e + (atU ? 1 : 3)]!;
      }
      let best = -1;
      let bestCos = -Infinity;
      for (let q = offset[v]!; q < offset[v]! + live[v]!; q++) {
        const c = slot[q]!;
        const e = copies[c]!;
        const leavesFromU = cu[c] === v;
        const cos = ax * dirs[4 * e + (leavesFromU ? 0 : 2)]! + ay * dirs[4 * e + (leavesFromU ? 1 : 3)]!;
        if (cos > bestCos + 1e-12 || (Math.abs(cos - bestCos) <= 1e-12 && c < best)) {
          best = c;
          bestCos = cos;
        }
      }
      const bu = cu[best]!;
      const bv = cv[best]!;
      removeAt(bu, best);
      if (bv !== bu) removeAt(bv, best);
      const forward = bu === v;
      stackV.push(forward ? bv : bu);
      stackC.push(best);
      stackF.push(forward);
    } else {
      stackV.pop();
      const c = stackC.pop()!;
      const f = stackF.pop()!;
      if (c >= 0) out.push({ edge: copies[c]!, forward: f });
    }
  }
  if (out.length !== m) throw new Error(`route/eulerWalk: walk used ${out.length} of ${m} edges; the multigraph is not connected or has wrong parity`);
  return out.reverse();
}

/** Unit leaving directions per edge: [ux, uy] leaving u along the edge, [vx, vy] leaving v back along it. */
function edgeDirections(graph: PlanarGraph): Float64Array {
  const dirs = new Float64Array(4 * graph.edges.length);
  graph.edges.forEach((e, i) => {
    const p = e.points;
    const [ux, uy] = firstStep(p, 0, 1);
    const [vx, vy] = firstStep(p, p.length - 1, -1);
    dirs.set([ux, uy, vx, vy], 4 * i);
  });
  return dirs;
}

function firstStep(p: PlanarGraph['edges'][number]['points'], from: number, step: 1 | -1): [number, number] {
  const [x0, y0] = p[from]!;
  for (let i = from + step; i >= 0 && i < p.length; i += step) {
    const dx = p[i]![0] - x0;
    const dy = p[i]![1] - y0;
    const len = Math.hypot(dx, dy);
    if (len > 0) return [dx / len, dy / len];
  }
  return [0, 0];
}
