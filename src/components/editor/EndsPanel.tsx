import type { DesignCommand } from '@shared/design/commands.ts';

export interface EndsPanelProps {
  readonly mode: 'start' | 'end';
  readonly onMode: (mode: 'start' | 'end') => void;
  readonly dispatch: (cmd: DesignCommand) => void;
}

/** The start/end tool's choice of which end a click places, and clearing both (one undo step). */
export function EndsPanel({ mode, onMode, dispatch }: EndsPanelProps) {
  return (
    <fieldset className="rounded border border-muslin-300 bg-white p-2 text-sm">
      <legend>Place</legend>
      <label className="mr-3"><input type="radio" name="ends" checked={mode === 'start'} onChange={() => onMode('start')} /> Start</label>
      <label><input type="radio" name="ends" checked={mode === 'end'} onChange={() => onMode('end')} /> End</label>
      <button type="button" className="mt-1 block underline" onClick={() => dispatch({ kind: 'batch', commands: [{ kind: 'setStart', point: null }, { kind: 'setEnd', point: null }] })}>Clear both</button>
    </fieldset>
  );
}
