import type { Point } from '../geometry/point.ts';
import type { GraphEdge, LineKind, PlanarGraph } from '../graph/planarGraph.types.ts';

/**
 * Test support: planar graphs built straight from edge lists, for the abstract worked examples (their lengths are
 * given, not measured) and for hand-noded grids. Vertices sit on a circle so turning angles are defined.
 */
export function graphFromEdgeList(edges: readonly (readonly [string, string, number, LineKind?])[]): {
  graph: PlanarGraph;
  at: (name: string) => Point;
} {
  const names: string[] = [];
  const index = new Map<string, number>();
  const idOf = (name: string): number => {
    let i = index.get(name);
    if (i === undefined) {
      i = names.length;
      names.push(name);
      index.set(name, i);
    }
    return i;
  };
  for (const [a, b] of edges) {
    idOf(a);
    idOf(b);
  }
  const vertices: Point[] = names.map((_, i) => [Math.cos((2 * Math.PI * i) / names.length), Math.sin((2 * Math.PI * i) / names.length)]);
  const graphEdges: GraphEdge[] = edges.map(([a, b, w, kind], id) => ({
    id,
    u: idOf(a),
    v: idOf(b),
    kind: kind ?? 'quilting',
    length: w,
    points: [vertices[idOf(a)]!, vertices[idOf(b)]!],
    source: id,
  }));
  return { graph: { vertices, edges: graphEdges }, at: (name) => vertices[index.get(name)!]! };
}

/** Straight segments, already noded (every crossing is an endpoint), as a planar graph with exact vertex sharing. */
export function graphFromSegments(segments: readonly (readonly [Point, Point, LineKind])[]): PlanarGraph {
  const index = new Map<string, number>();
  const vertices: Point[] = [];
  const idOf = (p: Point): number => {
    const key = `${p[0]},${p[1]}`;
    let i = index.get(key);
    if (i === undefined) {
      i = vertices.length;
      vertices.push(p);
      index.set(key, i);
    }
    return i;
  };
  const edges = segments.map(([a, b, kind], id): GraphEdge => ({
    id,
    u: idOf(a),
    v: idOf(b),
    kind,
    length: Math.hypot(b[0] - a[0], b[1] - a[1]),
    points: [a, b],
    source: id,
  }));
  return { vertices, edges };
}

/**
 * Worked example E9: a side × side block whose border and N vertical and N horizontal lines at s/2 + i·s
 * (s = side/N) are all quilting lines, noded at every crossing and T-junction.
 */
export function crosshatchGraph(n: number, side = 12): PlanarGraph {
  const s = side / n;
  const cuts = [0, ...Array.from({ length: n }, (_, i) => s / 2 + i * s), side];
  const segs: [Point, Point, LineKind][] = [];
  for (let a = 0; a < cuts.length; a++) {
    const fixed = cuts[a]!;
    for (let b = 0; b + 1 < cuts.length; b++) {
      segs.push([[cuts[b]!, fixed], [cuts[b + 1]!, fixed], 'quilting']);
      segs.push([[fixed, cuts[b]!], [fixed, cuts[b + 1]!], 'quilting']);
    }
  }
  return graphFromSegments(segs);
}
