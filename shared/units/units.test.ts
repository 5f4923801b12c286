import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { convertLength, formatArea, formatLength, formatSize, formatThread, inchFraction, lengthInputText, parseInchInput, parseLengthInput } from './units.ts';

// Conversion factors are exact by definition (international yard and pound agreement, 1959): 1 in = 2.54 cm,
// 1 yd = 0.9144 m.
describe('units', () => {
  it('converts inches and centimetres exactly', () => {
    expect(convertLength(12, 'in', 'cm')).toBeCloseTo(30.48, 12);
    expect(convertLength(30.48, 'cm', 'in')).toBeCloseTo(12, 12);
    fc.assert(fc.property(fc.double({ min: 0, max: 1000, noNaN: true }), (v) => Math.abs(convertLength(convertLength(v, 'in', 'cm'), 'cm', 'in') - v) < 1e-9));
  });

  it('writes inches as ruler fractions to 1/16 in lowest terms', () => {
    expect(inchFraction(57.94)).toBe('57 15/16');
    expect(inchFraction(0.0625)).toBe('1/16');
    expect(inchFraction(12.5)).toBe('12 1/2');
    expect(inchFraction(0.375)).toBe('3/8');
    expect(inchFraction(12)).toBe('12');
    expect(inchFraction(0.01)).toBe('0');
    expect(inchFraction(-0.25)).toBe('-1/4');
    expect(inchFraction(2.75, 8)).toBe('2 3/4');
  });

  it('writes a length in the viewer’s units, not the design’s', () => {
    expect(formatLength(57.94, 'in', 'in')).toBe('57 15/16 in');
    expect(formatLength(6, 'in', 'cm')).toBe('15.2 cm');
    expect(formatLength(57.94, 'in', 'cm')).toBe('1.47 m');
    expect(formatLength(30.48, 'cm', 'in')).toBe('12 in');
    expect(formatSize(12, 12, 'in', 'cm')).toBe('30.5 × 30.5 cm');
    expect(formatSize(30.48, 30.48, 'cm', 'in')).toBe('12 × 12 in');
  });

  it('writes thread in yards or metres', () => {
    expect(formatThread(15.6, 'in')).toBe('15.6 yd');
    expect(formatThread(15.6, 'cm')).toBe('14.3 m'); // 15.6 × 0.9144 = 14.26
    expect(formatThread(100, 'cm')).toBe('91.4 m');
  });

  it('writes areas in square inches or square centimetres', () => {
    expect(formatArea(144, 'in', 'in')).toBe('144 sq in');
    expect(formatArea(144, 'in', 'cm')).toBe('929 cm²'); // 144 × 6.4516 = 929.03
  });

  it('reads what a quilter types into an inch field', () => {
    expect(parseInchInput('1/16')).toBe(0.0625);
    expect(parseInchInput('0.0625')).toBe(0.0625);
    expect(parseInchInput('1 1/2')).toBe(1.5);
    expect(parseInchInput('2-1/4 in')).toBe(2.25);
    expect(parseInchInput('3')).toBe(3);
    expect(parseInchInput('1/0')).toBeUndefined();
    expect(parseInchInput('a quarter')).toBeUndefined();
    fc.assert(fc.property(fc.integer({ min: 0, max: 200 }), fc.integer({ min: 0, max: 15 }), (whole, sixteenths) => {
      const v = whole + sixteenths / 16;
      return parseInchInput(inchFraction(v)) === v;
    }));
  });
});

describe('length fields (issue 14: a quilter types 1/16 or 0.0625)', () => {
  it('reads ruler fractions and decimals in inches, decimals with a point or comma in centimetres', () => {
    expect(parseLengthInput('1/16', 'in')).toBe(0.0625);
    expect(parseLengthInput('0.0625', 'in')).toBe(0.0625);
    expect(parseLengthInput('2 1/4 in', 'in')).toBe(2.25);
    expect(parseLengthInput('1,5', 'cm')).toBe(1.5);
    expect(parseLengthInput('0.3 cm', 'cm')).toBe(0.3);
    expect(parseLengthInput('1/2', 'cm')).toBeUndefined();
    expect(parseLengthInput('abc', 'in')).toBeUndefined();
  });

  it('shows inches on a 1/16 mark as the fraction a ruler prints, anything else as a decimal', () => {
    expect(lengthInputText(0.0625, 'in')).toBe('1/16');
    expect(lengthInputText(2.25, 'in')).toBe('2 1/4');
    expect(lengthInputText(3, 'in')).toBe('3');
    expect(lengthInputText(0.3, 'in')).toBe('0.3');
    expect(lengthInputText(0.32, 'cm')).toBe('0.32');
  });

  it('reads back what it shows (property over every 1/16 in mark up to 40 in)', () => {
    for (let k = 1; k <= 640; k++) expect(parseLengthInput(lengthInputText(k / 16, 'in'), 'in')).toBe(k / 16);
  });
});
