import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import type { Design } from '../design/design.schema.ts';
import type { Point, Polyline } from '../geometry/point.ts';
import { polylineLength } from '../geometry/polyline.ts';
import { findOddPoints } from './oddPoints.ts';
import { findPieces } from './pieces.ts';
import { buildPlanarGraph } from './planarGraph.ts';
import type { PlanarGraph } from './planarGraph.types.ts';
import { traceRoute, type TracedRoute } from './traceRoute.ts';

function design(lines: Polyline[], route: Polyline[], extra: Partial<Design> = {}): Design {
  return { version: 1, units: 'in', width: 12, height: 12, seams: [], lines, edgeTravel: false, route, ...extra };
}

function trace(d: Design): TracedRoute {
  const r = traceRoute(d);
  if (!r.ok) throw new Error(r.error.message);
  return r.value;
}

/** The stroke's pieces as polylines in stitching order, for comparing with what was drawn. */
function piecePolylines(t: TracedRoute, stroke: number): Point[][] {
  return t.strokes[stroke]!.pieces.map((p) => {
    if (p.offLine) return [...p.points];
    const pts = t.graph.edges[p.edge]!.points;
    return p.forward ? [...pts] : [...pts].reverse();
  });
}

describe('graph/traceRoute', () => {
  const cross: Polyline[] = [[[0, 6], [12, 6]], [[6, 0], [6, 12]]];

  it('traces strokes along lines as whole edges, in order and direction', () => {
    const t = trace(design(cross, [[[0, 6], [6, 6], [6, 0]], [[6, 12], [6, 6], [12, 6]]]));
    expect(t.strokes).toHaveLength(2);
    expect(piecePolylines(t, 0)).toEqual([[[0, 6], [6, 6]], [[6, 6], [6, 0]]]);
    expect(piecePolylines(t, 1)).toEqual([[[6, 12], [6, 6]], [[6, 6], [12, 6]]]);
    expect(t.strokes[0]!.length).toBe(12);
    expect(t.strokes[0]!.start).toEqual([0, 6]);
    expect(t.strokes[1]!.end).toEqual([12, 6]);
  });

  it('splits a design line where a stroke stops in its middle, and turns back there', () => {
    const t = trace(design(cross, [[[0, 6], [3, 6], [1, 6]]]));
    expect(piecePolylines(t, 0)).toEqual([[[0, 6], [1, 6]], [[1, 6], [3, 6]], [[3, 6], [1, 6]]]);
    expect(t.strokes[0]!.length).toBe(5);
  });

  it('keeps bends inside an edge when a stroke follows a bent line through', () => {
    const zig: Polyline = [[0, 0], [2, 2], [4, 0], [6, 2]];
    const t = trace(design([zig], [[[6, 2], [4, 0], [2, 2], [0, 0]]]));
    expect(t.graph.edges).toHaveLength(1);
    expect(t.strokes[0]!.pieces).toEqual([{ offLine: false, edge: 0, forward: false }]);
  });

  it('reports stitching where there is no line as an off-line piece', () => {
    const t = trace(design(cross, [[[0, 6], [6, 6], [9, 9], [12, 6]]]));
    const pieces = t.strokes[0]!.pieces;
    expect(pieces.map((p) => p.offLine)).toEqual([false, true]);
    // (6,6) → (9,9) → (12,6) follows no line: 2·3√2 long (analytic).
    const off = pieces[1]!;
    expect(off.offLine && off.length).toBeCloseTo(6 * Math.SQRT2, 12);
    expect(off.offLine && off.points).toEqual([[6, 6], [9, 9], [12, 6]]);
  });

  it('maps strokes onto seams and the outline too', () => {
    const t = trace(design([[[6, 0], [6, 12]]], [[[6, 12], [6, 0], [12, 0], [12, 4]]], { edgeTravel: true, seams: [[[6, 0], [12, 0]]] }));
    const kinds = t.strokes[0]!.pieces.map((p) => (p.offLine ? 'off' : t.graph.edges[p.edge]!.kind));
    expect(kinds).toEqual(['quilting', 'seam', 'edge']);
  });

  it('validates route strokes like other lines', () => {
    const r = traceRoute(design(cross, [[[1, 1], [1, 1]]]));
    expect(r.ok || r.error.kind).toBe('line-too-short');
    const far = traceRoute(design(cross, [[[1, 1], [100, 1]]]));
    expect(far.ok || far.error).toMatchObject({ kind: 'outside-block', group: 'route', index: 0 });
  });

  // Route noding only adds degree-2 vertices, which cannot change parity (handshake lemma), pieces or lengths.
  it('leaves every design figure as buildPlanarGraph gives it (fast-check)', () => {
    const coord = fc.integer({ min: 0, max: 48 }).map((v) => v / 4);
    const point = fc.tuple(coord, coord) as fc.Arbitrary<Point>;
    const line = fc.array(point, { minLength: 2, maxLength: 4 }).filter((l) => l.some((p) => p[0] !== l[0]![0] || p[1] !== l[0]![1])) as fc.Arbitrary<Polyline>;
    const arb = fc.record({
      lines: fc.array(line, { minLength: 1, maxLength: 6 }),
      seams: fc.array(line, { maxLength: 2 }),
      edgeTravel: fc.boolean(),
      // strokes: sub-polylines along design lines (chosen by index and parameters below) plus free ones
      picks: fc.array(fc.tuple(fc.nat(), fc.nat(), fc.double({ min: 0, max: 1, noNaN: true }), fc.double({ min: 0, max: 1, noNaN: true })), { maxLength: 5 }),
      free: fc.array(line, { maxLength: 2 }),
    });
    fc.assert(
      fc.property(arb, ({ lines, seams, edgeTravel, picks, free }) => {
        const along: Polyline[] = picks.flatMap(([li, si, t0, t1]) => {
          const l = lines[li % lines.length]!;
          const k = si % (l.length - 1);
          const [a, b] = [l[k]!, l[k + 1]!];
          const at = (t: number): Point => [a[0] + (b[0] - a[0]) * t, a[1] + (b[1] - a[1]) * t];
          const p = at(t0);
          const q = at(t1);
          return Math.hypot(q[0] - p[0], q[1] - p[1]) > 1e-3 ? [[p, q, ...l.slice(k + 1)]] : [];
        });
        const d: Design = { version: 1, units: 'in', width: 12, height: 12, lines, seams, edgeTravel, route: [...along, ...free] };
        const built = buildPlanarGraph(d);
        if (!built.ok) throw new Error(built.error.message);
        const t = trace(d);
        expectSameFigures(t.graph, built.value);
        t.strokes.forEach((s, i) => {
          // A stroke is the concatenation of its pieces; its length matches what was drawn.
          const polys = piecePolylines(t, i);
          polys.forEach((poly, k) => k > 0 && expect(poly[0]).toEqual(polys[k - 1]!.at(-1)));
          if (polys.length > 0) expect(polys[0]![0]).toEqual(s.start);
          expect(s.length).toBeCloseTo(polylineLength(d.route![i]!), 6);
        });
      }),
      { numRuns: 150, seed: 99 },
    );
  });
});

function expectSameFigures(a: PlanarGraph, b: PlanarGraph): void {
  const total = (g: PlanarGraph, kind: string): number => g.edges.filter((e) => e.kind === kind).reduce((s, e) => s + e.length, 0);
  for (const kind of ['quilting', 'seam', 'edge']) expect(Math.abs(total(a, kind) - total(b, kind))).toBeLessThan(1e-9);
  const odd = (g: PlanarGraph): string[] => findOddPoints(g).map((o) => o.point.join(',')).sort();
  expect(odd(a)).toEqual(odd(b));
  const pieces = (g: PlanarGraph): number[] => findPieces(g).map((p) => Math.round(p.length * 1e9)).sort((x, y) => x - y);
  expect(pieces(a)).toEqual(pieces(b));
}
