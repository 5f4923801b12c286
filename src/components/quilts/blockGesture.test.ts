import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { DRAG_THRESHOLD_PX, IDLE, stepBlockGesture, type BlockGesture, type BlockGestureEvent, type CarriedBlock } from './blockGesture.ts';

const design: CarriedBlock = { kind: 'design', designId: 'nine-patch' };
const at = (x: number, y: number) => ({ x, y });
function run(events: readonly BlockGestureEvent[], start: BlockGesture = IDLE) {
  let gesture = start;
  const drops = [];
  const selects = [];
  for (const e of events) {
    const step = stepBlockGesture(gesture, e);
    gesture = step.gesture;
    if (step.drop) drops.push(step.drop);
    if (step.select) selects.push(step.select);
  }
  return { gesture, drops, selects };
}

describe('block gesture: pointer drag', () => {
  it('a tray design dragged onto a cell is placed there and that cell is picked', () => {
    const r = run([
      { kind: 'pointer-down', carried: design, at: at(10, 10) },
      { kind: 'pointer-move', at: at(40, 60), over: null },
      { kind: 'pointer-move', at: at(300, 200), over: { row: 1, column: 0 } },
      { kind: 'pointer-up', over: { row: 1, column: 0 } },
    ]);
    expect(r.drops).toEqual([{ kind: 'place', cell: { row: 1, column: 0 }, designId: 'nine-patch' }]);
    expect(r.selects).toEqual([{ row: 1, column: 0 }]);
    expect(r.gesture).toEqual(IDLE);
  });

  it('a block dragged onto another cell moves there; onto its own cell or off the map nothing changes', () => {
    const block: CarriedBlock = { kind: 'cell', cell: { row: 0, column: 0 } };
    const drag = (over: { row: number; column: number } | null) =>
      run([{ kind: 'pointer-down', carried: block, at: at(0, 0) }, { kind: 'pointer-move', at: at(50, 0), over }, { kind: 'pointer-up', over }]).drops;
    expect(drag({ row: 0, column: 1 })).toEqual([{ kind: 'move', from: { row: 0, column: 0 }, to: { row: 0, column: 1 } }]);
    expect(drag({ row: 0, column: 0 })).toEqual([]);
    expect(drag(null)).toEqual([]);
  });

  it(`a press that moves less than ${DRAG_THRESHOLD_PX} px is left to the click; Escape mid-drag drops nothing`, () => {
    const press = run([{ kind: 'pointer-down', carried: design, at: at(10, 10) }, { kind: 'pointer-move', at: at(12, 13), over: { row: 0, column: 0 } }]);
    expect(press.gesture.kind).toBe('pressing');
    expect(run([{ kind: 'pointer-up', over: { row: 0, column: 0 } }], press.gesture).drops).toEqual([]);
    const cancelled = run([
      { kind: 'pointer-down', carried: design, at: at(10, 10) },
      { kind: 'pointer-move', at: at(100, 100), over: { row: 0, column: 0 } },
      { kind: 'cancel' },
      { kind: 'pointer-up', over: { row: 0, column: 0 } },
    ]);
    expect(cancelled.drops).toEqual([]);
    expect(cancelled.gesture).toEqual(IDLE);
  });
});

describe('block gesture: pick, then pick a cell (keyboard and tap)', () => {
  it('places the held design in the picked cell, once', () => {
    const r = run([{ kind: 'pick', carried: design }, { kind: 'cell', cell: { row: 2, column: 1 } }, { kind: 'cell', cell: { row: 0, column: 0 } }]);
    expect(r.drops).toEqual([{ kind: 'place', cell: { row: 2, column: 1 }, designId: 'nine-patch' }]);
    expect(r.selects).toEqual([{ row: 2, column: 1 }, { row: 0, column: 0 }]);
  });

  it('picking the same design again or Escape puts it back; another design replaces it; a press while holding starts no drag', () => {
    expect(run([{ kind: 'pick', carried: design }, { kind: 'pick', carried: design }]).gesture).toEqual(IDLE);
    expect(run([{ kind: 'pick', carried: design }, { kind: 'cancel' }]).gesture).toEqual(IDLE);
    const other: CarriedBlock = { kind: 'design', designId: 'log-cabin' };
    expect(run([{ kind: 'pick', carried: design }, { kind: 'pick', carried: other }]).gesture).toEqual({ kind: 'holding', carried: other });
    const r = run([{ kind: 'pick', carried: design }, { kind: 'pointer-down', carried: { kind: 'cell', cell: { row: 0, column: 1 } }, at: at(0, 0) }, { kind: 'pointer-up', over: { row: 0, column: 1 } }, { kind: 'cell', cell: { row: 0, column: 1 } }]);
    expect(r.drops).toEqual([{ kind: 'place', cell: { row: 0, column: 1 }, designId: 'nine-patch' }]);
  });

  it('with nothing held a cell is only picked', () => {
    expect(run([{ kind: 'cell', cell: { row: 1, column: 1 } }])).toEqual({ gesture: IDLE, drops: [], selects: [{ row: 1, column: 1 }] });
  });

  it('every event sequence ends each gesture in at most one drop, and any drop lands where the gesture ended', () => {
    const cell = fc.record({ row: fc.integer({ min: 0, max: 2 }), column: fc.integer({ min: 0, max: 2 }) });
    const carried = fc.oneof(fc.constant(design), cell.map((c): CarriedBlock => ({ kind: 'cell', cell: c })));
    const event: fc.Arbitrary<BlockGestureEvent> = fc.oneof(
      carried.map((c) => ({ kind: 'pick' as const, carried: c })),
      fc.record({ carried, at: fc.record({ x: fc.integer({ min: 0, max: 50 }), y: fc.integer({ min: 0, max: 50 }) }) }).map((e) => ({ kind: 'pointer-down' as const, ...e })),
      fc.record({ at: fc.record({ x: fc.integer({ min: 0, max: 50 }), y: fc.integer({ min: 0, max: 50 }) }), over: fc.option(cell, { nil: null }) }).map((e) => ({ kind: 'pointer-move' as const, ...e })),
      fc.option(cell, { nil: null }).map((over) => ({ kind: 'pointer-up' as const, over })),
      cell.map((c) => ({ kind: 'cell' as const, cell: c })),
      fc.constant({ kind: 'cancel' as const }),
    );
    fc.assert(
      fc.property(fc.array(event, { maxLength: 30 }), (events) => {
        let g: BlockGesture = IDLE;
        for (const e of events) {
          const step = stepBlockGesture(g, e);
          if (step.drop) {
            // A drop ends the gesture and names the cell the event pointed at.
            expect(step.gesture).toEqual(IDLE);
            const target = step.drop.kind === 'place' ? step.drop.cell : step.drop.to;
            expect(target).toEqual(e.kind === 'cell' ? e.cell : e.kind === 'pointer-up' ? e.over : null);
          }
          g = step.gesture;
        }
      }),
    );
  });
});
