import { assertNever } from '../assertNever.ts';
import type { ThreadEnd } from '../route/threadEnds.ts';
import type { StrokeDirection } from '../route/strokeDirection.ts';
import type { LineShape } from './lineShape.ts';
import type { StepHint } from './walkthrough.types.ts';

// Every hint below is a habit of the quilting trade, passed on in classes and guild talks:
// common practice, no source.

/**
 * Straight lines are easiest to keep true when they run toward the quilter (the machine feeds the quilt away,
 * so the line grows toward you): a line running left or right is a quarter turn away from that, a line running
 * away from you a half turn (common practice, no source). Curves are best sewn without turning the block.
 */
export function stitchHints(shape: LineShape, direction: StrokeDirection): StepHint[] {
  if (shape.kind === 'curves') {
    return [{ kind: 'keep-block-still', text: 'Curves flow best without turning the block: keep it where it is and guide the quilt smoothly around the curve.' }];
  }
  if (shape.kind !== 'straight') return [];
  switch (direction) {
    case 'left':
    case 'right':
      return [{ kind: 'turn-block', text: `Straight lines are easier to sew true when they run toward you: give the block a quarter turn so its ${direction} edge is nearest you, and this line runs toward you.` }];
    case 'away':
      return [{ kind: 'turn-block', text: 'Straight lines are easier to sew true when they run toward you: give the block a half turn so its top edge is nearest you, and this line runs toward you.' }];
    case 'toward':
    case 'curved':
      return [];
    default:
      return assertNever(direction);
  }
}

/** A pass that starts or ends at the block's edge hides its knot and tails under the binding (common practice, no source). */
export function passEndHints(end: 'start' | 'tie-off', atEdge: boolean): StepHint[] {
  if (atEdge) {
    return [{ kind: 'stop-at-edge', text: end === 'start' ? 'Starting at the edge hides the start under the binding.' : 'This stop is at the edge: the binding will hide the knot and the tails.' }];
  }
  return [{
    kind: 'hide-tails',
    text: end === 'start'
      ? 'This pass starts inside the block: leave long tails, and later pull them to the back, tie them and bury them between the layers.'
      : 'This stop is inside the block: pull the top thread to the back, tie the tails and bury them between the layers.',
  }];
}

/** Where a pass touches the edge partway, that is the place to stop if the bobbin runs low: the restart hides under the binding (common practice, no source). */
export const RESTART_AT_EDGE_HINT: StepHint = {
  kind: 'stop-at-edge',
  text: 'If you need to stop (bobbin running low, a break), stop here at the edge: the restart will hide under the binding.',
};

/** Why the planner put a pass's start or tie-off where it is (route/threadEnds.ts); null when there is nothing to add. */
export function threadEndHint(note: Pick<ThreadEnd, 'end' | 'place' | 'reason'>): StepHint | null {
  const what = note.end === 'start' ? 'start' : 'stop';
  switch (note.reason) {
    case 'fixed':
      return { kind: 'why-here', text: `This ${what} is where you set the route to ${note.end === 'start' ? 'begin' : 'end'}.` };
    case 'hidden':
      return note.place === 'seam'
        ? { kind: 'why-here', text: `The planner put this ${what} on a seam: the small knot sinks into the ditch there.` }
        : null; // at the edge, passEndHints already says the binding hides it
    case 'no-hidden-place':
      return { kind: 'why-here', text: `No route with as little travel has this ${what} on a seam or at the edge, so it is inside the patch.` };
    default:
      return assertNever(note.reason);
  }
}
