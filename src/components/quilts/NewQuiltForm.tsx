import { useId, useState, type FormEvent } from 'react';
import { z } from 'zod';
import type { Units } from '@shared/design/design.schema.ts';
import { QUILT_LIMITS } from '@shared/quilt/quilt.schema.ts';
import { finishedSize } from '@shared/quilt/finishedSize.ts';
import { formatLength } from '@shared/quilt/formatLength.ts';
import { gridForSize, presetSize, QUILT_SIZE_PRESETS } from '@shared/quilt/quiltSizes.ts';
import { apiRequest } from '../designs/apiClient.ts';
import { newQuilt } from './quiltEdits.ts';

export interface NewQuiltFormProps {
  /** The account's unit preference: the quilt is measured and stored in it. */
  readonly units: Units;
}

const whole = (max: number) => z.coerce.number({ error: 'Use a whole number.' }).int('Use a whole number.').min(1, 'Use 1 or more.').max(max, `Use at most ${max}.`);
const formSchema = z.object({
  title: z.string().trim().min(1, 'Give the quilt a title.').max(200, 'Keep the title to 200 characters.'),
  rows: whole(QUILT_LIMITS.maxRows),
  columns: whole(QUILT_LIMITS.maxColumns),
  block: z.coerce.number({ error: 'Use a number.' }).positive('Use a size above 0.').max(60, 'Use at most 60.'),
});

/** Title, rows × columns and block size (or a usual bed or crib size to start from); creates the quilt and opens it. */
export function NewQuiltForm({ units }: NewQuiltFormProps) {
  const [title, setTitle] = useState('');
  const [rows, setRows] = useState('2');
  const [columns, setColumns] = useState('2');
  const [block, setBlock] = useState(units === 'in' ? '12' : '30');
  const [preset, setPreset] = useState('');
  const [errors, setErrors] = useState<Record<string, string>>({});
  const [busy, setBusy] = useState(false);
  const ids = { title: useId(), rows: useId(), columns: useId(), block: useId(), preset: useId(), presetHint: useId() };

  function pickPreset(key: string) {
    setPreset(key);
    const p = QUILT_SIZE_PRESETS.find((x) => x.key === key);
    const b = Number(block);
    if (!p || !(b > 0)) return;
    const grid = gridForSize(presetSize(p, units), { block: { width: b, height: b }, sashing: 0, borders: [] }, QUILT_LIMITS.maxRows);
    setRows(String(grid.rows));
    setColumns(String(grid.columns));
  }

  const parsed = formSchema.safeParse({ title: title || 'x', rows, columns, block });
  const size = parsed.success ? finishedSize({ rows: parsed.data.rows, columns: parsed.data.columns, block: { width: parsed.data.block, height: parsed.data.block }, sashing: 0, borders: [] }) : null;

  async function submit(e: FormEvent) {
    e.preventDefault();
    const p = formSchema.safeParse({ title, rows, columns, block });
    if (!p.success) {
      const f: Record<string, string> = {};
      for (const i of p.error.issues) f[String(i.path[0])] ??= i.message;
      setErrors(f);
      return;
    }
    setErrors({});
    setBusy(true);
    const res = await apiRequest('POST', '/api/quilts', { title: p.data.title, quilt: newQuilt(units, p.data.rows, p.data.columns, p.data.block) });
    setBusy(false);
    if (!res.ok) {
      const fields = res.error.kind === 'http' ? z.object({ error: z.object({ fields: z.record(z.string(), z.string()).optional() }) }).safeParse(res.error.body) : null;
      const first = fields?.success && fields.data.error.fields ? Object.values(fields.data.error.fields)[0] : undefined;
      setErrors({ form: first ? `${res.error.message} ${first}` : res.error.message });
      return;
    }
    const id = z.object({ quilt: z.object({ id: z.string() }) }).safeParse(res.value);
    if (id.success) window.location.assign(`/quilts/${id.data.quilt.id}`);
    else setErrors({ form: 'The quilt was created but its address could not be read. Open it from the list.' });
  }

  const field = 'mt-1 block w-full rounded border border-muslin-300 bg-white px-3 py-2';
  const err = (k: string) => errors[k] && <p className="mt-1 text-sm font-semibold text-madder-600" role="alert">{errors[k]}</p>;
  return (
    <form onSubmit={submit} noValidate className="mt-4 space-y-4 rounded border border-muslin-300 bg-muslin-50 p-4" aria-label="New quilt">
      <h2 className="text-xl font-bold">New quilt</h2>
      <div>
        <label htmlFor={ids.title} className="font-semibold">Title</label>
        <input id={ids.title} name="title" className={field} value={title} onChange={(e) => setTitle(e.target.value)} maxLength={200} aria-invalid={errors['title'] ? true : undefined} />
        {err('title')}
      </div>
      <div>
        <label htmlFor={ids.preset} className="font-semibold">Start from a usual size (optional)</label>
        <select id={ids.preset} className={field} value={preset} onChange={(e) => pickPreset(e.target.value)} aria-describedby={ids.presetHint}>
          <option value="">Choose rows and columns myself</option>
          {QUILT_SIZE_PRESETS.map((p) => {
            const s = presetSize(p, units);
            return <option key={p.key} value={p.key}>{p.label}: about {s.width} × {s.height} {units}</option>;
          })}
        </select>
        <p id={ids.presetHint} className="mt-1 text-sm text-denim-700">Usual bed and crib sizes are common practice, from memory: pattern charts differ by several inches. Rows and columns are set to come nearest with your block size.</p>
      </div>
      <div className="grid grid-cols-3 gap-3">
        <div>
          <label htmlFor={ids.rows} className="font-semibold">Rows</label>
          <input id={ids.rows} name="rows" inputMode="numeric" className={field} value={rows} onChange={(e) => setRows(e.target.value)} aria-invalid={errors['rows'] ? true : undefined} />
          {err('rows')}
        </div>
        <div>
          <label htmlFor={ids.columns} className="font-semibold">Columns</label>
          <input id={ids.columns} name="columns" inputMode="numeric" className={field} value={columns} onChange={(e) => setColumns(e.target.value)} aria-invalid={errors['columns'] ? true : undefined} />
          {err('columns')}
        </div>
        <div>
          <label htmlFor={ids.block} className="font-semibold">Block ({units})</label>
          <input id={ids.block} name="block" inputMode="decimal" className={field} value={block} onChange={(e) => setBlock(e.target.value)} aria-invalid={errors['block'] ? true : undefined} />
          {err('block')}
        </div>
      </div>
      {size && <p>Finished size without sashing or borders: <strong>{formatLength(size.width, units)} × {formatLength(size.height, units)}</strong></p>}
      {errors['form'] && <p className="font-semibold text-madder-600" role="alert">{errors['form']}</p>}
      <button type="submit" disabled={busy} className="rounded bg-denim-600 px-5 py-2 font-semibold text-white hover:bg-denim-700 disabled:opacity-60">
        {busy ? 'Making…' : 'New quilt'}
      </button>
    </form>
  );
}
