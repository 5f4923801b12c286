import { useId, useState } from 'react';
import type { Units } from '@shared/design/design.schema.ts';
import { QUILT_LIMITS, type Quilt } from '@shared/quilt/quilt.schema.ts';
import { formatQuiltSize } from '@shared/quilt/formatLength.ts';
import { lengthInputText, parseLengthInput } from '@shared/units/units.ts';
import { addBorder, removeBorder, setBorderWidth, setSashing, sizesByBorder } from './quiltFrameEdits.ts';

export interface FramePanelProps {
  readonly quilt: Quilt;
  readonly viewerUnits: Units;
  readonly onEdit: (next: Quilt) => void;
}

/** A length field in the quilt's units that keeps what is typed ("2 1/", "1,") until it reads as a length. */
function LengthField({ label, value, units, allowZero, onValue }: { label: string; value: number; units: Units; allowZero: boolean; onValue: (v: number) => void }) {
  const id = useId();
  const [text, setText] = useState(() => lengthInputText(value, units));
  const [seen, setSeen] = useState(value);
  const [problem, setProblem] = useState<string | null>(null);
  // The value changed from outside (a reload, a 409's saved copy): show it, unless the text already says it.
  if (seen !== value) {
    setSeen(value);
    if (parseLengthInput(text, units) !== value) setText(lengthInputText(value, units));
  }
  return (
    <div>
      <label htmlFor={id} className="block font-semibold">{label}</label>
      <input
        id={id}
        inputMode="decimal"
        className="mt-1 block w-full rounded border border-muslin-300 bg-white px-2 py-2"
        value={text}
        aria-invalid={problem !== null}
        aria-describedby={problem ? `${id}-problem` : undefined}
        onChange={(e) => {
          setText(e.target.value);
          const v = parseLengthInput(e.target.value, units);
          if (v === undefined) return setProblem(units === 'in' ? `${label} must be a number or a fraction like 2 1/2.` : `${label} must be a number like 6.5.`);
          if (!allowZero && v <= 0) return setProblem(`${label} must be more than 0; use Remove to take the border away.`);
          setProblem(null);
          onValue(v);
        }}
      />
      {problem && <p id={`${id}-problem`} className="mt-1 text-sm font-semibold text-madder-600">{problem}</p>}
    </div>
  );
}

/**
 * Sashing and the borders, innermost first, each with its finished width in the quilt's units, and the quilt's
 * finished size after each border in the viewer's units.
 */
export function FramePanel({ quilt, viewerUnits, onEdit }: FramePanelProps) {
  const sizes = sizesByBorder(quilt);
  const size = (k: number) => formatQuiltSize(sizes[k]!.width, sizes[k]!.height, quilt.units, viewerUnits);
  const newWidth = quilt.borders.at(-1) ?? (quilt.units === 'in' ? 3 : 7.5);
  return (
    <section aria-labelledby="frame-heading" className="space-y-3 rounded border border-muslin-300 bg-muslin-50 p-3">
      <h2 id="frame-heading" className="font-bold">Sashing and borders</h2>
      <LengthField label={`Sashing (${quilt.units})`} value={quilt.sashing} units={quilt.units} allowZero onValue={(v) => onEdit(setSashing(quilt, v))} />
      <p className="text-sm">Blocks and sashing: {size(0)}</p>
      {quilt.borders.length > 0 && (
        <ol className="space-y-2" data-testid="border-list">
          {quilt.borders.map((w, i) => (
            <li key={i} className="flex items-end gap-2">
              <div className="min-w-0 flex-1">
                <LengthField label={`Border ${i + 1} (${quilt.units})`} value={w} units={quilt.units} allowZero={false} onValue={(v) => onEdit(setBorderWidth(quilt, i, v))} />
                <p className="text-sm">With border {i + 1}: <span data-testid={`size-after-border-${i + 1}`}>{size(i + 1)}</span></p>
              </div>
              <button type="button" onClick={() => onEdit(removeBorder(quilt, i))} aria-label={`Remove border ${i + 1}`} className="mb-6 rounded border border-madder-600 px-2 py-1 text-sm font-semibold text-madder-600">
                Remove
              </button>
            </li>
          ))}
        </ol>
      )}
      <button
        type="button"
        disabled={quilt.borders.length >= QUILT_LIMITS.maxBorders}
        onClick={() => onEdit(addBorder(quilt, newWidth))}
        className="rounded border border-denim-600 px-3 py-1 font-semibold text-denim-700 disabled:opacity-50"
      >
        Add a border
      </button>
      {quilt.borders.length >= QUILT_LIMITS.maxBorders && <p className="text-sm">{QUILT_LIMITS.maxBorders} borders at most.</p>}
    </section>
  );
}
