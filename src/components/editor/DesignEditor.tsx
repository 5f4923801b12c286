import { useCallback, useEffect, useMemo, useRef, useState, type KeyboardEvent } from 'react';
import type { Design, Units } from '@shared/design/design.schema.ts';
import type { Guide } from '@shared/editor/guides.ts';
import { halfwayGuide, extensionGuide } from '@shared/editor/guides.ts';
import type { Point } from '@shared/geometry/point.ts';
import { generateMotif, type MotifKind } from '@shared/motifs/motifs.ts';
import { findPatchFaces } from '@shared/walkthrough/patchFaces.ts';
import { buildBlockPlaces, findPatchAt } from '@shared/walkthrough/locate.ts';
import { namePatches } from '@shared/walkthrough/patchNames.ts';
import { formatSize } from '@shared/units/units.ts';
import { RouteCheckPanel } from '../route/RouteCheckPanel.tsx';
import { JoinPanel } from './JoinPanel.tsx';
import { joinLines, type JoinProposal } from '@shared/joins/findJoins.ts';
import { RoutePanel } from '../route/RoutePanel.tsx';
import { useRouteCheck } from '../route/useRouteCheck.ts';
import { useRoutePlan } from '../route/useRoutePlan.ts';
import { useRoutePlayer } from '../route/useRoutePlayer.ts';
import type { RouteStroke } from '../route/routePlayback.ts';
import { BlockLayer } from './canvas/BlockLayer.tsx';
import { EditorStage } from './canvas/EditorStage.tsx';
import { OverlayLayer } from './canvas/OverlayLayer.tsx';
import { QuiltingLineLayer } from './canvas/QuiltingLineLayer.tsx';
import { RouteLayer } from './canvas/RouteLayer.tsx';
import { RulerLayer } from './canvas/RulerLayer.tsx';
import { SeamLayer } from './canvas/SeamLayer.tsx';
import { readCanvasTheme } from './canvasTheme.ts';
import { findLinePieces } from './linePieces.ts';
import { buildMotifParams, defaultMotifValues } from './motifForm.ts';
import { MotifPanel } from './MotifPanel.tsx';
import { BlockSettingsPanel } from './BlockSettingsPanel.tsx';
import { SaveIndicator } from './SaveIndicator.tsx';
import { SavedVersionsPanel } from './SavedVersionsPanel.tsx';
import { ShortcutList } from './ShortcutList.tsx';
import { matchShortcut, type ShortcutAction } from './shortcuts.ts';
import { Toolbar, TOOLS, type ToolId } from './Toolbar.tsx';
import { joinShared, splitAtMiddle } from './tools/editCommands.ts';
import { useDesignDocument, type DesignDocument } from './useDesignDocument.ts';
import { useEditHistory } from './useEditHistory.ts';
import { useStageSize } from './useStageSize.ts';
import { useToolController } from './useToolController.ts';
import { useViewportControl } from './useViewportControl.ts';
import { zoomOf } from './viewport.ts';

export interface DesignEditorProps {
  readonly designId: string;
  /** The viewer's unit choice; figures are written in it (the design keeps its own units for drawing). */
  readonly viewerUnits: Units;
}

/** The workbench island: loads the design, then shows the canvas, tools, route check and route preview. */
export function DesignEditor({ designId, viewerUnits }: DesignEditorProps) {
  const doc = useDesignDocument(designId);
  if (doc.load.state === 'loading') return <p className="py-12 text-center">Opening the design…</p>;
  if (doc.load.state === 'missing' || !doc.design) {
    return (
      <div className="py-12 text-center" role="alert">
        <p className="text-xl font-semibold">This design could not be opened.</p>
        <p className="mt-2">{doc.load.state === 'missing' ? doc.load.message : ''}</p>
        <a href="/designs" className="mt-4 inline-block underline">Back to my designs</a>
      </div>
    );
  }
  return <Workbench designId={designId} doc={doc} design={doc.design} viewerUnits={viewerUnits} />;
}

