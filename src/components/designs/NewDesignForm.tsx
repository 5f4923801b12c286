import { parseLengthInput } from '@shared/units/units.ts';
import { useId, useState, type FormEvent } from 'react';
import type { Units } from '@shared/design/design.schema.ts';
import { COMMON_BLOCK_SIZES } from '@shared/layouts/blockSizes.ts';
import { PIECED_LAYOUTS, type PiecedLayoutId } from '@shared/layouts/piecedLayouts.ts';
import { apiRequest } from './apiClient.ts';
import { createdDesignId } from './designsApi.ts';
import { LayoutPreview } from './LayoutPreview.tsx';
import { buildNewDesign, readNewDesignForm } from './newDesign.ts';

export interface NewDesignFormProps {
  /** The account's unit preference: sizes are offered and stored in it. */
  readonly units: Units;
}

/** Title, finished size and starting layout; creates the design through the API and opens the workbench. */
/** Typed sizes read as a ruler reads them ("12 1/2" in inches); anything else goes on for the form's message. */
const lengthOrText = (text: string, units: Units) => parseLengthInput(text, units) ?? text;

export function NewDesignForm({ units }: NewDesignFormProps) {
  const sizes = COMMON_BLOCK_SIZES[units];
  const [title, setTitle] = useState('');
  const [size, setSize] = useState<string>(String(units === 'in' ? 12 : 30));
  const [customW, setCustomW] = useState('');
  const [customH, setCustomH] = useState('');
  const [layout, setLayout] = useState<PiecedLayoutId>('nine-patch');
  const [errors, setErrors] = useState<Record<string, string>>({});
  const [busy, setBusy] = useState(false);
  const ids = { title: useId(), size: useId(), w: useId(), h: useId() };

  async function submit(e: FormEvent) {
    e.preventDefault();
    const custom = size === 'custom';
    const parsed = readNewDesignForm({ title, units, width: custom ? lengthOrText(customW, units) : size, height: custom ? lengthOrText(customH, units) : size, layout });
    if (!parsed.ok) {
      setErrors(parsed.errors);
      return;
    }
    setErrors({});
    setBusy(true);
    const res = await apiRequest('POST', '/api/designs', { title: parsed.form.title, notes: '', design: buildNewDesign(parsed.form) });
    setBusy(false);
    if (!res.ok) {
      setErrors({ form: res.error.message });
      return;
    }
    const id = createdDesignId(res.value);
    if (id) window.location.assign(`/designs/${id}`);
    else setErrors({ form: 'The design was created but its address could not be read. Open it from My designs.' });
  }

  const field = 'mt-1 block w-full rounded border border-muslin-300 bg-white px-3 py-2';
  return (
    <form onSubmit={submit} noValidate className="mt-6 space-y-6">
      <div>
        <label htmlFor={ids.title} className="font-semibold">Title</label>
        <input id={ids.title} name="title" className={field} value={title} onChange={(e) => setTitle(e.target.value)} maxLength={120} required aria-invalid={errors['title'] ? true : undefined} />
        {errors['title'] && <p className="mt-1 text-madder-600" role="alert">{errors['title']}</p>}
      </div>
      <div className="flex flex-wrap items-end gap-4">
        <div>
          <label htmlFor={ids.size} className="font-semibold">Finished size ({units})</label>
          <select id={ids.size} name="size" className={field} value={size} onChange={(e) => setSize(e.target.value)}>
            {sizes.map((s) => <option key={s} value={String(s)}>{s} × {s} {units}</option>)}
            <option value="custom">Other size…</option>
          </select>
        </div>
        {size === 'custom' && (
          <>
            <div>
              <label htmlFor={ids.w}>Width ({units})</label>
              <input id={ids.w} name="width" inputMode="decimal" className={field} value={customW} onChange={(e) => setCustomW(e.target.value)} aria-invalid={errors['width'] ? true : undefined} />
            </div>
            <div>
              <label htmlFor={ids.h}>Height ({units})</label>
              <input id={ids.h} name="height" inputMode="decimal" className={field} value={customH} onChange={(e) => setCustomH(e.target.value)} aria-invalid={errors['height'] ? true : undefined} />
            </div>
          </>
        )}
      </div>
      {(errors['width'] || errors['height']) && <p className="text-madder-600" role="alert">{errors['width'] ?? errors['height']}</p>}
      <fieldset>
        <legend className="font-semibold">Pieced layout to start from</legend>
        <div className="mt-2 grid grid-cols-2 gap-3 sm:grid-cols-3 lg:grid-cols-4">
          {PIECED_LAYOUTS.map((l) => (
            <label key={l.id} className={`flex cursor-pointer items-center gap-3 rounded border p-2 ${layout === l.id ? 'border-denim-600 bg-muslin-100 ring-2 ring-denim-500' : 'border-muslin-300 bg-white'}`}>
              <input type="radio" name="layout" value={l.id} checked={layout === l.id} onChange={() => setLayout(l.id)} className="sr-only" />
              <LayoutPreview layout={l.id} size={56} />
              <span>
                <span className="block font-semibold">{l.label}</span>
                <span className="block text-sm text-denim-700">{l.description}</span>
              </span>
            </label>
          ))}
        </div>
      </fieldset>
      {errors['form'] && <p className="text-madder-600" role="alert">{errors['form']}</p>}
      <button type="submit" disabled={busy} className="rounded bg-denim-600 px-5 py-2 font-semibold text-white hover:bg-denim-700 disabled:opacity-60">
        {busy ? 'Starting…' : 'Start designing'}
      </button>
    </form>
  );
}
