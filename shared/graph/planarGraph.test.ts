import { describe, expect, it } from 'vitest';
import type { Design } from '../design/design.schema.ts';
import type { Polyline } from '../geometry/point.ts';
import { buildPlanarGraph } from './planarGraph.ts';
import { findOddPoints } from './oddPoints.ts';
import { findPieces } from './pieces.ts';
import type { PlanarGraph } from './planarGraph.types.ts';

function design(lines: Polyline[], extra: Partial<Design> = {}): Design {
  return { version: 1, units: 'in', width: 12, height: 12, seams: [], lines, edgeTravel: false, ...extra };
}

function graphOf(d: Design): PlanarGraph {
  const r = buildPlanarGraph(d);
  if (!r.ok) throw new Error(r.error.message);
  return r.value;
}

const lengthOf = (g: PlanarGraph, kind: string): number => g.edges.filter((e) => e.kind === kind).reduce((s, e) => s + e.length, 0);

describe('graph/planarGraph: noding', () => {
  it('splits two crossing lines into 4 edges around one degree-4 vertex', () => {
    const g = graphOf(design([[[0, 0], [12, 12]], [[0, 12], [12, 0]]]));
    expect(g.edges).toHaveLength(4);
    expect(g.vertices).toHaveLength(5);
    expect(g.vertices).toContainEqual([6, 6]);
    expect(findOddPoints(g)).toHaveLength(4);
  });

  it('splits at a T-junction and at a touching point', () => {
    const g = graphOf(design([[[0, 6], [12, 6]], [[6, 6], [6, 0]], [[3, 0], [3, 6]]]));
    expect(g.edges).toHaveLength(5);
    const odd = findOddPoints(g).map((o) => o.point.join(',')).sort();
    expect(odd).toEqual(['0,6', '12,6', '3,0', '3,6', '6,0', '6,6']);
  });

  it('joins a line end lying within the tolerance (1e-4 in) of another line, and not one beyond it', () => {
    const near = graphOf(design([[[0, 6], [12, 6]], [[6, 6.00005], [6, 0]]]));
    expect(near.edges).toHaveLength(3);
    const far = graphOf(design([[[0, 6], [12, 6]], [[6, 5.999], [6, 0]]]));
    expect(far.edges).toHaveLength(2);
  });

  it('keeps polyline bends inside one edge', () => {
    const g = graphOf(design([[[0, 0], [1, 1], [2, 0], [3, 1]]]));
    expect(g.edges).toHaveLength(1);
    expect(g.vertices).toEqual([[0, 0], [3, 1]]);
    expect(g.edges[0]!.points).toHaveLength(4);
    expect(g.edges[0]!.length).toBeCloseTo(3 * Math.SQRT2, 14);
  });

  it('cuts a closed line into two parallel edges instead of a self-loop', () => {
    const g = graphOf(design([[[1, 1], [5, 1], [5, 5], [1, 5], [1, 1]]]));
    expect(g.edges).toHaveLength(2);
    expect(g.edges.every((e) => e.u !== e.v)).toBe(true);
    expect(g.edges[0]!.length + g.edges[1]!.length).toBeCloseTo(16, 14);
    expect(findOddPoints(g)).toHaveLength(0);
  });

  it('merges a quilting line laid over a seam: quilting there, seam elsewhere', () => {
    const g = graphOf(design([[[2, 6], [5, 6]]], { seams: [[[0, 6], [12, 6]]] }));
    const kinds = [...g.edges].sort((a, b) => a.points[0]![0] + a.points.at(-1)![0] - b.points[0]![0] - b.points.at(-1)![0]).map((e) => [e.kind, e.length]);
    expect(kinds).toEqual([['seam', 2], ['quilting', 3], ['seam', 7]]);
  });

  it('merges overlapping quilting lines into one (a doubled line is stitched once)', () => {
    const g = graphOf(design([[[0, 6], [8, 6]], [[4, 6], [12, 6]]]));
    expect(lengthOf(g, 'quilting')).toBe(12);
    expect(g.edges).toHaveLength(3);
  });

  it('nodes the outline when edge travel is on, splitting it where lines reach it', () => {
    const g = graphOf(design([[[6, 0], [6, 12]]], { edgeTravel: true }));
    expect(lengthOf(g, 'edge')).toBe(48);
    expect(lengthOf(g, 'quilting')).toBe(12);
    // outline split at (6,0), (6,12) and its own start (0,0): 3 edge pieces
    expect(g.edges.filter((e) => e.kind === 'edge')).toHaveLength(3);
    expect(findOddPoints(g)).toHaveLength(2);
    expect(graphOf(design([[[6, 0], [6, 12]]])).edges).toHaveLength(1);
  });

  it('makes the start and end points vertices where they lie on a line', () => {
    const g = graphOf(design([[[0, 6], [12, 6]]], { start: [4, 6], end: [20 / 3, 6] }));
    expect(g.edges).toHaveLength(3);
    expect(g.vertices).toContainEqual([4, 6]);
    expect(findOddPoints(g)).toHaveLength(2);
  });

  it('drops zero-length pieces (a line shorter than the tolerance collapses)', () => {
    const g = graphOf(design([[[0, 6], [12, 6]], [[3, 3], [3, 3.00001]]]));
    expect(g.edges).toHaveLength(1);
  });

  // E9 of docs/engine.md §7.2 (derived there; checked with exact rationals and networkx when it was chosen):
  // border + N vertical and N horizontal lines at s/2 + n·s: required length 48 + 24N, 4N odd points.
  it.each([4, 12, 48])('builds the E9 crosshatch with N = %i lines each way', (N) => {
    const s = 12 / N;
    const lines: Polyline[] = [[[0, 0], [12, 0], [12, 12], [0, 12], [0, 0]]];
    for (let n = 0; n < N; n++) {
      const c = s / 2 + n * s;
      lines.push([[c, 0], [c, 12]], [[0, c], [12, c]]);
    }
    const g = graphOf(design(lines));
    expect(lengthOf(g, 'quilting')).toBeCloseTo(48 + 24 * N, 9);
    expect(findOddPoints(g)).toHaveLength(4 * N);
    // Edges: 2N lines × (N+1) pieces, the border cut at 4N T-junctions into 4N pieces, one of them cut again
    // at the border's own start (0,0), which stays a vertex as a line end.
    expect(g.edges).toHaveLength(2 * N * (N + 1) + 4 * N + 1);
    expect(findPieces(g)).toHaveLength(1);
  });
});

