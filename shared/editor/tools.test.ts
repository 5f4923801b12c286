import { describe, expect, it } from 'vitest';
import type { Design } from '../design/design.schema.ts';
import { catmullRomCurve } from './smooth.ts';
import { createDrawTool, isDrawing, stepDrawTool, type DrawToolState } from './drawTools.ts';
import { chooseEndsStep, createEndsTool, stepEndsTool } from './endsTool.ts';
import { createSelectTool, stepSelectTool } from './selectTool.ts';
import type { ToolEvent, ToolStep } from './tool.types.ts';

const design: Design = {
  version: 1, units: 'in', width: 12, height: 12, seams: [], edgeTravel: true,
  lines: [[[1, 1], [5, 1]], [[1, 6], [6, 6]]],
};

function run(state: DrawToolState, events: ToolEvent[]): ToolStep<DrawToolState>[] {
  const steps: ToolStep<DrawToolState>[] = [];
  for (const e of events) {
    const step = stepDrawTool(state, e);
    steps.push(step);
    state = step.state;
  }
  return steps;
}

describe('editor/drawTools', () => {
  const ruler = { kind: 'ruler', clickSlop: 0.1 } as const;

  it('ruler: click, move (preview), click commits one straight line', () => {
    const steps = run(createDrawTool('lines', ruler), [
      { kind: 'pointerDown', point: [0, 0] },
      { kind: 'pointerUp', point: [0.05, 0] },
      { kind: 'pointerMove', point: [2, 1] },
      { kind: 'pointerDown', point: [3, 3] },
      { kind: 'pointerUp', point: [3, 3] },
    ]);
    expect(steps[1]!.command).toBeUndefined();
    expect(isDrawing(steps[1]!.state)).toBe(true);
    expect(steps[2]!.preview).toEqual([[[0, 0], [2, 1]]]);
    expect(steps[3]!.command).toEqual({ kind: 'addLines', target: 'lines', lines: [[[0, 0], [3, 3]]] });
    expect(steps[3]!.state.points).toEqual([]);
    expect(steps[4]!.command).toBeUndefined();
  });

  it('ruler: press, drag (preview follows), release commits the line in one gesture', () => {
    const steps = run(createDrawTool('lines', ruler), [
      { kind: 'pointerDown', point: [1, 1] },
      { kind: 'pointerMove', point: [2, 2] },
      { kind: 'pointerMove', point: [4, 1] },
      { kind: 'pointerUp', point: [5, 1] },
    ]);
    expect(steps[1]!.preview).toEqual([[[1, 1], [2, 2]]]);
    expect(steps[2]!.preview).toEqual([[[1, 1], [4, 1]]]);
    expect(steps.slice(0, 3).some((s) => s.command)).toBe(false);
    expect(steps[3]!.command).toEqual({ kind: 'addLines', target: 'lines', lines: [[[1, 1], [5, 1]]] });
    expect(isDrawing(steps[3]!.state)).toBe(false);
  });

  it('ruler: Escape drops the line after the first click and in the middle of a drag', () => {
    for (const events of [
      [{ kind: 'pointerDown', point: [0, 0] }, { kind: 'pointerUp', point: [0, 0] }, { kind: 'key', key: 'Escape' }, { kind: 'pointerDown', point: [3, 3] }],
      [{ kind: 'pointerDown', point: [0, 0] }, { kind: 'pointerMove', point: [2, 2] }, { kind: 'key', key: 'Escape' }, { kind: 'pointerUp', point: [3, 3] }],
    ] satisfies ToolEvent[][]) {
      const steps = run(createDrawTool('lines', ruler), events);
      expect(steps[2]!.preview ?? []).toEqual([]);
      expect(steps.some((s) => s.command)).toBe(false);
    }
  });

  it('polyline: clicks then double-click; Escape drops the gesture', () => {
    const steps = run(createDrawTool('seams', { kind: 'polyline', clickSlop: 0.1 }), [
      { kind: 'pointerDown', point: [0, 0] },
      { kind: 'pointerDown', point: [1, 0] },
      { kind: 'pointerDown', point: [1, 1] },
      { kind: 'pointerDown', point: [1, 1] },
      { kind: 'doubleClick', point: [1, 1] },
    ]);
    expect(steps[4]!.command).toEqual({ kind: 'addLines', target: 'seams', lines: [[[0, 0], [1, 0], [1, 1]]] });
    const cancelled = run(createDrawTool('lines', { kind: 'polyline', clickSlop: 0.1 }), [
      { kind: 'pointerDown', point: [0, 0] },
      { kind: 'key', key: 'Escape' },
      { kind: 'key', key: 'Enter' },
    ]);
    expect(cancelled.some((s) => s.command)).toBe(false);
  });

  it('corner line: the preview runs from the last corner to the pointer', () => {
    const steps = run(createDrawTool('lines', { kind: 'polyline', clickSlop: 0.1 }), [
      { kind: 'pointerDown', point: [0, 0] },
      { kind: 'pointerMove', point: [1, 0] },
      { kind: 'pointerDown', point: [1, 0] },
      { kind: 'pointerMove', point: [1, 2] },
    ]);
    expect(steps[1]!.preview).toEqual([[[0, 0], [1, 0]]]);
    expect(steps[3]!.preview).toEqual([[[0, 0], [1, 0], [1, 2]]]);
  });

  it('curve: while points are placed the preview is the curve through them and the pointer', () => {
    const steps = run(createDrawTool('lines', { kind: 'curve', samplesPerSpan: 8, clickSlop: 0.1 }), [
      { kind: 'pointerDown', point: [0, 0] },
      { kind: 'pointerMove', point: [2, 2] },
      { kind: 'pointerDown', point: [2, 2] },
      { kind: 'pointerMove', point: [4, 0] },
    ]);
    expect(steps[1]!.preview).toEqual([[[0, 0], [2, 2]]]);
    // Same curve the Enter key would commit with the pointer as the last point (smooth.ts).
    expect(steps[3]!.preview).toEqual([catmullRomCurve([[0, 0], [2, 2], [4, 0]], 8)]);
    expect(steps[3]!.preview![0]!.length).toBe(17);
    const escaped = stepDrawTool(steps[3]!.state, { kind: 'key', key: 'Escape' });
    expect(escaped.preview ?? []).toEqual([]);
    expect(isDrawing(escaped.state)).toBe(false);
  });

  it('a double-click finishes only on the last point placed; two quick clicks apart place two points', () => {
    const steps = run(createDrawTool('lines', { kind: 'curve', samplesPerSpan: 8, clickSlop: 0.1 }), [
      { kind: 'pointerDown', point: [0, 0] },
      { kind: 'pointerDown', point: [2, 2] },
      { kind: 'pointerDown', point: [2, 2.05] },
      { kind: 'doubleClick', point: [2, 2.05] },
    ]);
    expect(steps[3]!.command).toEqual({ kind: 'addLines', target: 'lines', lines: [[[0, 0], [2, 2]]] });
    const apart = run(createDrawTool('lines', { kind: 'polyline', clickSlop: 0.1 }), [
      { kind: 'pointerDown', point: [0, 0] },
      { kind: 'pointerDown', point: [2, 2] },
      { kind: 'doubleClick', point: [0, 0] },
    ]);
    expect(apart[2]!.command).toBeUndefined();
    expect(apart[2]!.state.points).toEqual([[0, 0], [2, 2]]);
  });

  it('curve: Enter commits a Catmull–Rom line through the clicked points', () => {
    const steps = run(createDrawTool('lines', { kind: 'curve', samplesPerSpan: 8, clickSlop: 0.1 }), [
      { kind: 'pointerDown', point: [0, 0] },
      { kind: 'pointerDown', point: [2, 2] },
      { kind: 'pointerDown', point: [4, 0] },
      { kind: 'key', key: 'Enter' },
    ]);
    const cmd = steps[3]!.command;
    if (cmd?.kind !== 'addLines') throw new Error('no line committed');
    expect(cmd.lines[0]!.length).toBe(17);
    expect(cmd.lines[0]).toContainEqual([2, 2]);
  });

  it('freehand: drag then release commits one simplified line; a click without a drag commits nothing', () => {
    const drag: ToolEvent[] = [{ kind: 'pointerDown', point: [0, 0] }];
    for (let i = 1; i <= 50; i++) drag.push({ kind: 'pointerMove', point: [i * 0.1, (i % 2) * 0.001] });
    drag.push({ kind: 'pointerUp', point: [5, 0] });
    const steps = run(createDrawTool('lines', { kind: 'freehand', tolerance: 0.01, smoothingPasses: 2 }), drag);
    const cmd = steps[steps.length - 1]!.command;
    if (cmd?.kind !== 'addLines') throw new Error('no line committed');
    expect(cmd.lines[0]).toEqual([[0, 0], [5, 0]]);
    const click = run(createDrawTool('lines', { kind: 'freehand', tolerance: 0.01, smoothingPasses: 2 }), [
      { kind: 'pointerDown', point: [1, 1] },
      { kind: 'pointerUp', point: [1, 1] },
    ]);
    expect(click[1]!.command).toBeUndefined();
  });
});

