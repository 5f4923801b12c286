import type { Point } from '../geometry/point.ts';
import type { PlanarGraph } from './planarGraph.types.ts';

/** A vertex where an odd number of quilting-line ends meet. */
export interface OddPoint {
  readonly vertex: number;
  readonly point: Point;
  /** Number of quilting edge ends at the vertex (odd). */
  readonly degree: number;
}

/** Quilting degree of every vertex (seams and the outline are travel and do not count). */
export function quiltingDegrees(graph: PlanarGraph): Int32Array {
  const degree = new Int32Array(graph.vertices.length);
  for (const e of graph.edges) {
    if (e.kind !== 'quilting') continue;
    degree[e.u]!++;
    degree[e.v]!++;
  }
  return degree;
}

/**
 * Odd points of the quilting lines, by ascending vertex id. Their count is always even (handshake lemma),
 * and one pass without travel exists per piece exactly when it has 0 or 2 (Euler 1736; Hierholzer 1873).
 */
export function findOddPoints(graph: PlanarGraph): OddPoint[] {
  const degree = quiltingDegrees(graph);
  const out: OddPoint[] = [];
  degree.forEach((d, vertex) => {
    if (d % 2 === 1) out.push({ vertex, point: graph.vertices[vertex]!, degree: d });
  });
  return out;
}
