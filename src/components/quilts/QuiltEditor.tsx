import { useCallback, useEffect, useId, useMemo, useState } from 'react';
import { z } from 'zod';
import type { Units } from '@shared/design/design.schema.ts';
import { designListSchema, type DesignListItem } from '@shared/contract/designs.ts';
import { quiltRecordSchema, type QuiltRecord } from '@shared/contract/quilts.ts';
import type { DesignSummary } from '@shared/contract/figures.ts';
import type { Quilt } from '@shared/quilt/quilt.schema.ts';
import { finishedSize } from '@shared/quilt/finishedSize.ts';
import { formatQuiltSize } from '@shared/quilt/formatLength.ts';
import type { TRIM_SOURCES } from '@shared/quilt/trim.ts';
import { convertQuilt } from '@shared/quilt/convertQuilt.ts';
import { formatLength, formatThread } from '@shared/units/units.ts';
import { apiRequest } from '../designs/apiClient.ts';
import { PlanDownload } from '../print/PlanDownload.tsx';
import { QuiltRoutePanel } from './QuiltRoutePanel.tsx';
import { budgetOf, clearCell, moveBlock, placeDesign, toggleMirror, trimTableOf, turnQuarter } from './quiltEdits.ts';
import { FramePanel } from './FramePanel.tsx';
import { keepHandOrder, quiltingOrder, swapInHandOrder } from './quiltOrderEdits.ts';
import type { BlockDrop } from './blockGesture.ts';
import { OrderPanel } from './OrderPanel.tsx';
import { SchedulePanel } from './SchedulePanel.tsx';
import { DesignTray } from './DesignTray.tsx';
import { DragGhost } from './DragGhost.tsx';
import { cellKey, QuiltMap } from './QuiltMap.tsx';
import { useBlockGesture } from './useBlockGesture.ts';
import { ChainRouteOverlay } from './ChainRouteOverlay.tsx';
import { TrimOverlay } from './TrimOverlay.tsx';
import { RoutePlayer, useRoutePlayback } from './RoutePlayer.tsx';
import { buildChainOverview } from '@shared/quilt/chainOverview.ts';
import type { QuiltPlanAnswer } from '@shared/contract/quiltPlan.ts';

export interface QuiltEditorProps {
  readonly quiltId: string;
  readonly viewerUnits: Units;
}

const TRIM_LABELS: Record<keyof typeof TRIM_SOURCES, string> = { seamAllowance: 'Joining seam', shrinkage: 'Shrinkage while quilting', margin: 'Extra fabric and batting beyond each cut line' };

const answerSchema = z.object({ quilt: quiltRecordSchema });
type Cell = { row: number; column: number };

/**
 * The quilt map: the grid of blocks with the placed designs' pictures (turned and mirrored as they sit), sashing and
 * border widths, the finished size in the viewer's units; a picked cell takes one of my designs, a quarter turn or a
 * mirror. Saves with the version it was loaded at; when the quilt was saved elsewhere meanwhile (409) it says so
 * and shows the saved copy.
 */
