import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { buildRulerTicks, MIN_LABEL_GAP_PX } from './rulerTicks.ts';

describe('ruler ticks', () => {
  it('at true size an inch ruler shows every 1/8 in, ranked like a printed quilting ruler', () => {
    // 96 px/in (CSS true size): 1/8 in = 12 px, all four ranks visible.
    const ticks = buildRulerTicks(0, 1, 96, 'in');
    expect(ticks.map((t) => t.at)).toEqual([0, 0.125, 0.25, 0.375, 0.5, 0.625, 0.75, 0.875, 1]);
    expect(ticks.map((t) => t.rank)).toEqual([0, 3, 2, 3, 1, 3, 2, 3, 0]);
    expect(ticks[0]!.label).toBe('0');
    expect(ticks[8]!.label).toBe('1');
  });

  it('drops marks that would be closer than 5 px', () => {
    // 30 px/in: 1/8 in = 3.75 px (dropped), 1/4 in = 7.5 px (kept).
    const ticks = buildRulerTicks(0, 2, 30, 'in');
    expect(ticks).toHaveLength(9);
    expect(Math.max(...ticks.map((t) => t.rank))).toBe(2);
  });

  it('a cm ruler marks millimetres, half and whole centimetres', () => {
    const ticks = buildRulerTicks(0, 1, 96 / 2.54 * 2, 'cm');
    expect(ticks).toHaveLength(11);
    expect(ticks.filter((t) => t.rank === 1).map((t) => t.at)).toEqual([0.5]);
  });

  it('when whole units crowd, keeps every k-th one', () => {
    // 1 px/in: every 5th inch is 5 px apart, the first step that is not too dense.
    const ticks = buildRulerTicks(0, 50, 1, 'in');
    expect(ticks.map((t) => t.at)).toEqual([0, 5, 10, 15, 20, 25, 30, 35, 40, 45, 50]);
  });

  it('numbers whole units only as often as they fit: a 30 cm block on a phone (7 px/cm) every 5 cm', () => {
    const labels = buildRulerTicks(0, 30, 7, 'cm').filter((t) => t.label !== undefined).map((t) => t.label);
    expect(labels).toEqual(['0', '5', '10', '15', '20', '25', '30']);
  });

  it('never puts two numbers closer than MIN_LABEL_GAP_PX, at any zoom (property)', () => {
    fc.assert(
      fc.property(fc.double({ min: 0.5, max: 400, noNaN: true }), fc.constantFrom('in' as const, 'cm' as const), (scale, units) => {
        const at = buildRulerTicks(-10, 200, scale, units).filter((t) => t.label !== undefined).map((t) => t.at);
        for (let i = 1; i < at.length; i++) expect((at[i]! - at[i - 1]!) * scale).toBeGreaterThanOrEqual(MIN_LABEL_GAP_PX - 1e-9);
      }),
      { numRuns: 300 },
    );
  });
});
