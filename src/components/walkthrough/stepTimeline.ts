import type { StepSpan } from '@shared/walkthrough/stepPlayback.ts';
import type { Step } from '@shared/walkthrough/walkthrough.types.ts';
import type { Playback } from '../route/routePlayback.ts';

/**
 * Each step's span on the playback of the same route: a stitch or travel step runs from its first stroke's start
 * to its last stroke's end; a start step sits where its pass's first stroke begins, a tie-off where the last one
 * ended (zero length). Spans never overlap and follow the step order.
 */
export function buildStepSpans(steps: readonly Step[], playback: Playback): StepSpan[] {
  const strokeEnd = (i: number) => playback.starts[i]! + playback.partials[i]![playback.partials[i]!.length - 1]!;
  return steps.map((step, index) => {
    if (step.strokes.length > 0) return { start: playback.starts[step.strokes[0]!]!, end: strokeEnd(step.strokes[step.strokes.length - 1]!), moving: true };
    if (step.kind === 'start') {
      const next = steps.slice(index + 1).find((s) => s.strokes.length > 0);
      const at = next ? playback.starts[next.strokes[0]!]! : playback.total;
      return { start: at, end: at, moving: false };
    }
    const prev = [...steps.slice(0, index)].reverse().find((s) => s.strokes.length > 0);
    const at = prev ? strokeEnd(prev.strokes[prev.strokes.length - 1]!) : 0;
    return { start: at, end: at, moving: false };
  });
}
