import { MultiUndirectedGraph } from 'graphology';
import type { LineKind, PlanarGraph } from './planarGraph.types.ts';

export interface GraphVertexAttributes {
  readonly x: number;
  readonly y: number;
}

export interface GraphEdgeAttributes {
  readonly id: number;
  readonly kind: LineKind;
  readonly length: number;
  readonly source: number;
}

/**
 * The planar graph as a graphology undirected multigraph: node keys are the vertex indices as strings
 * ("0", "1", …) with `{ x, y }`; edge keys are the edge ids as strings with `{ id, kind, length, source }`.
 * `kinds` keeps only edges of those kinds (all vertices are always added).
 */
export function toGraphology(graph: PlanarGraph, kinds?: readonly LineKind[]): MultiUndirectedGraph<GraphVertexAttributes, GraphEdgeAttributes> {
  const g = new MultiUndirectedGraph<GraphVertexAttributes, GraphEdgeAttributes>({ allowSelfLoops: true });
  graph.vertices.forEach(([x, y], i) => g.addNode(String(i), { x, y }));
  for (const e of graph.edges) {
    if (kinds !== undefined && !kinds.includes(e.kind)) continue;
    g.addEdgeWithKey(String(e.id), String(e.u), String(e.v), { id: e.id, kind: e.kind, length: e.length, source: e.source });
  }
  return g;
}
