import { describe, expect, it } from 'vitest';
import { designSchema, type DesignInput } from '../design/design.schema.ts';
import type { Point } from '../geometry/point.ts';
import { checkRoute } from './checkRoute.ts';
import { planDesign } from './planDesign.ts';

// Two quilting lines across a 12 in block at y = 4 and y = 8, outline for edge travel (E10, docs/engine.md §7.3).
const base = (route: Point[][], extra: Partial<DesignInput> = {}) =>
  designSchema.parse({ version: 1, units: 'in', width: 12, height: 12, seams: [], lines: [[[0, 4], [12, 4]], [[0, 8], [12, 8]]], route, ...extra });

const check = (route: Point[][], extra: Partial<DesignInput> = {}) => {
  const r = checkRoute(base(route, extra));
  if (!r.ok) throw new Error(r.error.message);
  return r.value;
};

describe('checkRoute', () => {
  it('measures a one-pass route with edge travel and reads directions for the quilter (y down = toward)', () => {
    const c = check([[[0, 4], [12, 4]], [[12, 4], [12, 8]], [[12, 8], [0, 8]]]);
    expect(c.passes).toBe(1);
    expect(c.stops).toBe(0);
    expect(c.stitchLength).toBeCloseTo(24, 9);
    expect(c.edgeLength).toBeCloseTo(4, 9);
    expect(c.travelLength).toBeCloseTo(4, 9);
    expect(c.unstitched.count).toBe(0);
    expect(c.strokes.map((s) => s.direction)).toEqual(['right', 'toward', 'left']);
    expect(c.warnings).toEqual([]);
  });

  it('starts a new pass wherever a stroke does not begin at the needle', () => {
    const c = check([[[0, 4], [12, 4]], [[0, 8], [12, 8]]]);
    expect(c.passes).toBe(2);
    expect(c.stops).toBe(1);
    expect(c.strokes.map((s) => s.pass)).toEqual([1, 2]);
  });

  it('counts the second cover of a quilting line as retrace and lists lines never stitched', () => {
    const c = check([[[0, 4], [12, 4]], [[12, 4], [0, 4]]]);
    expect(c.retraceLength).toBeCloseTo(12, 9);
    expect(c.unstitched.count).toBe(1);
    expect(c.unstitched.length).toBeCloseTo(12, 9);
  });

  it('warns about stitching where the design has no line, and about edge travel leaving the binding band', () => {
    const c = check([[[0, 4], [12, 4]], [[12, 4], [6, 6], [12, 8]], [[12, 8], [0, 8]]]);
    expect(c.warnings.map((w) => w.kind)).toContain('edge-travel-outside-band');
    const d = check([[[0, 4], [12, 4]], [[6, 4], [6, 8]]]);
    expect(d.warnings.map((w) => w.kind)).toContain('off-line');
    expect(d.offLineLength).toBeCloseTo(4, 9);
  });

  it('counts travel hugging the edge inside the band as edge travel', () => {
    const c = check([[[0, 4], [12, 4]], [[12, 4], [11.95, 6], [12, 8]], [[12, 8], [0, 8]]]);
    expect(c.passes).toBe(1);
    expect(c.warnings).toEqual([]);
    expect(c.edgeLength).toBeGreaterThan(4);
  });

  it('never beats the planner: the planned travel is at most the quilter’s', () => {
    const design = base([[[0, 4], [12, 4]], [[12, 4], [12, 8]], [[12, 8], [0, 8]]]);
    const plan = planDesign(design);
    const own = checkRoute(design);
    expect(plan.ok && own.ok).toBe(true);
    if (plan.ok && own.ok) expect(plan.value.travelLength).toBeLessThanOrEqual(own.value.travelLength + 1e-9);
  });

  it('returns a design problem for a route stroke with one distinct point', () => {
    const r = checkRoute({ ...base([]), route: [[[1, 1], [1, 1]]] });
    expect(r.ok).toBe(false);
  });
  describe('replaying a planned route (pinned regressions)', () => {
    // Planned strokes fed back as the route must reproduce the planner's figures: no unstitched or off-line pieces.
    const replay = (input: DesignInput) => {
      const design = designSchema.parse(input);
      const plan = planDesign(design);
      if (!plan.ok) throw new Error(plan.error.message);
      const own = checkRoute({ ...design, route: plan.value.route.map((s) => [...s.points]) });
      if (!own.ok) throw new Error(own.error.message);
      return { plan: plan.value, own: own.value };
    };
    const cases: [string, DesignInput][] = [
      // A stroke along a line through a rounded crossing vertex: the near-collinear pair gave a spurious crossing 1.4e-4 away.
      ['a stroke laid along a line through a rounded crossing', { version: 1, units: 'in', width: 12, height: 12, seams: [[[6.25, 5.5], [0.5, 0.25], [0, 0]]], lines: [[[2.5, 6.25], [2.75, 0]], [[2.25, 2.5], [7.5, 1]]], edgeTravel: false }],
      // A line turning back sharply across a seam: its crossing vertex lies within the tolerance of the returning segment,
      // so re-noding the design with the route cut that segment there (a found seed of the float property below).
      ['a sharp turn back across a seam', { version: 1, units: 'in', width: 12, height: 12, lines: [[[7.844192043878138, 11.551876293495297], [4.627526041120291, 10.53265846800059], [9.535716128535569, 5.642491799779236], [3.603271521627903, 10.966686096042395]]], seams: [[[0.6792055461555719, 1.1023602252826095], [11.121270454488695, 5.14618597459048], [0.25316309463232756, 8.551803577691317]]] }],
    ];
    for (const [name, input] of cases) {
      it(`reproduces the planner's figures: ${name}`, () => {
        const { plan, own } = replay(input);
        expect(own.unstitched.count).toBe(0);
        expect(own.offLineLength).toBe(0);
        expect(own.warnings).toEqual([]);
        expect(own.passes).toBe(plan.passes);
        for (const key of ['stitchLength', 'retraceLength', 'ditchLength', 'edgeLength'] as const) {
          expect(Math.abs(own[key] - plan[key])).toBeLessThanOrEqual(1e-9 * Math.max(1, plan[key]));
        }
      });
    }
  });
});