const NO_STROKES: readonly RouteStroke[] = [];
const NO_ORDER: readonly number[] = [];
const NO_POINTS: readonly (readonly [number, number])[] = [];

function Workbench({ designId, doc, design, viewerUnits }: { designId: string; doc: DesignDocument; design: Design; viewerUnits: Units }) {
  const unitPair = useMemo(() => ({ design: design.units, viewer: viewerUnits }), [design.units, viewerUnits]);
  const history = useEditHistory(doc.design, doc.setDesign, doc.generation);
  const stageBox = useRef<HTMLDivElement>(null);
  const size = useStageSize(stageBox);
  const theme = useMemo(() => readCanvasTheme(), []);
  const vp = useViewportControl(design.width, design.height, size.width, size.height, design.units);
  const [tool, setTool] = useState<ToolId>('ruler');
  const [snapOn, setSnapOn] = useState(true);
  const [showGrid, setShowGrid] = useState(true);
  const [guides, setGuides] = useState<readonly Guide[]>([]);
  const [endsMode, setEndsMode] = useState<'start' | 'end'>('start');
  const [showKeys, setShowKeys] = useState(false);
  const [announce, setAnnounce] = useState('');

  // Patches come from the seams and the block size only: drawing quilting lines leaves them alone.
  // eslint-disable-next-line react-hooks/exhaustive-deps -- keyed on seams and size on purpose (see above).
  const patches = useMemo(() => namePatches(findPatchFaces(design), design), [design.seams, design.width, design.height]);
  // eslint-disable-next-line react-hooks/exhaustive-deps -- places read the size, units and seams, which change only with the patches.
  const places = useMemo(() => buildBlockPlaces(design, patches), [patches]);
  const [patchIndex, setPatchIndex] = useState<number | null>(null);
  const [motifKind, setMotifKind] = useState<MotifKind>('straight-lines');
  const [motifValues, setMotifValues] = useState<Record<string, number>>(() => defaultMotifValues('straight-lines', design.units));
  const patch = patchIndex !== null ? patches[patchIndex] ?? null : null;
  const motif = useMemo(() => {
    if (!patch) return null;
    const r = generateMotif(patch.polygon, buildMotifParams(motifKind, motifValues));
    return r.ok ? { ok: true as const, lines: r.value.lines } : { ok: false as const, message: r.error.kind === 'invalid-params' ? r.error.issues.map((i) => `${i.path}: ${i.message}`).join('; ') : 'This motif does not fit this patch shape.' };
  }, [patch, motifKind, motifValues]);

  const onPickPatch = useCallback((p: Point) => {
    const i = findPatchAt(places, p);
    setPatchIndex(i >= 0 ? i : null);
  }, [places]);

  const ctl = useToolController({ tool, design, scale: vp.view.scale, snapOn, guides, endsMode, dispatch: history.dispatch, onPickPatch });
  const check = useRouteCheck(designId, design, doc.savedCheck, doc.status.kind);
  const [shownJoin, setShownJoin] = useState<JoinProposal | null>(null);
  const joinPreview = useMemo(() => (shownJoin ? joinLines(shownJoin) : null), [shownJoin]);
  // A join drawn for an older drawing would point at lines that moved: drop it on every edit.
  useEffect(() => setShownJoin(null), [design]);
  const pieces = useMemo(() => findLinePieces(design), [design]);
  const routes = useRoutePlan(designId, design, doc.version);
  const shownStrokes = routes.plan?.route ?? (routes.saved && routes.savedIsCurrent ? routes.saved.strokes : null);
  const player = useRoutePlayer(shownStrokes ?? NO_STROKES, design.units === 'in' ? 2 : 5);

  const selected = ctl.selection;
  const selectedLines = useMemo(() => new Set(selected?.target === 'lines' ? selected.indices : []), [selected]);
  const selectedSeams = useMemo(() => new Set(selected?.target === 'seams' ? selected.indices : []), [selected]);

  const { clearOwnOrder } = ctl;
  const chooseTool = useCallback((t: ToolId) => {
    setTool(t);
    if (t === 'order') clearOwnOrder();
    setAnnounce(`${TOOLS.find((x) => x.id === t)?.label ?? t} tool`);
  }, [clearOwnOrder]);

  function deleteSelection() {
    if (!selected) return;
    history.dispatch({ kind: 'deleteLines', target: selected.target, indices: selected.indices });
    ctl.setSelection(null);
  }

  function split() {
    if (selected?.indices.length !== 1) return setAnnounce('Pick one line to split.');
    const cmd = splitAtMiddle(design, selected.target, selected.indices[0]!);
    if (cmd) history.dispatch(cmd);
    ctl.setSelection(null);
  }

  function join() {
    if (selected?.indices.length !== 2) return setAnnounce('Pick two lines that share an end to join them.');
    const cmd = joinShared(design, selected.target, selected.indices[0]!, selected.indices[1]!);
    if (!cmd) return setAnnounce('These two lines do not share an end.');
    history.dispatch(cmd);
    ctl.setSelection(null);
  }

  function addGuide() {
    if (!selected) return;
    const two = (i: number): Guide | null => {
      const l = design[selected.target][i];
      return l && l.length >= 2 ? [l[0]!, l[l.length - 1]!] : null;
    };
    if (selected.indices.length === 2) {
      const a = two(selected.indices[0]!);
      const b = two(selected.indices[1]!);
      if (a && b) setGuides((g) => [...g, halfwayGuide(a, b)]);
    } else if (selected.indices.length === 1) {
      const a = two(selected.indices[0]!);
      const ext = a ? extensionGuide(a, design.width, design.height) : null;
      if (ext) setGuides((g) => [...g, ext]);
    }
  }

  function run(action: ShortcutAction) {
    switch (action) {
      case 'undo': return history.undo();
      case 'redo': return history.redo();
      case 'delete': return deleteSelection();
      case 'split': return split();
      case 'join': return join();
      case 'finish': return void ctl.onKey('Enter');
      case 'cancel': if (!ctl.onKey('Escape')) ctl.setSelection(null); return;
      case 'zoom-in': return vp.zoomIn();
      case 'zoom-out': return vp.zoomOut();
      case 'zoom-fit': return vp.fit();
      case 'zoom-true': return vp.trueSize();
      case 'pan-left': return vp.pan(1, 0, false);
      case 'pan-right': return vp.pan(-1, 0, false);
      case 'pan-up': return vp.pan(0, 1, false);
      case 'pan-down': return vp.pan(0, -1, false);
      case 'toggle-snap': setSnapOn((s) => !s); return setAnnounce(snapOn ? 'Snapping off' : 'Snapping on');
      case 'play-pause': return player.playing ? player.pause() : player.play();
      case 'show-keys': return setShowKeys((s) => !s);
      default: {
        const t = TOOLS.find((x) => x.shortcut === action);
        if (t) chooseTool(t.id);
      }
    }
  }

  function onKeyDown(e: KeyboardEvent<HTMLDivElement>) {
    const el = e.target as HTMLElement;
    if (el.closest('input, select, textarea, [contenteditable="true"]')) return;
    const action = matchShortcut(e);
    if (!action) return;
    if (action === 'delete' && e.key === 'Backspace' && ctl.onKey('Backspace')) return e.preventDefault();
    if (el.tagName === 'BUTTON' && (action === 'finish')) return;
    e.preventDefault();
    if (action.startsWith('pan-') && e.shiftKey) {
      const d = { 'pan-left': [1, 0], 'pan-right': [-1, 0], 'pan-up': [0, 1], 'pan-down': [0, -1] }[action as 'pan-left']!;
      return vp.pan(d[0]!, d[1]!, true);
    }
    run(action);
  }

  const zoomPct = Math.round(zoomOf(vp.view, design.units) * 100);
  const own = design.route && design.route.length > 0;
  return (
    <div className="workbench flex flex-col gap-3" onKeyDown={onKeyDown}>
      <header className="flex flex-wrap items-center gap-3">
        <a href="/designs" className="text-denim-600 underline">My designs</a>
        <label className="flex items-center gap-2">
          <span className="sr-only">Design title</span>
          <input value={doc.title} onChange={(e) => doc.setTitle(e.target.value)} className="rounded border border-transparent bg-transparent px-1 text-2xl font-bold hover:border-muslin-300 focus:border-denim-500" maxLength={200} />
        </label>
        <span className="text-denim-700">{formatSize(design.width, design.height, design.units, viewerUnits)}</span>
        <SaveIndicator status={doc.status} onSaveNow={doc.saveNow} onResolve={doc.resolveConflict} />
        <span className="ml-auto flex flex-wrap gap-2">
          <a href={`/api/designs/${designId}/export.svg`} download className="rounded border border-denim-600 px-3 py-1 text-sm">Download SVG</a>
          <button type="button" onClick={() => setShowKeys((s) => !s)} aria-expanded={showKeys} className="rounded border border-denim-600 px-3 py-1 text-sm">Keys</button>
        </span>
      </header>
      {showKeys && <ShortcutList onClose={() => setShowKeys(false)} />}
      <p className="sr-only" role="status" aria-live="polite">{announce}</p>
      <div className="grid gap-3 lg:grid-cols-[11rem_minmax(0,1fr)_20rem]">
        <aside className="flex flex-col gap-3">
          <Toolbar tool={tool} onTool={chooseTool} />
          {tool === 'ends' && (
            <fieldset className="rounded border border-muslin-300 bg-white p-2 text-sm">
              <legend>Place</legend>
              <label className="mr-3"><input type="radio" name="ends" checked={endsMode === 'start'} onChange={() => setEndsMode('start')} /> Start</label>
              <label><input type="radio" name="ends" checked={endsMode === 'end'} onChange={() => setEndsMode('end')} /> End</label>
              <button type="button" className="mt-1 block underline" onClick={() => history.dispatch({ kind: 'batch', commands: [{ kind: 'setStart', point: null }, { kind: 'setEnd', point: null }] })}>Clear both</button>
            </fieldset>
          )}
        </aside>
        <div className="flex min-w-0 flex-col gap-2">
          <div className="flex flex-wrap items-center gap-2 text-sm" role="toolbar" aria-label="Canvas">
            <button type="button" onClick={history.undo} disabled={!history.canUndo} className="rounded border px-2 py-1 disabled:opacity-40" aria-keyshortcuts="Control+Z">Undo</button>
            <button type="button" onClick={history.redo} disabled={!history.canRedo} className="rounded border px-2 py-1 disabled:opacity-40" aria-keyshortcuts="Control+Shift+Z">Redo</button>
            <button type="button" onClick={deleteSelection} disabled={!selected} className="rounded border px-2 py-1 disabled:opacity-40">Remove</button>
            <button type="button" onClick={split} disabled={selected?.indices.length !== 1} className="rounded border px-2 py-1 disabled:opacity-40">Split</button>
            <button type="button" onClick={join} disabled={selected?.indices.length !== 2} className="rounded border px-2 py-1 disabled:opacity-40">Join</button>
            <button type="button" onClick={addGuide} disabled={!selected || selected.indices.length > 2} className="rounded border px-2 py-1 disabled:opacity-40" title="Two picked lines: the line halfway between. One picked line: its extension across the block.">Guide</button>
            {guides.length > 0 && <button type="button" onClick={() => setGuides([])} className="rounded border px-2 py-1">Clear guides</button>}
            <label className="flex items-center gap-1"><input type="checkbox" checked={snapOn} onChange={(e) => setSnapOn(e.target.checked)} /> Snap</label>
            <label className="flex items-center gap-1"><input type="checkbox" checked={showGrid} onChange={(e) => setShowGrid(e.target.checked)} /> Grid</label>
            <span className="ml-auto flex items-center gap-1">
              <button type="button" onClick={vp.zoomOut} className="rounded border px-2 py-1" aria-label="Zoom out">−</button>
              <span className="w-14 text-center tabular-nums" aria-label="Zoom">{zoomPct}%</span>
              <button type="button" onClick={vp.zoomIn} className="rounded border px-2 py-1" aria-label="Zoom in">+</button>
              <button type="button" onClick={vp.fit} className="rounded border px-2 py-1">Fit</button>
              <button type="button" onClick={vp.trueSize} className="rounded border px-2 py-1">True size</button>
            </span>
          </div>
          <div
            ref={stageBox}
            className="relative h-[62vh] min-h-[22rem] overflow-hidden rounded border border-muslin-300 bg-muslin-50"
            tabIndex={0}
            role="application"
            aria-label={`Block canvas, ${formatSize(design.width, design.height, design.units, viewerUnits)}, ${design.lines.length} quilting lines. Press ? for keys.`}
            data-testid="block-canvas"
          >
            {size.width > 0 && (
              <EditorStage width={size.width} height={size.height} units={design.units} view={vp.view} onViewChange={vp.setView} onPointer={ctl.onPointer} onDoubleClick={ctl.onDoubleClick} cursor={ctl.cursor}>
                <BlockLayer design={design} view={vp.view} stageWidth={size.width} stageHeight={size.height} theme={theme} showGrid={showGrid} />
                <SeamLayer seams={design.seams} view={vp.view} theme={theme} patch={tool === 'motif' ? patch : null} selected={selectedSeams} />
                <QuiltingLineLayer lines={design.lines} view={vp.view} theme={theme} selected={selectedLines} pieceOfLine={pieces} oddPoints={check.check?.oddPointPositions ?? NO_POINTS} start={design.start} end={design.end} ownOrder={tool === 'order' ? ctl.ownOrder : NO_ORDER} dimmed={shownStrokes !== null} stageWidth={size.width} stageHeight={size.height} />
                {shownStrokes && <RouteLayer strokes={shownStrokes} view={vp.view} theme={theme} needle={player.needle} />}
                <OverlayLayer view={vp.view} theme={theme} preview={tool === 'motif' && motif?.ok ? motif.lines : joinPreview ?? ctl.preview} snapped={ctl.snapped?.point ?? null} guides={guides} gap={check.check?.gap ?? null} />
                <RulerLayer units={design.units} view={vp.view} stageWidth={size.width} stageHeight={size.height} theme={theme} />
              </EditorStage>
            )}
          </div>
          <p className="text-xs text-denim-700">
            Wheel or two fingers: move · Ctrl+wheel or pinch: zoom · {snapOn ? 'Snapping to grid, seam ends, crossings, midpoints and guides' : 'Snapping off'} · Press <kbd>?</kbd> for all keys.
          </p>
        </div>
        <aside className="flex flex-col gap-3">
          {tool === 'motif' && (
            <MotifPanel
              units={design.units}
              kind={motifKind}
              values={motifValues}
              patchName={patch?.name ?? null}
              result={motif ? (motif.ok ? { ok: true, lines: motif.lines.length } : motif) : null}
              onKind={(k) => { setMotifKind(k); setMotifValues(defaultMotifValues(k, design.units)); }}
              onValue={(key, v) => setMotifValues((m) => ({ ...m, [key]: v }))}
              onPlace={() => motif?.ok && history.dispatch({ kind: 'addLines', target: 'lines', lines: motif.lines })}
            />
          )}
          <RouteCheckPanel check={check.check} state={check.state} message={check.message} units={design.units} viewerUnits={viewerUnits} />
          <JoinPanel design={design} units={unitPair} onAdd={history.dispatch} onShow={setShownJoin} shown={shownJoin} />
          <BlockSettingsPanel design={design} dispatch={history.dispatch} generation={doc.generation} />
          <RoutePanel routes={routes} player={player} units={unitPair} canKeep={doc.status.kind === 'saved'} hasOwnRoute={Boolean(own)} onClearOwn={() => { ctl.clearOwnOrder(); history.dispatch({ kind: 'setRoute', route: null }); }} />
          <SavedVersionsPanel designId={designId} baseVersion={doc.version} canGoBack={doc.status.kind === 'saved'} onRestored={doc.replaceFromServer} onConflict={doc.openConflict} />
        </aside>
      </div>
    </div>
  );
}
