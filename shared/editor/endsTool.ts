import { assertNever } from '../assertNever.ts';
import type { Point } from '../geometry/point.ts';
import type { ToolEvent, ToolStep } from './tool.types.ts';

/** Which end of the route the next click sets: where the needle starts, or where it finishes. */
export type EndsStep = 'start' | 'end';

/** State of the start-and-end tool: the step it is on and where the pointer is (for the label beside it). */
export interface EndsToolState {
  readonly next: EndsStep;
  readonly hover: Point | null;
}

export function createEndsTool(): EndsToolState {
  return { next: 'start', hover: null };
}

/**
 * The start-and-end tool in two steps: the first click sets where the needle starts, the second where it
 * finishes, then it is back at the first step. Each click is one command (one undo step). Escape on the
 * second step goes back to the first without changing anything; the start already set stays.
 */
export function stepEndsTool(state: EndsToolState, event: ToolEvent): ToolStep<EndsToolState> {
  switch (event.kind) {
    case 'pointerDown':
      return state.next === 'start'
        ? { state: { next: 'end', hover: event.point }, command: { kind: 'setStart', point: event.point } }
        : { state: { next: 'start', hover: event.point }, command: { kind: 'setEnd', point: event.point } };
    case 'pointerMove':
      return { state: { ...state, hover: event.point } };
    case 'key':
      return event.key === 'Escape' && state.next === 'end' ? { state: { ...state, next: 'start' } } : { state };
    case 'pointerUp':
    case 'doubleClick':
      return { state };
    default:
      return assertNever(event);
  }
}

/** Picks the step by hand (the side column's choice), e.g. to move only the finish. */
export function chooseEndsStep(state: EndsToolState, next: EndsStep): EndsToolState {
  return { ...state, next };
}
