import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import type { Design } from '../design/design.schema.ts';
import type { Point, Polyline } from '../geometry/point.ts';
import { polylineLength } from '../geometry/polyline.ts';
import { toGraphology } from './graphology.ts';
import { findOddPoints } from './oddPoints.ts';
import { findPieces } from './pieces.ts';
import { buildPlanarGraph } from './planarGraph.ts';
import type { PlanarGraph } from './planarGraph.types.ts';

// Coordinates: a quarter-inch grid (overlaps, T-junctions, shared ends) mixed with a 1/1000 in grid.
// Not arbitrary reals: snapping is deliberately discontinuous at the tolerance (1e-4 in), so a feature
// whose size is within rounding of the tolerance may snap in one frame and not in another. The
// 1/1000 grid keeps distinct features well clear of that edge while still exercising general positions.
const coord = fc.oneof(fc.integer({ min: 0, max: 48 }).map((v) => v / 4), fc.integer({ min: 0, max: 12_000 }).map((v) => v / 1000));
const point = fc.tuple(coord, coord) as fc.Arbitrary<Point>;
const polyline = fc
  .array(point, { minLength: 2, maxLength: 5 })
  .filter((pts) => pts.some((p) => p[0] !== pts[0]![0] || p[1] !== pts[0]![1])) as fc.Arbitrary<Polyline>;
const designArb: fc.Arbitrary<Design> = fc.record({
  lines: fc.array(polyline, { minLength: 1, maxLength: 7 }),
  seams: fc.array(polyline, { maxLength: 3 }),
  edgeTravel: fc.boolean(),
}).map(({ lines, seams, edgeTravel }) => ({ version: 1, units: 'in', width: 12, height: 12, lines, seams, edgeTravel }));

function build(d: Design): PlanarGraph {
  const r = buildPlanarGraph(d);
  if (!r.ok) throw new Error(r.error.message);
  return r.value;
}

function mapDesign(d: Design, f: (p: Point) => Point, extra: Partial<Design> = {}): Design {
  const m = (lines: readonly Polyline[]): Polyline[] => lines.map((l) => l.map(f));
  return { ...d, lines: m(d.lines), seams: m(d.seams), ...extra };
}

/** Figures that must not depend on position, orientation or units (lengths divided by `k`). */
function figures(g: PlanarGraph, k: number, back: (p: Point) => Point) {
  const degree = new Int32Array(g.vertices.length);
  for (const e of g.edges) {
    degree[e.u]!++;
    degree[e.v]!++;
  }
  const sortedLengths = (kind: string): number[] => g.edges.filter((e) => e.kind === kind).map((e) => e.length / k).sort((a, b) => a - b);
  const total = (kind: string): number => sortedLengths(kind).reduce((s, x) => s + x, 0);
  return {
    quilting: sortedLengths('quilting'),
    seams: sortedLengths('seam'),
    edgeTotal: total('edge'),
    junctions: degree.filter((d) => d >= 3).length,
    odd: findOddPoints(g).map((o) => back(o.point)).sort((a, b) => a[0] - b[0] || a[1] - b[1]),
    pieces: findPieces(g).map((p) => p.length / k).sort((a, b) => a - b),
  };
}

function expectClose(a: unknown, b: unknown): void {
  if (typeof a === 'number' && typeof b === 'number') {
    expect(Math.abs(a - b)).toBeLessThanOrEqual(1e-9 * Math.max(1, Math.abs(b)));
  } else if (Array.isArray(a) && Array.isArray(b)) {
    expect(a.length).toBe(b.length);
    a.forEach((x, i) => expectClose(x, b[i]));
  } else if (typeof a === 'object' && a !== null && typeof b === 'object' && b !== null) {
    for (const key of Object.keys(b)) expectClose((a as Record<string, unknown>)[key], (b as Record<string, unknown>)[key]);
  } else expect(a).toEqual(b);
}

const id = (p: Point): Point => p;

describe('graph/planarGraph properties (fast-check)', () => {
  it('is a well-formed planar multigraph: degree sum = 2·edges, even odd-point count, consistent edges', () => {
    fc.assert(
      fc.property(designArb, (d) => {
        const g = build(d);
        const gg = toGraphology(g);
        let degreeSum = 0;
        gg.forEachNode((node) => (degreeSum += gg.degree(node)));
        expect(degreeSum).toBe(2 * g.edges.length); // handshake lemma (Euler 1736)
        expect(findOddPoints(g).length % 2).toBe(0);
        for (const e of g.edges) {
          expect(e.u).not.toBe(e.v);
          expect(e.points[0]).toEqual(g.vertices[e.u]);
          expect(e.points[e.points.length - 1]).toEqual(g.vertices[e.v]);
          expect(e.length).toBeGreaterThan(0);
          expect(Math.abs(e.length - polylineLength(e.points))).toBeLessThan(1e-12);
        }
        const pieceEdges = findPieces(g).flatMap((p) => p.edges);
        expect(pieceEdges.length).toBe(g.edges.filter((e) => e.kind === 'quilting').length);
      }),
      { numRuns: 150, seed: 20251202 },
    );
  });

  it('is unchanged under translation (block enlarged to keep the lines inside)', () => {
    fc.assert(
      fc.property(designArb, fc.double({ min: 0, max: 12, noNaN: true }), fc.double({ min: 0, max: 12, noNaN: true }), (d0, dx, dy) => {
        const d = { ...d0, edgeTravel: false };
        const moved = mapDesign(d, ([x, y]) => [x + dx, y + dy], { width: 24, height: 24 });
        expectClose(figures(build(moved), 1, ([x, y]) => [x - dx, y - dy]), figures(build(d), 1, id));
      }),
      { numRuns: 100, seed: 7 },
    );
  });

  it('is unchanged under a 90° rotation, mirroring and inch → cm scaling', () => {
    fc.assert(
      fc.property(designArb, (d) => {
        const base = figures(build(d), 1, id);
        const rotated = mapDesign(d, ([x, y]) => [12 - y, x]);
        expectClose(figures(build(rotated), 1, ([x, y]) => [y, 12 - x]), base);
        const mirrored = mapDesign(d, ([x, y]) => [12 - x, y]);
        expectClose(figures(build(mirrored), 1, ([x, y]) => [12 - x, y]), base);
        const cm = mapDesign(d, ([x, y]) => [x * 2.54, y * 2.54], { units: 'cm', width: 12 * 2.54, height: 12 * 2.54 });
        expectClose(figures(build(cm), 2.54, ([x, y]) => [x / 2.54, y / 2.54]), base);
      }),
      { numRuns: 100, seed: 42 },
    );
  });
});