describe('graph/planarGraph: bad input', () => {
  const kindOf = (d: Design): string => {
    const r = buildPlanarGraph(d);
    return r.ok ? 'ok' : r.error.kind;
  };
  it('returns typed problems, never throws', () => {
    expect(kindOf(design([]))).toBe('empty-design');
    expect(kindOf(design([[[1, 1], [1, 1]]]))).toBe('line-too-short');
    expect(kindOf(design([[[1, 1]]]))).toBe('line-too-short');
    expect(kindOf(design([[[1, Number.NaN], [2, 2]]]))).toBe('non-finite');
    expect(kindOf(design([[[1, 1], [2, Number.POSITIVE_INFINITY]]]))).toBe('non-finite');
    expect(kindOf(design([[[1, 1], [50, 2]]]))).toBe('outside-block');
    expect(kindOf(design([[[1, 1], [2, 2]]], { width: 0 }))).toBe('invalid-block');
    expect(kindOf(design([[[1, 1], [2, 2]]], { width: 500 }))).toBe('invalid-block');
    expect(kindOf(design([Array.from({ length: 200_001 }, (_, i) => [(i % 100) / 10, 1] as const)]))).toBe('too-large');
    expect(kindOf(design([[[1, 1], [2, 2]]], { seams: [[[0, 0], [0, 0]]] }))).toBe('line-too-short');
  });
  it('refuses designs whose lines meet in too many places instead of hanging', () => {
    // 750 horizontal and 750 vertical lines: 562,500 crossings, over MAX_CONTACTS (500,000).
    const lines: Polyline[] = [];
    for (let i = 0; i < 750; i++) lines.push([[0, (12 * (i + 0.5)) / 750], [12, (12 * (i + 0.5)) / 750]], [[(12 * (i + 0.5)) / 750, 0], [(12 * (i + 0.5)) / 750, 12]]);
    expect(kindOf(design(lines))).toBe('too-many-crossings');
  }, 180_000);
});
