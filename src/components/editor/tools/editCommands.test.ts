import { describe, expect, it } from 'vitest';
import { applyCommand } from '@shared/design/commands.ts';
import type { Design } from '@shared/design/design.schema.ts';
import { joinShared, splitAtMiddle } from './editCommands.ts';

const base: Design = { version: 1, units: 'in', width: 12, height: 12, seams: [], lines: [], edgeTravel: true };

describe('split and join', () => {
  it('splits an L-shaped line at half its length', () => {
    // Legs 4 and 2: total 6, half 3 lies on the first leg at (3, 0).
    const design = { ...base, lines: [[[0, 0], [4, 0], [4, 2]] as const] };
    const cmd = splitAtMiddle(design, 'lines', 0)!;
    const after = applyCommand(design, cmd).design;
    expect(after.lines).toEqual([[[0, 0], [3, 0]], [[3, 0], [4, 0], [4, 2]]]);
  });

  it('joins lines that meet end to end in whichever direction they were drawn', () => {
    const design = { ...base, lines: [[[4, 0], [0, 0]] as const, [[4, 4], [4, 0]] as const] };
    const cmd = joinShared(design, 'lines', 0, 1)!;
    const joined = applyCommand(design, cmd).design.lines;
    expect(joined).toHaveLength(1);
    const line = joined[0]!;
    const ends = [line[0], line[line.length - 1]];
    expect(ends).toContainEqual([0, 0]);
    expect(ends).toContainEqual([4, 4]);
    expect(line).toHaveLength(3);
  });

  it('refuses to join lines with no shared end', () => {
    const design = { ...base, lines: [[[0, 0], [1, 0]] as const, [[5, 5], [6, 5]] as const] };
    expect(joinShared(design, 'lines', 0, 1)).toBeNull();
  });
});
