import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { formatRulerLength } from './rulerLength.ts';

// Analytic: an imperial quilting ruler is marked in eighths of an inch, so a reading is the nearest
// multiple of 1/8 written as a mixed number in lowest terms (2.75 = 2 + 6/8 = 2 3/4). Metric rulers
// marked every 0.5 cm are read to the nearest 0.5 cm. (Arithmetic of fractions; ruler markings from memory.)
describe('formatRulerLength', () => {
  it.each([
    [2.75, '2 3/4 in'],
    [0.5, '1/2 in'],
    [0.125, '1/8 in'],
    [0.375, '3/8 in'],
    [12, '12 in'],
    [1.0625, '1 1/8 in'], // exactly halfway rounds up (Math.round)
    [1.06, '1 in'],
    [7.9, '7 7/8 in'],
    [7.95, '8 in'],
    [4.2, '4 1/4 in'],
    [0, '0 in'],
    [0.05, 'under 1/16 in'],
  ])('%s in reads %s', (value, text) => {
    expect(formatRulerLength(value, 'in')).toBe(text);
  });

  it.each([
    [3.4, '3.5 cm'],
    [3.2, '3 cm'],
    [30.48, '30.5 cm'],
    [0.1, 'under 0.25 cm'],
    [0, '0 cm'],
    [10, '10 cm'],
  ])('%s cm reads %s', (value, text) => {
    expect(formatRulerLength(value, 'cm')).toBe(text);
  });

  it('refuses lengths that are not lengths', () => {
    expect(() => formatRulerLength(-1, 'in')).toThrow(/walkthrough\/rulerLength/);
    expect(() => formatRulerLength(Number.NaN, 'cm')).toThrow(/walkthrough\/rulerLength/);
  });

  it('parses back to within 1/16 in of the value, in lowest terms (property)', () => {
    fc.assert(
      fc.property(fc.double({ min: 0.07, max: 200, noNaN: true }), (value) => {
        const text = formatRulerLength(value, 'in');
        const m = /^(?:(\d+) )?(?:(\d+)\/(\d+) )?in$/.exec(text);
        expect(m).not.toBeNull();
        const [, whole, num, den] = m!;
        const read = Number(whole ?? 0) + (num ? Number(num) / Number(den) : 0);
        expect(Math.abs(read - value)).toBeLessThanOrEqual(1 / 16 + 1e-12);
        if (num) {
          expect(Number(num) % 2).toBe(1); // lowest terms over a power of two
          expect([2, 4, 8]).toContain(Number(den));
        }
      }),
    );
  });
});
