import { describe, expect, it } from 'vitest';
import { findSafetyCautions } from './safetyCautions.ts';

describe('findSafetyCautions', () => {
  it('always warns about the needle and defers to the machine manual', () => {
    const [needle, ...rest] = findSafetyCautions([]);
    expect(needle?.kind).toBe('needle');
    expect(needle?.text).toMatch(/manual/);
    expect(rest).toEqual([]);
  });

  it('adds the rotary cutter and the iron only when the lesson mentions trimming or pressing', () => {
    expect(findSafetyCautions(['Trim the block to 12 1/2 in.']).map((c) => c.kind)).toEqual(['needle', 'rotary-cutter']);
    expect(findSafetyCautions(['Press the seams open first.']).map((c) => c.kind)).toEqual(['needle', 'iron']);
    expect(findSafetyCautions(['Stitch the ribbon candy.', 'Expressive lines']).map((c) => c.kind)).toEqual(['needle']);
  });
});
