import { useEffect, useId, useState, type KeyboardEvent } from 'react';
import type { DesignCommand } from '@shared/design/commands.ts';
import type { Design } from '@shared/design/design.schema.ts';
import { BLOCK_SETTING_FIELDS, defaultOf, ownValueOf, settingCommand, settingText, type BlockSettingField } from './blockSettingsForm.ts';

export interface BlockSettingsPanelProps {
  readonly design: Design;
  /** Every change goes through the shared history as ONE command. */
  readonly dispatch: (cmd: DesignCommand) => void;
  /** Bumped when the document is replaced wholesale (reload, going back): drafts and messages are dropped. */
  readonly generation: number;
}

/** Batting, thread and edge numbers the route check and thread budget use; empty fields use the default. */
export function BlockSettingsPanel({ design, dispatch, generation }: BlockSettingsPanelProps) {
  return (
    <details className="rounded border border-muslin-300 bg-white p-3 text-sm">
      <summary className="cursor-pointer font-semibold">Block settings</summary>
      <p className="mt-1 text-xs text-denim-700">Leave a field empty to use the default. Press Enter or leave the field to apply.</p>
      <div className="mt-2 flex flex-col gap-2">
        {BLOCK_SETTING_FIELDS.map((f) => (
          <SettingInput key={f.key} field={f} design={design} dispatch={dispatch} generation={generation} />
        ))}
        <label className="flex items-center gap-2">
          <input type="checkbox" checked={design.edgeTravel} onChange={(e) => dispatch({ kind: 'setEdgeTravel', value: e.target.checked })} />
          Edge travel (the needle may run along the edge inside the binding band)
        </label>
      </div>
    </details>
  );
}

function SettingInput({ field, design, dispatch, generation }: { field: BlockSettingField; design: Design; dispatch: (cmd: DesignCommand) => void; generation: number }) {
  const id = useId();
  const own = ownValueOf(field.key, design);
  const units = design.units;
  const [text, setText] = useState(own === null ? '' : settingText(field.key, { units }, own));
  const [message, setMessage] = useState<string | null>(null);
  // Undo, redo and going back change the value from outside: show what the design now holds.
  useEffect(() => {
    setText(own === null ? '' : settingText(field.key, { units }, own));
    setMessage(null);
  }, [own, generation, field.key, units]);
  const d = defaultOf(field.key, design);
  const unit = field.unit === 'design' ? design.units : field.unit;
  const hint = d.value === null ? 'No default: set it to compare gaps.' : `Default ${settingText(field.key, design, d.value)} ${unit}${d.fromMemory ? ' (from memory)' : ''}`;

  function commit() {
    const r = settingCommand(design, field.key, text);
    if (!r.ok) return setMessage(r.message);
    setMessage(null);
    if (r.command) dispatch(r.command);
  }
  function onKeyDown(e: KeyboardEvent<HTMLInputElement>) {
    if (e.key === 'Enter') {
      e.preventDefault();
      commit();
    }
  }

  return (
    <div>
      <label htmlFor={id} className="block">{field.label} ({unit})</label>
      <input
        id={id}
        type="text"
        inputMode="decimal"
        value={text}
        placeholder={d.value === null ? 'not set' : settingText(field.key, design, d.value)}
        onChange={(e) => setText(e.target.value)}
        onBlur={commit}
        onKeyDown={onKeyDown}
        aria-invalid={message !== null}
        aria-describedby={`${id}-hint${message ? ` ${id}-msg` : ''}`}
        className="mt-0.5 w-full rounded border border-muslin-300 px-2 py-1 aria-[invalid=true]:border-madder-600"
      />
      <p id={`${id}-hint`} className="text-xs text-denim-700">{hint}</p>
      {message && <p id={`${id}-msg`} role="alert" className="text-xs text-madder-600">{message}</p>}
    </div>
  );
}
