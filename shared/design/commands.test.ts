import { describe, expect, it } from 'vitest';
import { applyCommand, type DesignCommand } from './commands.ts';
import type { Design } from './design.schema.ts';

const base: Design = {
  version: 1,
  units: 'in',
  width: 12,
  height: 12,
  seams: [[[0, 6], [12, 6]]],
  lines: [[[1, 1], [5, 1]], [[2, 2], [2, 8], [6, 8]], [[9, 9], [11, 11]]],
  edgeTravel: true,
};

/** Applies a command, checks its inverse restores the design exactly, and returns the new design. */
function applyAndCheck(design: Design, cmd: DesignCommand): Design {
  const { design: next, inverse } = applyCommand(design, cmd);
  expect(applyCommand(next, inverse).design).toStrictEqual(design);
  return next;
}

describe('design/commands: worked examples', () => {
  it('adds a motif as many lines at once and removes them on undo', () => {
    const next = applyAndCheck(base, { kind: 'addLines', target: 'lines', lines: [[[0, 0], [1, 1]], [[1, 0], [0, 1]]] });
    expect(next.lines.length).toBe(5);
  });

  it('deletes scattered lines and puts them back in place', () => {
    const next = applyAndCheck(base, { kind: 'deleteLines', target: 'lines', indices: [2, 0] });
    expect(next.lines).toEqual([base.lines[1]]);
  });

  it('moves lines, and undoes the move exactly (no floating-point drift)', () => {
    const next = applyAndCheck(base, { kind: 'moveLines', target: 'lines', indices: [0], dx: 0.1, dy: 0.2 });
    expect(next.lines[0]).toEqual([[1.1, 1.2], [5.1, 1.2]]);
  });

  it('splits a line at a point and joins the parts back', () => {
    const split = applyAndCheck(base, { kind: 'splitLine', target: 'lines', index: 1, segment: 0, point: [2, 5] });
    expect(split.lines[1]).toEqual([[2, 2], [2, 5]]);
    expect(split.lines[2]).toEqual([[2, 5], [2, 8], [6, 8]]);
    const joined = applyAndCheck(split, { kind: 'joinLines', target: 'lines', first: 1, second: 2, reverseFirst: false, reverseSecond: false });
    // The same path as before, keeping the split point as a bend-free vertex.
    expect(joined.lines).toEqual([base.lines[0], [[2, 2], [2, 5], [2, 8], [6, 8]], base.lines[2]]);
  });

  it('joins end to end after reversing, keeping the lower index', () => {
    const joined = applyAndCheck(base, { kind: 'joinLines', target: 'lines', first: 2, second: 0, reverseFirst: true, reverseSecond: false });
    expect(joined.lines[0]).toEqual([[11, 11], [9, 9], [1, 1], [5, 1]]);
    expect(joined.lines.length).toBe(2);
  });

  it('sets and clears start and end points without leaving undefined keys', () => {
    const withStart = applyAndCheck(base, { kind: 'setStart', point: [0, 0] });
    expect(withStart.start).toEqual([0, 0]);
    const cleared = applyAndCheck(withStart, { kind: 'setStart', point: null });
    expect('start' in cleared).toBe(false);
  });

  it('converts a 12 in block to 30.48 cm (1 in = 2.54 cm exactly, 1959 agreement) and back exactly', () => {
    const cm = applyAndCheck({ ...base, bindingBand: 0.125 }, { kind: 'convertUnits', units: 'cm' });
    expect(cm.width).toBeCloseTo(30.48, 12);
    expect(cm.bindingBand).toBeCloseTo(0.3175, 12);
    expect(cm.lines[0]![1]).toEqual([5 * 2.54, 1 * 2.54]);
  });

  it('throws on a bad index (a caller bug)', () => {
    expect(() => applyCommand(base, { kind: 'deleteLines', target: 'lines', indices: [3] })).toThrow(/design\/commands/);
    expect(() => applyCommand(base, { kind: 'splitLine', target: 'lines', index: 0, segment: 0, point: [1, 1] })).toThrow(/design\/commands/);
  });
});
