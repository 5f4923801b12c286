import type { GraphEdge, PlanarGraph } from '../graph/planarGraph.types.ts';
import { findEulerWalk, type EulerWalk } from './eulerWalk.ts';

/**
 * Cuts one group's stitching and travel into passes. `copies` are planar edge ids (quilting lines once, travel copies
 * as often as travelled); `freeEnds` lists the vertices where a pass may start or tie off freely (one entry per
 * thread end; fixed ends are not listed). `start`/`end` are the fixed route ends or −1.
 *
 * One pass: an Euler walk from the start (or a free end). More passes: every free end gets a virtual edge to one
 * extra vertex D, and a fixed start or end is tied to its partner (the other fixed end, or D) by a virtual closing
 * edge. The result is one Euler circuit (all degrees even, connected: what the planner guarantees). Turned so it
 * begins right after the closing edge and cut wherever it passes D, it gives the passes in order: the first starts
 * at the fixed start, the last ends at the fixed end.
 */
export function buildPasses(graph: PlanarGraph, copies: readonly number[], freeEnds: readonly number[], start: number, end: number): EulerWalk[] {
  const fixed = (start >= 0 ? 1 : 0) + (end >= 0 ? 1 : 0);
  if (freeEnds.length + fixed <= 2) return [singlePass(graph, copies, freeEnds, start, end)];
  const n = graph.vertices.length;
  const m = graph.edges.length;
  const d = n;
  const extra: GraphEdge[] = [];
  const virtual = (u: number, v: number): number => {
    const id = m + extra.length;
    const p = graph.vertices[u === d ? v : u]!;
    extra.push({ id, u, v, kind: 'edge', length: 0, points: [p, p], source: -1 });
    return id;
  };
  const all = [...copies];
  for (const v of freeEnds) all.push(virtual(d, v));
  let closing = -1;
  let first = d;
  if (start >= 0 && end >= 0) {
    if (start !== end) closing = virtual(end, start);
    first = start;
  } else if (start >= 0) {
    closing = virtual(d, start);
    first = start;
  } else if (end >= 0) {
    closing = virtual(end, d);
    first = d;
  }
  if (closing >= 0) all.push(closing);
  // D gets a point only because every vertex has one; its virtual edges have zero length and no direction.
  const augmented: PlanarGraph = { vertices: [...graph.vertices, graph.vertices[freeEnds[0]!]!], edges: [...graph.edges, ...extra] };
  const circuit = findEulerWalk(augmented, all, first);
  const steps = closing >= 0 ? rotateAfter(augmented, circuit, closing, first) : circuit;
  return splitAt(augmented, steps, d, m);
}

function singlePass(graph: PlanarGraph, copies: readonly number[], freeEnds: readonly number[], start: number, end: number): EulerWalk {
  const from = start >= 0 ? start : (freeEnds.find((v) => v !== end) ?? (end >= 0 ? end : (freeEnds[0] ?? graph.edges[copies[0]!]!.u)));
  const walk = findEulerWalk(graph, copies, from);
  const steps = walk.edges.length;
  if (end >= 0 && steps > 0) {
    const last = graph.edges[walk.edges[steps - 1]!]!;
    const at = walk.forward[steps - 1] === 1 ? last.v : last.u;
    if (at !== end) throw new Error(`route/buildPasses: walk ends at ${at}, not at the fixed end ${end}`);
  }
  return walk;
}

/** The circuit turned to begin just after the closing edge, leaving from `first`; the closing edge is dropped. */
function rotateAfter(graph: PlanarGraph, circuit: EulerWalk, closing: number, first: number): EulerWalk {
  const m = circuit.edges.length;
  const at = circuit.edges.indexOf(closing);
  const e = graph.edges[closing]!;
  const arrivesAt = circuit.forward[at] === 1 ? e.v : e.u;
  const edges = new Int32Array(m - 1);
  const forward = new Uint8Array(m - 1);
  for (let k = 1; k < m; k++) {
    if (arrivesAt === first) {
      const i = (at + k) % m;
      edges[k - 1] = circuit.edges[i]!;
      forward[k - 1] = circuit.forward[i]!;
    } else {
      // Walk the circuit backwards from the closing edge: each traversal flips direction.
      const i = (at - k + m) % m;
      edges[k - 1] = circuit.edges[i]!;
      forward[k - 1] = 1 - circuit.forward[i]!;
    }
  }
  return { edges, forward };
}

/** Splits a walk at every visit of vertex d, dropping the virtual edges (ids ≥ m); empty pieces are skipped. */
function splitAt(graph: PlanarGraph, walk: EulerWalk, d: number, m: number): EulerWalk[] {
  const passes: EulerWalk[] = [];
  let edges: number[] = [];
  let forward: number[] = [];
  const flush = (): void => {
    if (edges.length > 0) passes.push({ edges: Int32Array.from(edges), forward: Uint8Array.from(forward) });
    edges = [];
    forward = [];
  };
  for (let k = 0; k < walk.edges.length; k++) {
    const id = walk.edges[k]!;
    if (id >= m) {
      const e = graph.edges[id]!;
      if (e.u === d || e.v === d) flush();
      continue;
    }
    edges.push(id);
    forward.push(walk.forward[k]!);
  }
  flush();
  return passes;
}
