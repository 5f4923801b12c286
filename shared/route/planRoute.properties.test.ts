import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { designSchema, type Design } from '../design/design.schema.ts';
import type { Point } from '../geometry/point.ts';
import { buildPlanarGraph } from '../graph/planarGraph.ts';
import type { PlanarGraph } from '../graph/planarGraph.types.ts';
import { checkRoute } from './checkRoute.ts';
import { planDesign } from './planDesign.ts';
import { planRoute, type PlanOptions, type RoutePlan } from './planRoute.ts';

const coord = fc.integer({ min: 0, max: 48 }).map((k) => k / 4);
/** Any double in the block: crossings and near-coincidences at rounding level, unlike the 1/4 in grid. */
const floatCoord = fc.double({ min: 0, max: 12, noNaN: true });
const designArb = designArbOf(coord);

function designArbOf(c: fc.Arbitrary<number>): fc.Arbitrary<Design> {
  const point = fc.tuple(c, c) as fc.Arbitrary<Point>;
  const polyline = fc.array(point, { minLength: 2, maxLength: 4 }).filter((l) => l.some((p) => p[0] !== l[0]![0] || p[1] !== l[0]![1]));
  return fc
    .record({
      lines: fc.array(polyline, { minLength: 1, maxLength: 7 }),
      seams: fc.array(polyline, { maxLength: 3 }),
      edgeTravel: fc.boolean(),
      ends: fc.constantFrom('free', 'corner-closed', 'corner-to-corner'),
    })
    .map(({ lines, seams, edgeTravel, ends }) =>
      designSchema.parse({
        version: 1,
        units: 'in',
        width: 12,
        height: 12,
        lines,
        seams,
        edgeTravel,
        ...(ends === 'corner-closed' ? { start: [0, 0], end: [0, 0] } : ends === 'corner-to-corner' ? { start: [0, 0], end: [12, 12] } : {}),
      }),
    );
}

function graphOf(design: Design): PlanarGraph {
  const r = buildPlanarGraph(design);
  if (!r.ok) throw new Error(r.error.message);
  return r.value;
}

const optionsOf = (d: Design): PlanOptions => ({ edgeTravel: d.edgeTravel, ...(d.start ? { start: d.start } : {}), ...(d.end ? { end: d.end } : {}) });
const close = (a: number, b: number): boolean => Math.abs(a - b) <= 1e-9 * Math.max(1, Math.abs(a), Math.abs(b));

/** Maps a design through a point map (and a new block size and unit); lengths scale by `scale`. */
function mapDesign(d: Design, f: (p: Point) => Point, size: [number, number], units: Design['units'] = d.units): Design {
  const line = (l: readonly Point[]) => l.map(f);
  return designSchema.parse({
    ...d,
    units,
    width: size[0],
    height: size[1],
    lines: d.lines.map(line),
    seams: d.seams.map(line),
    ...(d.start ? { start: f(d.start) } : {}),
    ...(d.end ? { end: f(d.end) } : {}),
  });
}

function expectSameFigures(a: RoutePlan, b: RoutePlan, scale: number): void {
  expect(b.passes).toBe(a.passes);
  expect(b.pieces).toBe(a.pieces);
  expect(b.oddPoints).toBe(a.oddPoints);
  expect(close(b.stitchLength, a.stitchLength * scale)).toBe(true);
  expect(close(b.travelLowerBound, a.travelLowerBound * scale)).toBe(true);
  if (a.optimal && b.optimal) expect(close(b.travelLength, a.travelLength * scale)).toBe(true);
}

