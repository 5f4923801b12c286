import type { Step } from '@shared/walkthrough/walkthrough.types.ts';
import type { Playback } from '../route/routePlayback.ts';

/** Where each step lies on the player's distance axis (design units from the route's start). */
export interface StepSpan {
  readonly start: number;
  readonly end: number;
}

/**
 * Each step's span on the playback of the same route: a stitch or travel step runs from its first stroke's start
 * to its last stroke's end; a start step sits where its pass's first stroke begins, a tie-off where the last one
 * ended (zero length). Spans never overlap and follow the step order.
 */
export function buildStepSpans(steps: readonly Step[], playback: Playback): StepSpan[] {
  const strokeEnd = (i: number) => playback.starts[i]! + playback.partials[i]![playback.partials[i]!.length - 1]!;
  return steps.map((step, index) => {
    if (step.strokes.length > 0) return { start: playback.starts[step.strokes[0]!]!, end: strokeEnd(step.strokes[step.strokes.length - 1]!) };
    if (step.kind === 'start') {
      const next = steps.slice(index + 1).find((s) => s.strokes.length > 0);
      const at = next ? playback.starts[next.strokes[0]!]! : playback.total;
      return { start: at, end: at };
    }
    const prev = [...steps.slice(0, index)].reverse().find((s) => s.strokes.length > 0);
    const at = prev ? strokeEnd(prev.strokes[prev.strokes.length - 1]!) : 0;
    return { start: at, end: at };
  });
}

/**
 * The step a scrubbed needle position belongs to: the stitch or travel step whose span holds `distance`
 * (a boundary belongs to the step that begins there); the first step at 0 and the last step at the very end.
 */
export function findStepAt(steps: readonly Step[], spans: readonly StepSpan[], distance: number, total: number): number {
  if (steps.length === 0) return 0;
  if (distance <= 0) return 0;
  if (distance >= total) return steps.length - 1;
  let found = 0;
  spans.forEach((span, i) => {
    if (steps[i]!.strokes.length > 0 && span.start <= distance && distance < span.end) found = i;
  });
  return found;
}
