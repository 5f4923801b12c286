import { describe, expect, it } from 'vitest';
import { applyCommand } from '../design/commands.ts';
import { designSchema, type Design, type DesignInput } from '../design/design.schema.ts';
import type { Polyline } from '../geometry/point.ts';
import { planDesign } from '../route/planDesign.ts';
import { findJoins } from './findJoins.ts';
import { commandForJoin } from './joinCommand.ts';

const square = (x: number, y: number, s: number): Polyline => [[x, y], [x + s, y], [x + s, y + s], [x, y + s], [x, y]];
const design = (lines: Polyline[], extra: Partial<DesignInput> = {}): Design =>
  designSchema.parse({ version: 1, units: 'in', width: 12, height: 12, seams: [], lines, ...extra });
const passes = (d: Design): number => {
  const plan = planDesign(d);
  if (!plan.ok) throw new Error(plan.error.message);
  return plan.value.passes;
};
const joinsOf = (d: Design) => {
  const found = findJoins(d);
  if (!found.ok) throw new Error(found.error.message);
  return found.value;
};

describe('joins/findJoins: two pieces a known distance apart', () => {
  it('proposes the 3 in line between two squares 3 in apart, saving the one stop', () => {
    // Squares [2,4]² and [7,9]×[2,4]: facing sides x = 4 and x = 7, 3 in apart; each is 2 in from the edge,
    // so going round by the edge would take 2 + 2 = 4 in of new line.
    const d = design([square(2, 2, 2), square(7, 2, 2)]);
    expect(passes(d)).toBe(2);
    const { groups, joins } = joinsOf(d);
    expect(groups.length).toBe(2);
    expect(joins.length).toBe(1);
    const join = joins[0]!;
    expect(join.length).toBeCloseTo(3, 12);
    expect(join.legs.length).toBe(1);
    expect(join.visible).toBe(true);
    expect(join.legs[0]!.fromEnd).toBe('line');
    expect(join.legs[0]!.toEnd).toBe('line');
    expect(join.stopsSaved).toBe(1);
    // One undoable command: the planner's passes fall by the stops saved, and undo restores the design.
    const applied = applyCommand(d, commandForJoin(join));
    expect(passes(applied.design)).toBe(2 - join.stopsSaved);
    expect(applyCommand(applied.design, applied.inverse).design).toEqual(d);
  });

  it('goes by the edge when that is shorter: two 1 in legs to the binding band, ditch-free travel between', () => {
    // Squares 1 in from the edge in opposite corners: straight across is 8√2 ≈ 11.3 in, each to the edge 1 in.
    const d = design([square(1, 1, 1), square(10, 10, 1)]);
    const { joins } = joinsOf(d);
    expect(joins.length).toBe(1);
    const join = joins[0]!;
    expect(join.length).toBeCloseTo(2, 12);
    expect(join.legs.map((l) => [l.fromEnd, l.toEnd])).toEqual([['line', 'edge'], ['edge', 'line']]);
    expect(join.stopsSaved).toBe(1);
    expect(passes(applyCommand(d, commandForJoin(join)).design)).toBe(1);
  });

  it('reaches a seam when the ditch is nearest (the route goes on in the ditch)', () => {
    // A half-square triangle's diagonal seam; a square 1.5 in below it. Edge travel off, so the seam is travel only.
    const seam: Polyline = [[0, 12], [12, 0]];
    const d = design([square(2, 2, 1), [[12, 12], [8, 12], [8, 8]]], { seams: [seam], edgeTravel: false });
    const { joins } = joinsOf(d);
    const viaSeam = joins.find((j) => j.legs.some((l) => l.toEnd === 'seam' || l.fromEnd === 'seam'));
    expect(viaSeam).toBeDefined();
    // From corner (3, 3) of the square to the line x + y = 12: (12 − 6)/√2 = 3√2 (point-to-line distance).
    expect(viaSeam!.legs[0]!.length).toBeCloseTo(3 * Math.SQRT2, 9);
  });

  it('runs along the edge, hidden by the binding, when edge travel is off', () => {
    // Two U shapes standing on the bottom edge, 5 in apart there; edge travel off.
    const d = design([[[1, 12], [1, 10], [3, 10], [3, 12]], [[8, 12], [8, 10], [10, 10], [10, 12]]], { edgeTravel: false });
    expect(passes(d)).toBe(2);
    const { joins } = joinsOf(d);
    expect(joins.length).toBe(1);
    expect(joins[0]!.length).toBeCloseTo(5, 12);
    expect(joins[0]!.visible).toBe(false);
    expect(joins[0]!.legs[0]!.points.every((p) => Math.abs(p[1] - 12) < 1e-12)).toBe(true);
    expect(passes(applyCommand(d, commandForJoin(joins[0]!)).design)).toBe(1);
  });

  it('says nothing when the design is one line group already', () => {
    expect(joinsOf(design([[[0, 6], [12, 6]]])).joins).toEqual([]);
  });
});

// The exactness check against Shapely and networkx is tests/reference/joins.networkx.test.ts.
