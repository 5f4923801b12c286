import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import type { Point } from '../geometry/point.ts';
import { applyCommand, type DesignCommand, type LineTarget } from './commands.ts';
import type { Design } from './design.schema.ts';
import { canRedo, canUndo, createHistory, pushCommand, redo, undo } from './history.ts';

const start: Design = {
  version: 1, units: 'in', width: 12, height: 12,
  seams: [[[0, 4], [12, 4]], [[4, 0], [4, 12]]],
  lines: [[[1, 1], [3, 3], [5, 1]], [[6, 6], [10, 6]]],
  edgeTravel: true,
};

/** Raw random numbers that `toCommand` turns into a command valid for the current design. */
const choice = fc.record({
  op: fc.integer({ min: 0, max: 15 }),
  a: fc.nat(),
  b: fc.nat(),
  flag: fc.boolean(),
  x: fc.double({ min: -1, max: 13, noNaN: true }),
  y: fc.double({ min: -1, max: 13, noNaN: true }),
});
type Choice = typeof choice extends fc.Arbitrary<infer T> ? T : never;

function toCommand(design: Design, c: Choice): DesignCommand | null {
  const target: LineTarget = c.flag && design.seams.length > 0 ? 'seams' : 'lines';
  const list = design[target];
  const n = list.length;
  const p: Point = [c.x, c.y];
  const q: Point = [c.y, c.x + 0.5];
  switch (c.op) {
    case 0: return { kind: 'addLines', target, lines: [[p, q]] };
    case 1: return { kind: 'addLines', target: 'lines', lines: [[p, q], [q, [c.x + 1, c.y]]] };
    case 2: return n > 0 ? { kind: 'deleteLines', target, indices: [...new Set([c.a % n, c.b % n])] } : null;
    case 3: return n > 0 ? { kind: 'moveLines', target, indices: [c.a % n], dx: c.x / 7, dy: c.y / 3 } : null;
    case 4: return n > 0 ? { kind: 'replaceLines', target, entries: [{ index: c.a % n, line: [p, q, [1, 2]] }] } : null;
    case 5: {
      if (n === 0) return null;
      const index = c.a % n;
      const line = list[index]!;
      const segment = c.b % (line.length - 1);
      const [s0, s1] = [line[segment]!, line[segment + 1]!];
      const mid: Point = [(s0[0] + s1[0]) / 2, (s0[1] + s1[1]) / 2];
      return mid[0] === s0[0] && mid[1] === s0[1] ? null : { kind: 'splitLine', target, index, segment, point: mid };
    }
    case 6: return n > 1 && c.a % n !== c.b % n
      ? { kind: 'joinLines', target, first: c.a % n, second: c.b % n, reverseFirst: c.flag, reverseSecond: c.x > 6 } : null;
    case 7: return { kind: 'setStart', point: c.flag ? p : null };
    case 8: return { kind: 'setEnd', point: c.flag ? null : q };
    case 9: return { kind: 'setSize', width: 6 + (c.a % 12), height: 6 + (c.b % 12) };
    case 10: return { kind: 'convertUnits', units: design.units === 'in' ? 'cm' : 'in' };
    case 11: return { kind: 'setEdgeTravel', value: c.flag };
    case 12: return { kind: 'setThread', thread: c.flag ? { spi: 10 + (c.a % 5) } : null };
    case 13: return { kind: 'setRoute', route: c.flag ? [[p, q]] : null };
    case 14: return { kind: 'setBindingBand', value: c.flag ? 0.25 : null };
    default: return {
      kind: 'batch',
      commands: [{ kind: 'addLines', target: 'lines', lines: [[p, q]] }, { kind: 'moveLines', target: 'lines', indices: [0], dx: 1, dy: 1 }],
    };
  }
}

describe('design/history: random command sequences (fast-check, seeded)', () => {
  it('apply-then-inverse is the identity; undo-all restores the start; redo-all reproduces the end', () => {
    fc.assert(
      fc.property(fc.array(choice, { maxLength: 40 }), (choices) => {
        let design = start;
        let history = createHistory();
        for (const c of choices) {
          const cmd = toCommand(design, c);
          if (!cmd) continue;
          const applied = applyCommand(design, cmd);
          expect(applyCommand(applied.design, applied.inverse).design).toStrictEqual(design);
          ({ history, design } = pushCommand(history, design, cmd));
          expect(design).toStrictEqual(applied.design);
        }
        const end = design;
        const steps = history.undoStack.length;
        while (canUndo(history)) ({ history, design } = undo(history, design));
        expect(design).toStrictEqual(start);
        expect(history.redoStack.length).toBe(steps);
        while (canRedo(history)) ({ history, design } = redo(history, design));
        expect(design).toStrictEqual(end);
      }),
      { seed: 42, numRuns: 300 },
    );
  });

  it('a new command clears redo; undo with nothing to undo changes nothing', () => {
    let { history, design } = pushCommand(createHistory(), start, { kind: 'setEdgeTravel', value: false });
    ({ history, design } = undo(history, design));
    expect(canRedo(history)).toBe(true);
    ({ history, design } = pushCommand(history, design, { kind: 'setStart', point: [1, 1] }));
    expect(canRedo(history)).toBe(false);
    const empty = createHistory();
    expect(undo(empty, start)).toEqual({ history: empty, design: start });
  });

  it('keeps at most `limit` undo steps', () => {
    let step = { history: createHistory(3), design: start };
    for (let i = 0; i < 5; i++) step = pushCommand(step.history, step.design, { kind: 'setSize', width: 6 + i, height: 6 });
    expect(step.history.undoStack.length).toBe(3);
  });
});
