import { useId, useState } from 'react';
import type { Units } from '@shared/design/design.schema.ts';
import { MOTIFS, type MotifKind } from '@shared/motifs/motifs.ts';
import { lengthInputText, parseLengthInput } from '@shared/units/units.ts';
import { MOTIF_FIELDS } from './motifForm.ts';

export interface MotifPanelProps {
  readonly units: Units;
  readonly kind: MotifKind;
  readonly values: Readonly<Record<string, number>>;
  /** Name of the patch picked on the canvas, or null before one is picked. */
  readonly patchName: string | null;
  /** Lines the live preview shows, or the generator's complaint. */
  readonly result: { readonly ok: true; readonly lines: number } | { readonly ok: false; readonly message: string } | null;
  readonly onKind: (kind: MotifKind) => void;
  readonly onValue: (key: string, value: number) => void;
  readonly onPlace: () => void;
}

/** Motif choice and its numbers, with the live preview's line count; placing adds the lines as one undo step. */
export function MotifPanel({ units, kind, values, patchName, result, onKind, onValue, onPlace }: MotifPanelProps) {
  const base = useId();
  return (
    <section aria-label="Motif" className="rounded border border-muslin-300 bg-white p-3 text-sm">
      <h2 className="font-semibold">Motif in a patch</h2>
      <p className="mt-1">{patchName ? <>Patch: <strong>{patchName}</strong></> : 'Click a patch on the block to fill it.'}</p>
      <label htmlFor={`${base}-kind`} className="mt-2 block">Motif</label>
      <select id={`${base}-kind`} value={kind} onChange={(e) => onKind(e.target.value as MotifKind)} className="mt-1 w-full rounded border border-muslin-300 bg-white px-2 py-1">
        {MOTIFS.map((m) => <option key={m.kind} value={m.kind}>{m.label}</option>)}
      </select>
      <p className="mt-1 text-xs text-denim-700">{MOTIFS.find((m) => m.kind === kind)?.description}</p>
      <div className="mt-2 grid grid-cols-2 gap-2">
        {MOTIF_FIELDS[kind].map((f) => (
          <label key={f.key} className="block">
            <span className="block">{f.label}{f.unit === 'length' ? ` (${units})` : f.unit === 'degrees' ? ' (°)' : ''}</span>
            {f.unit === 'length' ? (
              <LengthInput units={units} value={values[f.key]} onValue={(v) => onValue(f.key, v)} />
            ) : (
              <input
                type="number"
                step={f.step}
                value={values[f.key] ?? ''}
                onChange={(e) => onValue(f.key, e.target.valueAsNumber)}
                className="mt-0.5 w-full rounded border border-muslin-300 px-2 py-1"
              />
            )}
          </label>
        ))}
      </div>
      {result && (result.ok ? <p className="mt-2">{result.lines} line{result.lines === 1 ? '' : 's'} in the preview.</p> : <p className="mt-2 text-madder-600" role="alert">{result.message}</p>)}
      <button type="button" disabled={!result?.ok || result.lines === 0} onClick={onPlace} className="mt-2 rounded bg-denim-600 px-3 py-1.5 font-semibold text-white disabled:opacity-50">Place motif</button>
    </section>
  );
}

/**
 * A length typed as a quilter reads a ruler: "1/4", "1 1/2" or "0.25" in inches, decimals in centimetres. Shows the
 * text as typed while it means the value the panel holds; when the value changes from outside, shows that value
 * (on a 1/16 in mark as a fraction). Text that is not a length yet sends NaN, which the motif form refuses.
 */
function LengthInput({ units, value, onValue }: { units: Units; value: number | undefined; onValue: (v: number) => void }) {
  const [text, setText] = useState(() => (value !== undefined && Number.isFinite(value) ? lengthInputText(value, units) : ''));
  const parsed = parseLengthInput(text, units);
  const inSync = parsed === value || (parsed === undefined && !(value !== undefined && Number.isFinite(value)));
  const shown = inSync || value === undefined ? text : lengthInputText(value, units);
  return (
    <input
      type="text"
      inputMode="decimal"
      value={shown}
      onChange={(e) => {
        setText(e.target.value);
        onValue(parseLengthInput(e.target.value, units) ?? Number.NaN);
      }}
      className="mt-0.5 w-full rounded border border-muslin-300 px-2 py-1"
    />
  );
}
