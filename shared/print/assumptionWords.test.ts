import { describe, expect, it } from 'vitest';
import { computeThreadBudget } from '../route/threadBudget.ts';
import { describeAssumption, sourceKind } from './assumptionWords.ts';

describe('describeAssumption', () => {
  const budget = computeThreadBudget(100, 1, 'in', { spi: 12 });
  it('gives an inch viewer the whole source, as the screens do', () => {
    const lines = budget.assumptions.map((a) => describeAssumption(a, 'in'));
    expect(lines).toContain('Stitches per inch: 12 (set in this design)');
    expect(lines.some((l) => l.includes('from memory: about 4 in per thread'))).toBe(true);
  });
  it('gives a centimetre viewer metric values and no inch figure', () => {
    const lines = budget.assumptions.map((a) => describeAssumption(a, 'cm'));
    // 12 per inch = 12 / 2.54 = 4.7 per cm; 4 in = 101.6 mm; 80 yd × 0.9144 = 73 m (exact conversions, 1959).
    expect(lines).toContain('Stitches per centimetre: 4.7 (set in this design)');
    expect(lines).toContain('Tail left at each tie-off, per thread: 101.6 mm (from memory)');
    expect(lines).toContain('One bobbin holds: 73 m (from memory)');
    for (const l of lines) expect(l).not.toMatch(/\d\s*(in|yd)\b|inch/);
  });
  it('keeps a source without a note whole', () => {
    expect(sourceKind('common practice, no source')).toBe('common practice, no source');
  });
});
