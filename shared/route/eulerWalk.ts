import type { PlanarGraph } from '../graph/planarGraph.types.ts';

/**
 * A walk over planar-graph edges in order: traversal k runs over edge `edges[k]`, from edge.u to edge.v when
 * `forward[k]` is 1. Typed arrays, since a dense block's walk has tens of thousands of traversals.
 */
export interface EulerWalk {
  readonly edges: Int32Array;
  readonly forward: Uint8Array;
}

/**
 * Hierholzer's algorithm (Hierholzer & Wiener, Math. Annalen 6 (1873) 30–32), iterative with an explicit stack so
 * 30,000-edge walks cannot overflow the call stack. `copies` lists planar-graph edge ids; an id may repeat (travel
 * copies). The copies must form a connected multigraph with 0 odd vertices, or 2 with `start` one of them.
 *
 * Every Euler walk of the same multigraph has the same length, so the choice at each vertex only shapes the route:
 * we take the unused copy with the smallest turning angle from the direction the needle arrived in (straight on
 * first), which keeps sharp turns few. Ties go to the copy listed first (stitching copies are listed first).
 * O(Σ deg²) for the choices, O(copies) otherwise; no allocation per step.
 */
export function findEulerWalk(graph: PlanarGraph, copies: ArrayLike<number>, start: number): EulerWalk {
  const n = graph.vertices.length;
  const m = copies.length;
  const dirs = copyDirections(graph, copies);
  const cu = new Int32Array(m);
  const cv = new Int32Array(m);
  const degree = new Int32Array(n + 1);
  for (let c = 0; c < m; c++) {
    const { u, v } = graph.edges[copies[c]!]!;
    cu[c] = u;
    cv[c] = v;
    degree[u]!++;
    if (v !== u) degree[v]!++;
  }
  const offset = new Int32Array(n + 1);
  for (let v = 0; v < n; v++) offset[v + 1] = offset[v]! + degree[v]!;
  const live = new Int32Array(n);
  const slot = new Int32Array(offset[n]!);
  const posU = new Int32Array(m);
  const posV = new Int32Array(m);
  for (let c = 0; c < m; c++) {
    const u = cu[c]!;
    const v = cv[c]!;
    posU[c] = offset[u]! + live[u]!;
    slot[offset[u]! + live[u]!++] = c;
    if (v !== u) {
      posV[c] = offset[v]! + live[v]!;
      slot[offset[v]! + live[v]!++] = c;
    }
  }
  const removeAt = (vertex: number, c: number): void => {
    const pos = vertex === cu[c] ? posU[c]! : posV[c]!;
    const lastPos = offset[vertex]! + --live[vertex]!;
    const moved = slot[lastPos]!;
    slot[pos] = moved;
    if (cu[moved] === vertex) posU[moved] = pos;
    else posV[moved] = pos;
  };

  // The stack holds (vertex, copy that reached it, direction); it is never deeper than m + 1.
  const stackV = new Int32Array(m + 1);
  const stackC = new Int32Array(m + 1);
  const stackF = new Uint8Array(m + 1);
  let top = 0;
  stackV[0] = start;
  stackC[0] = -1;
  stackF[0] = 1;
  // Traversals come off the stack last first; fill the output from the back.
  const outEdges = new Int32Array(m);
  const outForward = new Uint8Array(m);
  let written = 0;
  while (top >= 0) {
    const v = stackV[top]!;
    const cin = stackC[top]!;
    if (live[v]! > 0) {
      // Arrival direction at v: opposite of the direction that leaves v back along the incoming edge.
      let ax = 0;
      let ay = 0;
      if (cin >= 0) {
        const atU = stackF[top] === 0;
        ax = -dirs[4 * cin + (atU ? 0 : 2)]!;
        ay = -dirs[4 * cin + (atU ? 1 : 3)]!;
      }
      let best = -1;
      let bestCos = -Infinity;
      for (let q = offset[v]!; q < offset[v]! + live[v]!; q++) {
        const c = slot[q]!;
        const leavesFromU = cu[c] === v;
        const cos = ax * dirs[4 * c + (leavesFromU ? 0 : 2)]! + ay * dirs[4 * c + (leavesFromU ? 1 : 3)]!;
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
      top++;
      stackV[top] = forward ? bv : bu;
      stackC[top] = best;
      stackF[top] = forward ? 1 : 0;
    } else {
      const c = stackC[top]!;
      if (c >= 0) {
        written++;
        outEdges[m - written] = copies[c]!;
        outForward[m - written] = stackF[top]!;
      }
      top--;
    }
  }
  if (written !== m) throw new Error(`route/eulerWalk: walk used ${written} of ${m} edges; the multigraph is not connected or has wrong parity`);
  return { edges: outEdges, forward: outForward };
}

/**
 * Unit leaving directions per copy (of its edge): [ux, uy] leaving u along the edge, [vx, vy] leaving v back along
 * it. Per copy, not per graph edge, so a pass over a few edges of a large graph costs only its own size.
 */
function copyDirections(graph: PlanarGraph, copies: ArrayLike<number>): Float64Array {
  const dirs = new Float64Array(4 * copies.length);
  for (let c = 0; c < copies.length; c++) {
    const p = graph.edges[copies[c]!]!.points;
    firstStep(p, 0, 1, dirs, 4 * c);
    firstStep(p, p.length - 1, -1, dirs, 4 * c + 2);
  }
  return dirs;
}

/** Writes the unit direction from p[from] to the first distinct point stepping by `step` into out[at], out[at+1] (0, 0 if none). */
function firstStep(p: PlanarGraph['edges'][number]['points'], from: number, step: 1 | -1, out: Float64Array, at: number): void {
  const [x0, y0] = p[from]!;
  for (let i = from + step; i >= 0 && i < p.length; i += step) {
    const dx = p[i]![0] - x0;
    const dy = p[i]![1] - y0;
    const len = Math.hypot(dx, dy);
    if (len > 0) {
      out[at] = dx / len;
      out[at + 1] = dy / len;
      return;
    }
  }
}
