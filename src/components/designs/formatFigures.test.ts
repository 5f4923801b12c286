import { describe, expect, it } from 'vitest';
import { formatEdited, formatMinutes } from './formatFigures.ts';

describe('figure formatting', () => {
  it('says how long ago in plain words', () => {
    const now = 1_800_000_000_000;
    expect(formatEdited(now - 10_000, now)).toBe('just now');
    expect(formatEdited(now - 5 * 60_000, now)).toBe('5 min ago');
    expect(formatEdited(now - 26 * 3_600_000, now)).toBe('yesterday');
    expect(formatMinutes(0.5)).toBe('under 1 min');
    expect(formatMinutes(12.4)).toBe('12 min');
  });
});
