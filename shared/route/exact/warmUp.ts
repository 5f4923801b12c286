import type { Point } from '../../geometry/point.ts';
import type { GraphEdge, LineKind, PlanarGraph } from '../../graph/planarGraph.types.ts';
import { planRoute } from '../planRoute.ts';
import type { LpSolver } from './lpSolver.ts';

/**
 * Runs the exact search a few times on a small block (three lines across it, joined only by edge travel) so that
 * WebAssembly's optimising compiler has the solver's hot code ready: the benchmark measures the planner in that
 * steady state. (The engine workers skip it: the compiling then goes on in the background and slows the first task.)
 */
export function warmUpSolver(solver: LpSolver, rounds = 4): void {
  const graph = warmUpGraph();
  for (let i = 0; i < rounds; i++) {
    planRoute(graph, { exact: { solver, timeBudgetMs: 1_000, always: true }, extraStops: i % 2 });
  }
}

function warmUpGraph(): PlanarGraph {
  const ys = [0, 3, 6, 9, 12];
  const vertices: Point[] = [];
  const at = new Map<string, number>();
  const id = (p: Point): number => {
    const key = p.join(',');
    if (!at.has(key)) {
      at.set(key, vertices.length);
      vertices.push(p);
    }
    return at.get(key)!;
  };
  const edges: GraphEdge[] = [];
  const add = (a: Point, b: Point, kind: LineKind): void => {
    edges.push({ id: edges.length, u: id(a), v: id(b), kind, length: Math.hypot(b[0] - a[0], b[1] - a[1]), points: [a, b], source: -1 });
  };
  for (const y of [3, 6, 9]) add([0, y], [12, y], 'quilting');
  add([0, 0], [12, 0], 'edge');
  add([0, 12], [12, 12], 'edge');
  for (let i = 0; i + 1 < ys.length; i++) {
    add([0, ys[i]!], [0, ys[i + 1]!], 'edge');
    add([12, ys[i]!], [12, ys[i + 1]!], 'edge');
  }
  return { vertices, edges };
}
