import { describe, expect, it } from 'vitest';
import { formatEdited, formatInches, formatLength, formatMinutes, formatSize, formatYards } from './formatFigures.ts';

describe('figure formatting', () => {
  it('writes inches in eighths as rulers mark them', () => {
    expect(formatInches(12)).toBe('12');
    expect(formatInches(12.5)).toBe('12 1/2');
    expect(formatInches(0.375)).toBe('3/8');
    expect(formatInches(6.25)).toBe('6 1/4');
    expect(formatInches(3.3)).toBe('3.3');
    expect(formatLength(0.125, 'in')).toBe('1/8 in');
    expect(formatLength(30.48, 'cm')).toBe('30.5 cm');
    expect(formatSize(12, 12, 'in')).toBe('12 × 12 in');
  });

  it('rounds thread to a tenth of a yard', () => {
    expect(formatYards(1)).toBe('1 yd');
    expect(formatYards(2.54)).toBe('2.5 yd');
  });

  it('says how long ago in plain words', () => {
    const now = 1_800_000_000_000;
    expect(formatEdited(now - 10_000, now)).toBe('just now');
    expect(formatEdited(now - 5 * 60_000, now)).toBe('5 min ago');
    expect(formatEdited(now - 26 * 3_600_000, now)).toBe('yesterday');
    expect(formatMinutes(0.5)).toBe('under 1 min');
    expect(formatMinutes(12.4)).toBe('12 min');
  });
});
