import { describe, expect, it } from 'vitest';
import { designSchema, type DesignInput } from '../design/design.schema.ts';
import type { Point } from '../geometry/point.ts';
import { checkRoute } from './checkRoute.ts';
import { planDesign } from './planDesign.ts';

// Two quilting lines across a 12 in block at y = 4 and y = 8, outline for edge travel (E10 of engine-references.md).
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
});
