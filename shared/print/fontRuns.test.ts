import { describe, expect, it } from 'vitest';
import { parseUnicodeRange, splitFontRuns } from './fontRuns.ts';

// The two subsets' ranges as @fontsource/source-sans-3 5.3.1 ships them in unicode.json (abridged to what matters).
const latin = parseUnicodeRange('U+0000-00FF,U+0131,U+0152-0153,U+2000-206F,U+2212');
const ext = parseUnicodeRange('U+0100-02BA,U+02BD-02C5');

describe('parseUnicodeRange', () => {
  it('reads single code points and spans (CSS Fonts 4 §4.5)', () => {
    expect(latin(0x41)).toBe(true);
    expect(latin(0x141)).toBe(false); // Ł
    expect(ext(0x141)).toBe(true);
    expect(latin(0x2212)).toBe(true);
    expect(() => parseUnicodeRange('U+4??')).toThrow();
  });
});

describe('splitFontRuns', () => {
  it('sets each character in the first face that has it, keeping runs whole', () => {
    expect(splitFontRuns('Łódź quilt', [latin, ext])).toEqual([
      { face: 1, text: 'Ł' },
      { face: 0, text: 'ód' },
      { face: 1, text: 'ź ' },
      { face: 0, text: 'quilt' },
    ]);
  });
  it('writes a stand-in for what no face has', () => {
    expect(splitFontRuns('a → b ≈ c ☃', [latin, ext]).map((r) => r.text).join('')).toBe('a -> b ~ c ?');
  });
});
