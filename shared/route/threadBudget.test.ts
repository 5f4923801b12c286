import { describe, expect, it } from 'vitest';
import { computeThreadBudget } from './threadBudget.ts';

describe('computeThreadBudget', () => {
  it('counts stitches at the SPI and sewing time at the speed', () => {
    const b = computeThreadBudget(100, 1, 'in', { spi: 12, stitchesPerMinute: 600, tieOffTail: 0 });
    expect(b.stitchCount).toBe(1200);
    expect(b.sewingMinutes).toBe(2);
  });

  it('gives the 2.5× thread-to-seam ratio quoted for stitch class 301 on thin fabric (from memory) at t = 0.025 in, 10 SPI', () => {
    // Industrial consumption tables list about 2.5 for 301 lockstitch (thread makers' guides; from memory, not checked).
    const b = computeThreadBudget(360, 1, 'in', { spi: 10, sandwichThickness: 0.025, tieOffTail: 0 });
    expect((b.topThreadYards + b.bobbinThreadYards) * 36 / 360).toBeCloseTo(2.5, 12);
  });

  it('adds a tie-off tail at both ends of every pass, per thread', () => {
    const one = computeThreadBudget(36, 1, 'in', { tieOffTail: 4 });
    const three = computeThreadBudget(36, 3, 'in', { tieOffTail: 4 });
    expect((three.topThreadYards - one.topThreadYards) * 36).toBeCloseTo(2 * 2 * 4, 12);
  });

  it('is the same for the same design in centimetres (×2.54)', () => {
    const a = computeThreadBudget(50, 2, 'in');
    const b = computeThreadBudget(50 * 2.54, 2, 'cm');
    expect(b.topThreadYards).toBeCloseTo(a.topThreadYards, 9);
    expect(b.stitchCount).toBe(a.stitchCount);
  });

  it('rounds bobbins up at the capacity and labels defaults as from memory', () => {
    const b = computeThreadBudget(3000, 1, 'in', { bobbinCapacity: 50 });
    expect(b.bobbins).toBe(Math.ceil(b.bobbinThreadYards / 50));
    const defaults = computeThreadBudget(10, 1, 'in');
    for (const a of defaults.assumptions.filter((x) => x.setting !== 'model')) expect(a.source).toMatch(/^from memory/);
    expect(b.assumptions.find((a) => a.setting === 'bobbinCapacity')!.source).toBe('design');
  });
});
