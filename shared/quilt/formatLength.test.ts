import { describe, expect, it } from 'vitest';
import { formatLength, formatQuiltLength, formatQuiltSize } from './formatLength.ts';

describe('quilt lengths in the viewer’s units', () => {
  it('inches to the nearest 1/8 in, reduced', () => {
    expect(formatLength(42.375, 'in')).toBe('42 3/8 in');
    expect(formatLength(0.625, 'in')).toBe('5/8 in');
    // 57 1/16 is half-way between eighths; Math.round takes it up to 57 1/8.
    expect(formatLength(57.0625, 'in')).toBe('57 1/8 in');
    expect(formatLength(12.5, 'in')).toBe('12 1/2 in');
  });

  it('converts with 1 in = 2.54 cm exactly (the international inch, 1959 agreement)', () => {
    expect(formatQuiltLength(44, 'in', 'cm')).toBe('111.8 cm');
    expect(formatQuiltLength(30.48, 'cm', 'in')).toBe('12 in');
    // 100 cm = 39.370… in → 39 3/8 in.
    expect(formatQuiltLength(100, 'cm', 'in')).toBe('39 3/8 in');
    expect(formatQuiltSize(44, 57.0625, 'in', 'in')).toBe('44 × 57 1/8 in');
    expect(formatQuiltSize(44, 57, 'in', 'cm')).toBe('111.8 × 144.8 cm');
  });
});