export function QuiltEditor({ quiltId, viewerUnits }: QuiltEditorProps) {
  const [record, setRecord] = useState<QuiltRecord | null>(null);
  const [quilt, setQuilt] = useState<Quilt | null>(null);
  const [designs, setDesigns] = useState<readonly DesignListItem[]>([]);
  const [picked, setPicked] = useState<Cell>({ row: 0, column: 0 });
  const [dirty, setDirty] = useState(false);
  const [saving, setSaving] = useState(false);
  const [notice, setNotice] = useState<{ tone: 'ok' | 'warn'; text: string } | null>(null);
  const [loadError, setLoadError] = useState<string | null>(null);
  const ids = { design: useId() };

  const show = useCallback((r: QuiltRecord) => {
    setRecord(r);
    setQuilt(r.quilt as Quilt);
    setDirty(false);
  }, []);

  useEffect(() => {
    let live = true;
    void (async () => {
      const [q, d] = await Promise.all([apiRequest('GET', `/api/quilts/${quiltId}`), apiRequest('GET', '/api/designs?sort=title&dir=asc&pageSize=100')]);
      if (!live) return;
      if (!q.ok) return setLoadError(q.error.message);
      const parsed = answerSchema.safeParse(q.value);
      if (!parsed.success) return setLoadError('The quilt could not be read.');
      show(parsed.data.quilt);
      const list = d.ok ? designListSchema.safeParse(d.value) : null;
      if (list?.success) setDesigns(list.data.designs);
      else setNotice({ tone: 'warn', text: 'Your designs could not be loaded, so blocks cannot be placed just now. Reload the page to try again.' });
    })();
    return () => {
      live = false;
    };
  }, [quiltId, show]);

  // Every edit keeps a hand order true to the map (a cleared block leaves it, a new one joins at the end).
  const applyEdit = useCallback((f: (q: Quilt) => Quilt) => {
    setQuilt((q) => (q ? keepHandOrder(f(q)) : q));
    setDirty(true);
    setNotice(null);
  }, []);
  const onDrop = useCallback(
    (d: BlockDrop) => applyEdit((q) => (d.kind === 'place' ? placeDesign(q, d.cell.row, d.cell.column, d.designId) : swapInHandOrder(moveBlock(q, d.from, d.to), d.from, d.to))),
    [applyEdit],
  );
  const { gesture, dispatch } = useBlockGesture(onDrop, setPicked);
  const [route, setRoute] = useState<QuiltPlanAnswer | null>(null);
  const [showTrim, setShowTrim] = useState(false);
  // The route is of the saved quilt: it is drawn only while the map on screen is that save.
  const routeSteps = route && record && !dirty && route.quiltVersion === record.version ? route.plan.steps : null;
  const legs = useMemo(() => (quilt && routeSteps ? buildChainOverview(quilt, routeSteps, quilt.linkMetric) : []), [quilt, routeSteps]);
  const player = useRoutePlayback(legs);
  const byId = useMemo(() => new Map(designs.map((d) => [d.id, d])), [designs]);
  const summaries = useMemo(() => new Map<string, DesignSummary | null>(designs.map((d) => [d.id, d.summary])), [designs]);

  if (loadError) return <p className="mt-4 font-semibold text-madder-600" role="alert">{loadError}</p>;
  if (!record || !quilt) return <p className="mt-4">Loading the quilt…</p>;

  const edit = (next: Quilt) => applyEdit(() => next);

  async function save() {
    if (!record || !quilt) return;
    setSaving(true);
    const res = await apiRequest('PUT', `/api/quilts/${record.id}`, { baseVersion: record.version, quilt });
    setSaving(false);
    if (res.ok) {
      const parsed = answerSchema.safeParse(res.value);
      if (parsed.success) show(parsed.data.quilt);
      setNotice({ tone: 'ok', text: 'Saved.' });
      return;
    }
    if (res.error.kind === 'http' && res.error.status === 409) {
      const current = answerSchema.safeParse(res.error.body);
      if (current.success) show(current.data.quilt);
      setNotice({ tone: 'warn', text: 'This quilt was saved in another tab or window while you worked. Your changes here were not saved; the saved copy is shown now.' });
      return;
    }
    setNotice({ tone: 'warn', text: `Not saved: ${res.error.message}` });
  }

  const size = finishedSize(quilt);
  const orderNumbers = new Map(quiltingOrder(quilt).map((c, i) => [cellKey(c), i + 1] as const));
  const heldDesign = gesture.kind === 'holding' && gesture.carried.kind === 'design' ? byId.get(gesture.carried.designId) : undefined;
  const heldWords = heldDesign ? `Placing “${heldDesign.title}”: pick a block on the map (Escape to stop).` : '';
  const cell = quilt.placements[picked.row]?.[picked.column] ?? null;
  // The trim plan in the viewer's units (as the printed plan has it): the quilt redrawn in them, then planned.
  const trim = trimTableOf(convertQuilt(quilt, viewerUnits));
  const { budget, missing } = budgetOf(quilt, summaries);
  const len = (v: number) => formatLength(v, quilt.units, viewerUnits);

  return (
    <div className="mt-4 grid grid-cols-[minmax(0,1fr)] gap-6 lg:grid-cols-[minmax(0,1fr)_20rem]">
      <section aria-label="Quilt map">
        <p className="mb-2">
          Finished size <strong data-testid="finished-size">{formatQuiltSize(size.width, size.height, quilt.units, viewerUnits)}</strong>
          {' '}· {quilt.rows} × {quilt.columns} blocks of {formatQuiltSize(quilt.block.width, quilt.block.height, quilt.units, viewerUnits)}
        </p>
        <QuiltMap
          quilt={quilt}
          viewerUnits={viewerUnits}
          designs={byId}
          picked={picked}
          gesture={gesture}
          orderNumbers={orderNumbers}
          onCellClick={(c) => dispatch({ kind: 'cell', cell: c })}
          onCellPointerDown={(c, e) => e.button === 0 && dispatch({ kind: 'pointer-down', carried: { kind: 'cell', cell: c }, at: { x: e.clientX, y: e.clientY } })}
          overlay={
            <>
              {showTrim && <TrimOverlay quilt={quilt} viewerUnits={viewerUnits} />}
              {routeSteps && <ChainRouteOverlay quilt={quilt} legs={legs} metric={quilt.linkMetric} frame={player.frame} />}
            </>
          }
        />
        <label className="mt-2 flex items-center gap-2 text-sm">
          <input type="checkbox" checked={showTrim} onChange={(e) => setShowTrim(e.target.checked)} />
          Show the quilt-as-you-go trim on the map (how much comes off each side; solid rule: border side, dashed: joining seam)
        </label>
        {routeSteps ? (
          <RoutePlayer legs={legs} player={player} corners={routeSteps} />
        ) : (
          route && <p className="mt-2 text-sm">The route drawn on the map is of the saved quilt: save and plan again to see it.</p>
        )}
        <p className="sr-only" role="status" aria-live="polite">{heldWords}</p>
        {gesture.kind === 'holding' && (
          <p className="mt-2 rounded border-l-4 border-denim-600 bg-muslin-100 px-3 py-2" aria-hidden="true">
            {heldWords} <button type="button" className="ml-1 underline" onClick={() => dispatch({ kind: 'cancel' })}>Put it back</button>
          </p>
        )}
        {gesture.kind === 'dragging' && <DragGhost carried={gesture.carried} at={gesture.at} quilt={quilt} designs={byId} />}
      </section>

      <aside className="space-y-4">
        <DesignTray
          designs={designs}
          heldDesignId={gesture.kind === 'holding' && gesture.carried.kind === 'design' ? gesture.carried.designId : null}
          onPick={(c) => dispatch({ kind: 'pick', carried: c })}
          onPointerDown={(c, e) => e.button === 0 && dispatch({ kind: 'pointer-down', carried: c, at: { x: e.clientX, y: e.clientY } })}
        />
        <section className="rounded border border-muslin-300 bg-muslin-50 p-3" aria-label="Picked block">
          <h2 className="font-bold">Row {picked.row + 1}, column {picked.column + 1}</h2>
          <label htmlFor={ids.design} className="mt-2 block font-semibold">Design</label>
          <select
            id={ids.design}
            className="mt-1 block w-full rounded border border-muslin-300 bg-white px-2 py-2"
            value={cell?.designId ?? ''}
            onChange={(e) => edit(placeDesign(quilt, picked.row, picked.column, e.target.value || null))}
          >
            <option value="">Empty</option>
            {cell && !byId.has(cell.designId) && <option value={cell.designId}>A design no longer in your list</option>}
            {designs.map((d) => (
              <option key={d.id} value={d.id}>{d.title}</option>
            ))}
          </select>
          <div className="mt-2 flex flex-wrap gap-2">
            <button type="button" disabled={!cell} onClick={() => edit(turnQuarter(quilt, picked.row, picked.column))} className="rounded border border-denim-600 px-3 py-1 font-semibold text-denim-700 disabled:opacity-50">
              Turn a quarter
            </button>
            <button type="button" disabled={!cell} onClick={() => edit(toggleMirror(quilt, picked.row, picked.column))} className="rounded border border-denim-600 px-3 py-1 font-semibold text-denim-700 disabled:opacity-50">
              {cell?.mirror ? 'Unmirror' : 'Mirror'}
            </button>
            <button type="button" disabled={!cell} onClick={() => edit(clearCell(quilt, picked.row, picked.column))} className="rounded border border-madder-600 px-3 py-1 font-semibold text-madder-600 disabled:opacity-50">
              Clear block
            </button>
          </div>
          {cell && <p className="mt-1 text-sm">Turned {cell.rotation}° clockwise{cell.mirror ? ', mirrored left to right' : ''}.</p>}
        </section>

        <OrderPanel quilt={quilt} designs={byId} onEdit={edit} />

        <FramePanel quilt={quilt} viewerUnits={viewerUnits} onEdit={edit} />

        <div className="flex flex-wrap items-center gap-3">
          <button type="button" onClick={() => void save()} disabled={saving || !dirty} className="rounded bg-denim-600 px-5 py-2 font-semibold text-white hover:bg-denim-700 disabled:opacity-60">
            {saving ? 'Saving…' : 'Save quilt'}
          </button>
          <span aria-live="polite" className="text-sm">{dirty ? 'Unsaved changes' : `Saved, version ${record.version}`}</span>
        </div>
        <section aria-label="Printable plan" className="print:hidden">
          <h2 className="font-bold">Printable plan</h2>
          <p className="text-sm">The quilt map, trim plan and budget, then each block with its numbered steps.</p>
          <PlanDownload href={`/api/quilts/${record.id}/plan.pdf`} waitText={dirty ? 'Save the quilt to download its plan.' : null} className="mt-2" />
        </section>
        {notice && <p role={notice.tone === 'warn' ? 'alert' : 'status'} className={notice.tone === 'warn' ? 'font-semibold text-madder-600' : 'text-denim-700'}>{notice.text}</p>}
      </aside>

      <QuiltRoutePanel quiltId={record.id} version={record.version} dirty={dirty} viewerUnits={viewerUnits} onPlanned={setRoute} />

      <SchedulePanel quiltId={record.id} version={record.version} quilt={quilt} designs={byId} />

      <section className="lg:col-span-2" aria-labelledby="budget-heading">
        <h2 id="budget-heading" className="text-xl font-bold">Quilt budget, block by block</h2>
        {budget ? (
          <>
            <p className="mt-1">Each block quilted on its own, from the blocks' planned routes.</p>
            <dl className="mt-2 grid grid-cols-2 gap-x-6 gap-y-1 sm:grid-cols-4">
              <dt>Passes</dt><dd className="font-semibold">{budget.passes}</dd>
              <dt>Stitched</dt><dd className="font-semibold">{len(budget.stitchLength)}</dd>
              <dt>Travel</dt><dd className="font-semibold">{len(budget.travelLength)}</dd>
              <dt>Stitches</dt><dd className="font-semibold">{budget.total.stitchCount.toLocaleString()}</dd>
              <dt>Top thread</dt><dd className="font-semibold">{formatThread(budget.total.topThreadYards, viewerUnits)}</dd>
              <dt>Bobbin thread</dt><dd className="font-semibold">{formatThread(budget.total.bobbinThreadYards, viewerUnits)}</dd>
              <dt>Bobbins</dt><dd className="font-semibold">{budget.total.bobbins}</dd>
              <dt>Sewing time</dt><dd className="font-semibold">about {Math.round(budget.total.sewingMinutes)} min</dd>
            </dl>
            <details className="mt-2 text-sm">
              <summary>Where these numbers come from</summary>
              <ul className="ml-5 list-disc">
                {budget.total.assumptions.map((a) => <li key={a.setting}>{a.setting}: {String(a.value)} ({a.source})</li>)}
              </ul>
            </details>
          </>
        ) : (
          <p className="mt-1">{missing > 0 ? `${missing} placed block${missing === 1 ? ' has' : 's have'} no planned figures yet; the budget follows when every block has them.` : 'Place a design to see the budget.'}</p>
        )}
      </section>

      <section className="lg:col-span-2" aria-labelledby="trim-heading">
        <h2 id="trim-heading" className="text-xl font-bold">Quilt-as-you-go trim plan</h2>
        {'problem' in trim ? (
          <p className="mt-1">{trim.problem}</p>
        ) : trim.rows.length === 0 ? (
          <p className="mt-1">Place a design to see how each block is trimmed.</p>
        ) : (
          <>
            <p className="mt-1 text-sm">Lengths in {viewerUnits === 'in' ? 'inches' : 'centimetres'}. Settings in use:</p>
            <ul className="ml-5 list-disc text-sm">
              {trim.assumptions.map((a) => (
                <li key={a.setting}>{TRIM_LABELS[a.setting]} {a.setting === 'shrinkage' ? `${a.value} %` : formatLength(a.value, viewerUnits, viewerUnits)} ({a.source === 'quilt' ? 'set for this quilt' : a.source})</li>
              ))}
            </ul>
            <div className="mt-2 overflow-x-auto" tabIndex={0} role="region" aria-label="Trim plan table (scrolls sideways)">
              <table className="min-w-full text-left text-sm">
                <thead>
                  <tr className="border-b border-muslin-300"><th className="p-2">Block</th><th className="p-2">Position</th><th className="p-2">Make at</th><th className="p-2">Cut to</th><th className="p-2">Top</th><th className="p-2">Right</th><th className="p-2">Bottom</th><th className="p-2">Left</th></tr>
                </thead>
                <tbody>
                  {trim.rows.map((r) => (
                    <tr key={r.block} className="border-b border-muslin-200 align-top">
                      <th scope="row" className="p-2 font-semibold">{r.block}</th><td className="p-2">{r.position}</td><td className="p-2">{r.makeAt}</td><td className="p-2">{r.cutTo}</td>
                      <td className="p-2">{r.sides.top}</td><td className="p-2">{r.sides.right}</td><td className="p-2">{r.sides.bottom}</td><td className="p-2">{r.sides.left}</td>
                    </tr>
                  ))}
                </tbody>
              </table>
            </div>
          </>
        )}
      </section>
    </div>
  );
}