describe('editor/endsTool', () => {
  it('sets the start, then the finish, in two clicks, then starts over', () => {
    let s = createEndsTool();
    expect(s.next).toBe('start');
    let step = stepEndsTool(s, { kind: 'pointerDown', point: [1, 1] });
    expect(step.command).toEqual({ kind: 'setStart', point: [1, 1] });
    s = stepEndsTool(step.state, { kind: 'pointerUp', point: [1, 1] }).state;
    expect(s.next).toBe('end');
    step = stepEndsTool(s, { kind: 'pointerDown', point: [11, 11] });
    expect(step.command).toEqual({ kind: 'setEnd', point: [11, 11] });
    expect(step.state.next).toBe('start');
  });

  it('Escape on the second step goes back to the first without a command; the side column can pick the step', () => {
    const first = stepEndsTool(createEndsTool(), { kind: 'pointerDown', point: [1, 1] }).state;
    const back = stepEndsTool(first, { kind: 'key', key: 'Escape' });
    expect(back.command).toBeUndefined();
    expect(back.state.next).toBe('start');
    const finishOnly = stepEndsTool(chooseEndsStep(createEndsTool(), 'end'), { kind: 'pointerDown', point: [6, 6] });
    expect(finishOnly.command).toEqual({ kind: 'setEnd', point: [6, 6] });
  });
});

