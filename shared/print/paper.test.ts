import { describe, expect, it } from 'vitest';
import { paperFor, pointsPerUnit, printableBox } from './paper.ts';

describe('paper', () => {
  it('is US Letter for inches and A4 for centimetres, in PDF points', () => {
    // ANSI/ASME Y14.1: Letter is 8.5 × 11 in = 612 × 792 pt. ISO 216: A4 is 210 × 297 mm = 595.28 × 841.89 pt
    // (the figures pdfkit and PostScript use for "A4").
    expect(paperFor('in')).toMatchObject({ name: 'letter', width: 612, height: 792 });
    expect(paperFor('cm').width).toBeCloseTo(595.28, 2);
    expect(paperFor('cm').height).toBeCloseTo(841.89, 2);
  });
  it('measures 72 points to the inch and 28.35 to the centimetre (ISO 32000-1 §8.3.2.3)', () => {
    expect(pointsPerUnit('in')).toBe(72);
    expect(pointsPerUnit('cm')).toBeCloseTo(28.3465, 4);
  });
  it('keeps the margin clear on every side', () => {
    expect(printableBox(paperFor('in'))).toEqual({ x: 36, y: 36, width: 540, height: 720 });
  });
});
