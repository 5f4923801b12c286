import { describe, expect, it } from 'vitest';
import type { Design } from '../design/design.schema.ts';
import type { Polyline } from '../geometry/point.ts';
import { toGraphology } from './graphology.ts';
import { findOddPoints } from './oddPoints.ts';
import { findPieces } from './pieces.ts';
import { buildPlanarGraph } from './planarGraph.ts';
import type { PlanarGraph } from './planarGraph.types.ts';

function graphOf(lines: Polyline[], seams: Polyline[] = [], edgeTravel = true): PlanarGraph {
  const d: Design = { version: 1, units: 'in', width: 12, height: 12, seams, lines, edgeTravel };
  const r = buildPlanarGraph(d);
  if (!r.ok) throw new Error(r.error.message);
  return r.value;
}

describe('graph/pieces and oddPoints', () => {
  it('counts pieces of quilting lines only: seams and the outline join nothing', () => {
    // Two separate quilting lines, both ending on one seam and on the outline.
    const g = graphOf([[[2, 0], [2, 6]], [[8, 0], [8, 6]]], [[[0, 6], [12, 6]]]);
    const pieces = findPieces(g);
    expect(pieces).toHaveLength(2);
    expect(pieces.map((p) => p.length)).toEqual([6, 6]);
    expect(pieces[0]!.vertices).toHaveLength(2);
  });

  it('finds the Königsberg odd points: 4 odd vertices (Euler 1736)', () => {
    // The seven bridges as a planar drawing: land masses A (north bank), B (south bank), C (island), D (east).
    // Bridges A–C twice, B–C twice, A–D, B–D, C–D; degrees A 3, B 3, C 5, D 3 (Euler, Solutio problematis… 1736).
    const A = [6, 1] as const;
    const B = [6, 11] as const;
    const C = [4, 6] as const;
    const D = [10, 6] as const;
    const lines: Polyline[] = [
      [A, [3, 3], C], [A, [5, 3.5], C],
      [B, [3, 9], C], [B, [5, 8.5], C],
      [A, [9, 2], D], [B, [9, 10], D], [C, D],
    ];
    const g = graphOf(lines, [], false);
    const odd = findOddPoints(g);
    expect(odd.map((o) => o.degree).sort()).toEqual([3, 3, 3, 5]);
    expect(findPieces(g)).toHaveLength(1);
  });

  it('exports to graphology with vertex positions and edge attributes', () => {
    const g = graphOf([[[0, 0], [12, 12]], [[0, 12], [12, 0]]]);
    const gg = toGraphology(g);
    expect(gg.order).toBe(g.vertices.length);
    expect(gg.size).toBe(g.edges.length);
    const e = g.edges[0]!;
    expect(gg.getEdgeAttributes(String(e.id))).toEqual({ id: e.id, kind: e.kind, length: e.length, source: e.source });
    expect(gg.getNodeAttributes('0')).toEqual({ x: g.vertices[0]![0], y: g.vertices[0]![1] });
    expect(toGraphology(g, ['quilting']).size).toBe(4);
  });

  it('joins a line ending just inside the outline (within 1e-4 in) to the outline there', () => {
    const g = graphOf([[[6, 0.00005], [6, 12]]]);
    expect(g.edges.filter((e) => e.kind === 'edge')).toHaveLength(3);
    expect(g.vertices).toContainEqual([6, 0.00005]);
  });
});
