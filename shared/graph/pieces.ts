import { connectedComponents } from 'graphology-components';
import { toGraphology } from './graphology.ts';
import type { PlanarGraph } from './planarGraph.types.ts';

/** A piece: a connected group of quilting lines (a component of the quilting-only subgraph). */
export interface Piece {
  /** Quilting edge ids, ascending. */
  readonly edges: readonly number[];
  /** Vertex ids touched by those edges, ascending. */
  readonly vertices: readonly number[];
  /** Total quilting length in design units. */
  readonly length: number;
}

/**
 * The pieces of a design's quilting lines (seams and the outline do not join pieces; they are travel).
 * Components come from graphology-components on the quilting subgraph; vertices with no quilting edge
 * belong to no piece. Ordered by their smallest edge id.
 */
export function findPieces(graph: PlanarGraph): Piece[] {
  const componentOf = new Int32Array(graph.vertices.length).fill(-1);
  const groups: { edges: number[]; vertices: number[]; length: number }[] = [];
  for (const component of connectedComponents(toGraphology(graph, ['quilting']))) {
    for (const node of component) componentOf[Number(node)] = groups.length;
    groups.push({ edges: [], vertices: component.map(Number).sort((a, b) => a - b), length: 0 });
  }
  for (const e of graph.edges) {
    if (e.kind !== 'quilting') continue;
    const group = groups[componentOf[e.u]!]!;
    group.edges.push(e.id);
    group.length += e.length;
  }
  // Edges are visited in id order, so each piece's edge list is already ascending.
  return groups.filter((p) => p.edges.length > 0).sort((a, b) => a.edges[0]! - b.edges[0]!);
}