describe('planRoute properties (fast-check)', () => {
  it('stitches every quilting line exactly once, keeps passes continuous and travels only on allowed lines', () => {
    fc.assert(
      fc.property(designArb, (design) => {
        const graph = graphOf(design);
        const plan = planRoute(graph, optionsOf(design));
        expect(plan.oddPoints % 2).toBe(0); // handshake lemma
        for (let i = 1; i < plan.route.length; i++) {
          const a = plan.route[i - 1]!;
          const b = plan.route[i]!;
          if (a.pass === b.pass) expect(b.points[0]).toEqual(a.points.at(-1));
        }
        if (!design.edgeTravel) expect(plan.edgeLength).toBe(0);
        // Edge by edge: each quilting edge has exactly one stitch, retrace only after it, travel only on travel lines.
        const stitched = new Int32Array(graph.edges.length);
        for (const stroke of plan.route) {
          for (const id of stroke.edges) {
            const kind = graph.edges[id]!.kind;
            if (stroke.kind === 'stitch') stitched[id]!++;
            const expected = { stitch: 'quilting', retrace: 'quilting', ditch: 'seam', edge: 'edge' }[stroke.kind];
            expect(kind).toBe(expected);
            if (stroke.kind === 'retrace') expect(stitched[id]).toBe(1);
          }
        }
        graph.edges.forEach((e) => expect(stitched[e.id]).toBe(e.kind === 'quilting' ? 1 : 0));
        expect(plan.travelLength).toBeGreaterThanOrEqual(plan.travelLowerBound - 1e-9);
      }),
      { seed: 31, numRuns: 60 },
    );
  });

  it('uses the fewest passes: one per travel-connected group, never more than without travel', () => {
    fc.assert(
      fc.property(designArb, (design) => {
        const graph = graphOf(design);
        const plan = planRoute(graph, optionsOf(design));
        const noTravel = planRoute(graph, { ...optionsOf(design), edgeTravel: false });
        expect(plan.passes).toBeGreaterThanOrEqual(1);
        expect(plan.passes).toBeLessThanOrEqual(noTravel.passes);
        expect(plan.passes).toBeLessThanOrEqual(plan.pieces);
      }),
      { seed: 32, numRuns: 60 },
    );
  });

  it('never travels more than another valid route (the optimum under random travel weights)', () => {
    fc.assert(
      fc.property(designArb, fc.tuple(fc.double({ min: 1, max: 5, noNaN: true }), fc.double({ min: 1, max: 5, noNaN: true }), fc.double({ min: 1, max: 5, noNaN: true })), (design, [retrace, ditch, edge]) => {
        const graph = graphOf(design);
        const plan = planRoute(graph, optionsOf(design));
        const other = planRoute(graph, { ...optionsOf(design), weights: { retrace, ditch, edge } });
        if (plan.optimal) expect(plan.travelLength).toBeLessThanOrEqual(other.travelLength + 1e-9);
        expect(plan.travelLowerBound).toBeLessThanOrEqual(other.travelLength + 1e-9);
      }),
      { seed: 33, numRuns: 60 },
    );
  });

  it('gives the same figures after translation, 90° rotation, mirroring and inch → cm scaling', () => {
    fc.assert(
      fc.property(designArb, fc.tuple(fc.double({ min: -50, max: 50, noNaN: true }), fc.double({ min: -50, max: 50, noNaN: true })), (design, [dx, dy]) => {
        const graph = graphOf(design);
        const plan = planRoute(graph, optionsOf(design));
        // Translation acts on the planar graph itself (a block always has its corner at the origin).
        const moved: PlanarGraph = {
          vertices: graph.vertices.map(([x, y]) => [x + dx, y + dy]),
          edges: graph.edges.map((e) => ({ ...e, points: e.points.map(([x, y]) => [x + dx, y + dy] as Point) })),
        };
        const shift = (p: Point | undefined): Point | undefined => (p ? [p[0] + dx, p[1] + dy] : undefined);
        const s = shift(design.start);
        const t = shift(design.end);
        expectSameFigures(plan, planRoute(moved, { edgeTravel: design.edgeTravel, ...(s ? { start: s } : {}), ...(t ? { end: t } : {}) }), 1);
        const rotated = mapDesign(design, ([x, y]) => [12 - y, x], [12, 12]);
        expectSameFigures(plan, planRoute(graphOf(rotated), optionsOf(rotated)), 1);
        const mirrored = mapDesign(design, ([x, y]) => [12 - x, y], [12, 12]);
        expectSameFigures(plan, planRoute(graphOf(mirrored), optionsOf(mirrored)), 1);
        const cm = mapDesign(design, ([x, y]) => [x * 2.54, y * 2.54], [12 * 2.54, 12 * 2.54], 'cm');
        expectSameFigures(plan, planRoute(graphOf(cm), optionsOf(cm)), 2.54);
      }),
      { seed: 34, numRuns: 40 },
    );
  });
  it('replays: checkRoute of the planned strokes stitches every quilting line exactly once with the planner\'s figures', () => {
    // The planned strokes go back in as the quilter's route (plain polylines), traced by graph/traceRoute.
    const replays = (design: Design): void => {
      const plan = planDesign(design);
      if (!plan.ok) throw new Error(plan.error.message);
      const own = checkRoute({ ...design, route: plan.value.route.map((s) => [...s.points]) });
      if (!own.ok) throw new Error(own.error.message);
      expect(own.value.unstitched.count).toBe(0);
      expect(own.value.offLineLength).toBe(0);
      expect(own.value.warnings).toEqual([]);
      expect(own.value.passes).toBe(plan.value.passes);
      expect(own.value.oddPoints).toBe(plan.value.oddPoints);
      for (const key of ['stitchLength', 'retraceLength', 'ditchLength', 'edgeLength'] as const) expect(close(own.value[key], plan.value[key])).toBe(true);
    };
    fc.assert(fc.property(designArb, replays), { seed: 35, numRuns: 60 });
    fc.assert(fc.property(designArbOf(floatCoord), replays), { seed: 36, numRuns: 100 });
  });
});
