import type { PlanarGraph } from '../graph/planarGraph.types.ts';
import type { EulerWalk } from './eulerWalk.ts';
import type { EndPlace, ThreadEnd } from './threadEnds.ts';

/**
 * The start and tie-off of every pass (passes numbered from 1 in `walks` order): where each is, and why. The route's
 * first start and last tie-off are `fixed` when the quilter set them; any other end is `hidden` on a seam or at the
 * edge, or `no-hidden-place` when the planner found no route as short (within the allowance) that hides it.
 */
export function describeThreadEnds(graph: PlanarGraph, walks: readonly EulerWalk[], places: readonly EndPlace[], start: number, end: number): ThreadEnd[] {
  const out: ThreadEnd[] = [];
  walks.forEach((walk, i) => {
    const steps = walk.edges.length;
    if (steps === 0) return;
    const first = graph.edges[walk.edges[0]!]!;
    const last = graph.edges[walk.edges[steps - 1]!]!;
    const from = walk.forward[0] === 1 ? first.u : first.v;
    const to = walk.forward[steps - 1] === 1 ? last.v : last.u;
    out.push(endAt(graph, places, i + 1, 'start', from, i === 0 && from === start));
    out.push(endAt(graph, places, i + 1, 'tie-off', to, i === walks.length - 1 && to === end));
  });
  return out;
}

function endAt(graph: PlanarGraph, places: readonly EndPlace[], pass: number, end: ThreadEnd['end'], vertex: number, fixed: boolean): ThreadEnd {
  const place = places[vertex]!;
  return { pass, end, vertex, point: graph.vertices[vertex]!, place, reason: fixed ? 'fixed' : place === 'open' ? 'no-hidden-place' : 'hidden' };
}