describe('editor/selectTool', () => {
  const withSeam: Design = { ...design, seams: [[[0, 3], [12, 3]]] };
  const down = (point: readonly [number, number], shift = false): ToolEvent => ({ kind: 'pointerDown', point, shift });

  it('picks by hit test, previews a drag, commits one move', () => {
    let step = stepSelectTool(createSelectTool(), down([3, 6.05]), design, 0.1);
    expect(step.state.selection).toEqual({ target: 'lines', indices: [1] });
    step = stepSelectTool(step.state, { kind: 'pointerMove', point: [3, 7.05] }, design, 0.1);
    expect(step.preview).toEqual([[[1, 7], [6, 7]]]);
    step = stepSelectTool(step.state, { kind: 'pointerUp', point: [3, 7.05] }, design, 0.1);
    expect(step.command).toEqual({ kind: 'moveLines', target: 'lines', indices: [1], dx: 0, dy: 1 });
    expect(step.state.drag).toBeNull();
    expect(stepSelectTool(createSelectTool(), down([9, 9]), design, 0.1).state.selection).toBeNull();
  });

  it('a click without a move commits nothing; Escape cancels the drag, then drops the pick', () => {
    let step = stepSelectTool(createSelectTool(), down([3, 1]), design, 0.1);
    expect(stepSelectTool(step.state, { kind: 'pointerUp', point: [3, 1] }, design, 0.1).command).toBeUndefined();
    step = stepSelectTool(step.state, { kind: 'pointerMove', point: [4, 1] }, design, 0.1);
    step = stepSelectTool(step.state, { kind: 'key', key: 'Escape' }, design, 0.1);
    expect(step.state).toEqual({ selection: { target: 'lines', indices: [0] }, drag: null });
    expect(stepSelectTool(step.state, { kind: 'key', key: 'Escape' }, design, 0.1).state.selection).toBeNull();
  });

  it('shift adds and takes lines of the same list; pressing on a picked line keeps the whole pick for a move', () => {
    let s = stepSelectTool(createSelectTool(), down([3, 1]), design, 0.1).state;
    s = stepSelectTool(s, down([3, 6], true), design, 0.1).state;
    expect(s.selection).toEqual({ target: 'lines', indices: [0, 1] });
    s = stepSelectTool({ ...s, drag: null }, down([3, 1]), design, 0.1).state;
    expect(s.selection?.indices).toEqual([0, 1]);
    s = stepSelectTool({ ...s, drag: null }, down([3, 1], true), design, 0.1).state;
    expect(s.selection?.indices).toEqual([1]);
    expect(stepSelectTool(s, down([9, 9], true), design, 0.1).state.selection?.indices).toEqual([1]);
  });

  it('picks seams too, hit-testing where the pointer is rather than where it snapped', () => {
    const s = stepSelectTool(createSelectTool(), { kind: 'pointerDown', point: [3, 4], raw: [3, 3.05] }, withSeam, 0.1).state;
    expect(s.selection).toEqual({ target: 'seams', indices: [0] });
    expect(s.drag?.from).toEqual([3, 4]);
  });
});
