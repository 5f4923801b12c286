import type { DesignCommand } from '@shared/design/commands.ts';
import type { EndsStep } from '@shared/editor/endsTool.ts';

export interface EndsPanelProps {
  /** The end the next click on the block sets (the tool moves on by itself after each click). */
  readonly next: EndsStep;
  readonly onNext: (next: EndsStep) => void;
  readonly dispatch: (cmd: DesignCommand) => void;
}

/**
 * The start-and-end tool's side column: shows which step the next click is on (start first, then finish) and
 * lets the quilter jump to the other step, e.g. to move only the finish; "Clear both" is one undo step.
 */
export function EndsPanel({ next, onNext, dispatch }: EndsPanelProps) {
  return (
    <fieldset className="rounded border border-muslin-300 bg-white p-2 text-sm">
      <legend>Next click sets</legend>
      <label className="mr-3"><input type="radio" name="ends" checked={next === 'start'} onChange={() => onNext('start')} /> 1. Start</label>
      <label><input type="radio" name="ends" checked={next === 'end'} onChange={() => onNext('end')} /> 2. Finish</label>
      <button type="button" className="mt-1 block underline" onClick={() => dispatch({ kind: 'batch', commands: [{ kind: 'setStart', point: null }, { kind: 'setEnd', point: null }] })}>Clear both</button>
    </fieldset>
  );
}
