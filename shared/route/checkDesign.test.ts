import { describe, expect, it } from 'vitest';
import { designSchema } from '../design/design.schema.ts';
import { checkDesign } from './checkDesign.ts';

const design = (lines: number[][][], seams: number[][][] = []) =>
  designSchema.parse({ version: 1, units: 'in', width: 12, height: 12, seams, lines });

describe('checkDesign', () => {
  it('a cross has 4 odd points: by Euler (1736) 2 passes without travel, 1 pass with edge travel', () => {
    const r = checkDesign(design([[[6, 0], [6, 12]], [[0, 6], [12, 6]]]));
    if (!r.ok) throw new Error(r.error.message);
    const c = r.value;
    expect(c.pieces).toBe(1);
    expect(c.oddPoints.count).toBe(4);
    expect(c.oddPoints.points).toEqual(expect.arrayContaining([[6, 0], [6, 12], [0, 6], [12, 6]]));
    expect(c.onePassWithoutTravel).toBe(false);
    expect(c.passesWithoutTravel).toBe(2);
    expect(c.passesWithTravel).toBe(1);
    expect(c.stitchLength).toBeCloseTo(24, 9);
    // Free ends take two odd points; joining the other two costs 12 whether along the outline or back along the lines
    // (route inspection by hand).
    expect(c.plan.travelLength).toBeCloseTo(12, 9);
    expect(c.plan.optimal).toBe(true);
  });

  it('a closed square stitches in one pass without travel; two apart squares need two passes without travel', () => {
    const square = (x: number) => [[x, 1], [x + 2, 1], [x + 2, 3], [x, 3], [x, 1]];
    const one = checkDesign(design([square(1)]));
    const two = checkDesign(design([square(1), square(6)]));
    if (!one.ok || !two.ok) throw new Error('design refused');
    expect(one.value.onePassWithoutTravel).toBe(true);
    expect(one.value.oddPoints.count).toBe(0);
    expect(two.value.pieces).toBe(2);
    expect(two.value.passesWithoutTravel).toBe(2);
    // Nothing joins the squares (no seams, outline not touched), so travel cannot either.
    expect(two.value.passesWithTravel).toBe(2);
  });

  it('returns the design problem for an empty design', () => {
    expect(checkDesign(design([])).ok).toBe(false);
  });
});
