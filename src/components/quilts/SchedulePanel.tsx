import { useCallback, useEffect, useId, useState } from 'react';
import type { DesignListItem } from '@shared/contract/designs.ts';
import { quiltScheduleAnswerSchema, type QuiltSchedule } from '@shared/contract/quiltSchedule.ts';
import { formatDate } from '@shared/format/dates.ts';
import type { Quilt } from '@shared/quilt/quilt.schema.ts';
import { apiRequest } from '../designs/apiClient.ts';

export interface SchedulePanelProps {
  readonly quiltId: string;
  /** The saved version: the schedule follows the saved quilting order, and is fetched again after each save. */
  readonly version: number;
  readonly quilt: Quilt;
  readonly designs: ReadonlyMap<string, DesignListItem>;
}

const STATUS_WORDS: Record<QuiltSchedule['rows'][number]['status'], string> = { done: 'Done', next: 'Next', later: 'Later', 'no-lesson': 'No lesson yet' };
/** Calendar days are whole days: written in UTC so no zone moves them to the day before. */
const day = (d: string) => formatDate(`${d}T00:00:00Z`, 'day', { timeZone: 'UTC' });

/**
 * The block schedule: tie the quilt to one of my classes (its dated lessons give one block each) or keep one block a
 * month from a start date; the blocks in quilting order with their dates, what is done and what is next.
 */
export function SchedulePanel({ quiltId, version, quilt, designs }: SchedulePanelProps) {
  const ids = { by: useId(), start: useId() };
  const [schedule, setSchedule] = useState<QuiltSchedule | null>(null);
  const [choice, setChoice] = useState<{ classId: string; start: string }>({ classId: '', start: '' });
  const [message, setMessage] = useState<string | null>(null);
  const [busy, setBusy] = useState(false);

  const take = useCallback((s: QuiltSchedule) => {
    setSchedule(s);
    setChoice({ classId: s.classId ?? '', start: s.start ?? '' });
  }, []);

  useEffect(() => {
    let live = true;
    void apiRequest('GET', `/api/quilts/${quiltId}/schedule`).then((res) => {
      if (!live) return;
      const parsed = res.ok ? quiltScheduleAnswerSchema.safeParse(res.value) : null;
      if (parsed?.success) take(parsed.data.schedule);
      else setMessage(res.ok ? 'The schedule could not be read.' : res.error.message);
    });
    return () => {
      live = false;
    };
  }, [quiltId, version, take]);

  async function save() {
    setBusy(true);
    const res = await apiRequest('PUT', `/api/quilts/${quiltId}/schedule`, { classId: choice.classId || null, start: choice.classId ? null : choice.start || null });
    setBusy(false);
    const parsed = res.ok ? quiltScheduleAnswerSchema.safeParse(res.value) : null;
    if (parsed?.success) {
      take(parsed.data.schedule);
      setMessage('Schedule saved.');
    } else setMessage(res.ok ? 'The schedule could not be read.' : `Not saved: ${res.error.message}`);
  }

  const title = (row: number, column: number) => {
    const p = quilt.placements[row]?.[column];
    return p ? (designs.get(p.designId)?.title ?? 'a design') : 'empty';
  };
  const src = schedule?.source;
  return (
    <section className="lg:col-span-2" aria-labelledby="schedule-heading">
      <h2 id="schedule-heading" className="text-xl font-bold">Schedule</h2>
      {!schedule ? (
        <p className="mt-1">{message ?? 'Loading the schedule…'}</p>
      ) : (
        <>
          <div className="mt-2 flex flex-wrap items-end gap-3">
            <div>
              <label htmlFor={ids.by} className="block font-semibold">Dates from</label>
              <select id={ids.by} className="mt-1 block max-w-full rounded border border-muslin-300 bg-white px-2 py-2" value={choice.classId} onChange={(e) => setChoice((c) => ({ ...c, classId: e.target.value }))}>
                <option value="">One block a month</option>
                {schedule.classes.map((c) => (
                  <option key={c.id} value={c.id}>{`The lessons of ${c.title} (${c.standing === 'teacher' ? 'you teach it' : 'you are enrolled'})`}</option>
                ))}
              </select>
            </div>
            {choice.classId === '' && (
              <div>
                <label htmlFor={ids.start} className="block font-semibold">First block on</label>
                <input id={ids.start} type="date" className="mt-1 block rounded border border-muslin-300 bg-white px-2 py-1.5" value={choice.start} onChange={(e) => setChoice((c) => ({ ...c, start: e.target.value }))} />
              </div>
            )}
            <button type="button" onClick={() => void save()} disabled={busy} className="rounded border border-denim-600 px-4 py-2 font-semibold text-denim-700 disabled:opacity-60">
              {busy ? 'Saving…' : 'Save schedule'}
            </button>
          </div>
          <p className="mt-1 text-sm" aria-live="polite">{message}</p>
          <p className="mt-2 max-w-prose" data-testid="schedule-source">
            {src?.kind === 'class'
              ? src.standing === 'teacher'
                ? `One block per lesson of ${src.classTitle} (${src.lessons} dated ${src.lessons === 1 ? 'lesson' : 'lessons'}); a lesson is done once its date has passed, with how many students finished it.`
                : `One block per lesson of ${src.classTitle}; a block is done when you have finished its lesson.`
              : `One block a month from ${day(src?.kind === 'monthly' ? src.monthlyStart : schedule.today)}; a block is done once its date has passed.`}
          </p>
          {schedule.rows.length === 0 ? (
            <p className="mt-1">Place blocks to see their dates.</p>
          ) : (
            <div className="mt-2 overflow-x-auto" tabIndex={0} role="region" aria-label="Schedule table (scrolls sideways)">
              <table className="min-w-full text-left text-sm" data-testid="schedule-table">
                <thead>
                  <tr className="border-b border-muslin-300"><th className="p-2">No.</th><th className="p-2">Block</th><th className="p-2">Date</th><th className="p-2">Lesson</th><th className="p-2">Status</th></tr>
                </thead>
                <tbody>
                  {schedule.rows.map((r) => (
                    <tr key={r.step} className={`border-b border-muslin-200 ${r.status === 'next' ? 'bg-ochre-500/15 font-semibold' : ''}`}>
                      <td className="p-2">{r.step}</td>
                      <th scope="row" className="p-2 text-left font-normal">Row {r.cell.row + 1}, column {r.cell.column + 1}: {title(r.cell.row, r.cell.column)}</th>
                      <td className="p-2">{r.date ? day(r.date) : '—'}</td>
                      <td className="p-2">{src?.kind === 'class' ? (r.lessonTitle ?? (r.date ? 'Not released yet' : '—')) : '—'}{r.finishedBy !== null ? ` · ${r.finishedBy} finished` : ''}</td>
                      <td className="p-2">{STATUS_WORDS[r.status]}</td>
                    </tr>
                  ))}
                </tbody>
              </table>
            </div>
          )}
        </>
      )}
    </section>
  );
}
