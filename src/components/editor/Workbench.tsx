import { useCallback, useEffect, useMemo, useRef, useState, type KeyboardEvent } from 'react';
import type { DesignCommand } from '@shared/design/commands.ts';
import type { Design, Units } from '@shared/design/design.schema.ts';
import { guardBlockEdit } from '@shared/editor/blockGuard.ts';
import type { Guide } from '@shared/editor/guides.ts';
import { joinLines, type JoinProposal } from '@shared/joins/findJoins.ts';
import { formatSize } from '@shared/units/units.ts';
import { useRouteCheck } from '../route/useRouteCheck.ts';
import { useRoutePlan } from '../route/useRoutePlan.ts';
import { useRoutePlayer } from '../route/useRoutePlayer.ts';
import type { RouteStroke } from '../route/routePlayback.ts';
import { BlockCanvas } from './BlockCanvas.tsx';
import { CanvasBar } from './CanvasBar.tsx';
import { readCanvasTheme } from './canvasTheme.ts';
import { EndsPanel } from './EndsPanel.tsx';
import { selectionEdits } from './selectionEdits.ts';
import { ShortcutList } from './ShortcutList.tsx';
import { matchShortcut } from './shortcuts.ts';
import { SidePanels } from './SidePanels.tsx';
import { Toolbar, TOOLS, type ToolId } from './Toolbar.tsx';
import type { DesignDocument } from './useDesignDocument.ts';
import { useEditHistory } from './useEditHistory.ts';
import { usePatchMotif } from './usePatchMotif.ts';
import { useStageSize } from './useStageSize.ts';
import { toolHint } from './toolHints.ts';
import { useToolController } from './useToolController.ts';
import { useViewportControl } from './useViewportControl.ts';
import { zoomOf } from './viewport.ts';
import { runWorkbenchAction, type WorkbenchCommands } from './workbenchActions.ts';
import { WorkbenchHeader } from './WorkbenchHeader.tsx';

const NO_STROKES: readonly RouteStroke[] = [];

export interface WorkbenchProps {
  readonly designId: string;
  readonly doc: DesignDocument;
  readonly design: Design;
  readonly viewerUnits: Units;
}

/**
 * The loaded workbench: holds the view state (tool, snapping, grid, guides, keys list) and wires the document,
 * history, tools, route check, plans and player to the header, canvas bar, tool rail, canvas and side panels.
 */
export function Workbench({ designId, doc, design, viewerUnits }: WorkbenchProps) {
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
  const [showKeys, setShowKeys] = useState(false);
  const [announce, setAnnounce] = useState('');
  const motif = usePatchMotif(design);

  const [notice, setNotice] = useState<string | null>(null);
  // Every edit passes the block check first (quilting lines stay inside the block, as the server requires).
  const { dispatch: historyDispatch } = history;
  const dispatch = useCallback((cmd: DesignCommand) => {
    const guarded = guardBlockEdit(design, cmd);
    setNotice(guarded.notice);
    if (guarded.command) historyDispatch(guarded.command);
  }, [design, historyDispatch]);
  const ctl = useToolController({ tool, design, scale: vp.view.scale, snapOn, guides, dispatch, onPickPatch: motif.pickPatchAt });
  const check = useRouteCheck(designId, design, doc.savedCheck, doc.status.kind);
  const [shownJoin, setShownJoin] = useState<JoinProposal | null>(null);
  const joinPreview = useMemo(() => (shownJoin ? joinLines(shownJoin) : null), [shownJoin]);
  // A join drawn for an older drawing would point at lines that moved: drop it on every edit.
  useEffect(() => setShownJoin(null), [design]);
  const routes = useRoutePlan(designId, design, doc.version);
  const shownStrokes = routes.plan?.route ?? (routes.saved && routes.savedIsCurrent ? routes.saved.strokes : null);
  const player = useRoutePlayer(shownStrokes ?? NO_STROKES, design.units === 'in' ? 2 : 5);

  const { clearOwnOrder } = ctl;
  const chooseTool = useCallback((t: ToolId) => {
    setTool(t);
    setNotice(null);
    if (t === 'order') clearOwnOrder();
    setAnnounce(`${TOOLS.find((x) => x.id === t)?.label ?? t} tool`);
  }, [clearOwnOrder]);

  const edits = selectionEdits({
    design,
    selection: ctl.selection,
    setSelection: ctl.setSelection,
    dispatch,
    addGuideLine: (g) => setGuides((gs) => [...gs, g]),
    announce: setAnnounce,
  });

  const commands: WorkbenchCommands = {
    undo: history.undo,
    redo: history.redo,
    removeSelection: edits.remove,
    split: edits.split,
    join: edits.join,
    finish: () => void ctl.onKey('Enter'),
    cancel: () => {
      if (!ctl.onKey('Escape')) ctl.setSelection(null);
    },
    zoomIn: vp.zoomIn,
    zoomOut: vp.zoomOut,
    fit: vp.fit,
    trueSize: vp.trueSize,
    pan: vp.pan,
    toggleSnap: () => {
      setSnapOn((s) => !s);
      setAnnounce(snapOn ? 'Snapping off' : 'Snapping on');
    },
    playPause: () => (player.playing ? player.pause() : player.play()),
    toggleKeys: () => setShowKeys((s) => !s),
    chooseTool,
  };

  function onKeyDown(e: KeyboardEvent<HTMLDivElement>) {
    const el = e.target as HTMLElement;
    // Typing in a field, or anything inside an open dialog (Esc there closes the dialog), is not a shortcut.
    if (el.closest('input, select, textarea, [contenteditable="true"], dialog')) return;
    const action = matchShortcut(e);
    if (!action) return;
    // Backspace first takes back the last corner of a line being drawn; only then does it remove the pick.
    if (action === 'delete' && e.key === 'Backspace' && ctl.onKey('Backspace')) return e.preventDefault();
    // Enter on a focused button presses the button.
    if (el.tagName === 'BUTTON' && action === 'finish') return;
    e.preventDefault();
    runWorkbenchAction(action, commands, { shift: e.shiftKey });
  }

  const sizeText = formatSize(design.width, design.height, design.units, viewerUnits);
  const motifShown = tool === 'motif' && motif.motif?.ok ? motif.motif.lines : null;
  return (
    <div className="workbench flex flex-col gap-3" onKeyDown={onKeyDown}>
      <WorkbenchHeader designId={designId} title={doc.title} onTitle={doc.setTitle} sizeText={sizeText} status={doc.status} onSaveNow={doc.saveNow} onResolve={doc.resolveConflict} showKeys={showKeys} onToggleKeys={() => setShowKeys((s) => !s)} />
      {showKeys && <ShortcutList onClose={() => setShowKeys(false)} />}
      <p className="sr-only" role="status" aria-live="polite">{announce}</p>
      <div className="grid gap-3 lg:grid-cols-[11rem_minmax(0,1fr)_20rem]">
        <aside className="flex flex-col gap-3">
          <Toolbar tool={tool} onTool={chooseTool} />
          {tool === 'ends' && ctl.progress.kind === 'ends' && <EndsPanel next={ctl.progress.next} onNext={ctl.chooseEndsStep} dispatch={dispatch} />}
        </aside>
        <div className="flex min-w-0 flex-col gap-2">
          <CanvasBar history={history} selection={ctl.selection} edits={edits} hasGuides={guides.length > 0} onClearGuides={() => setGuides([])} snapOn={snapOn} onSnap={setSnapOn} showGrid={showGrid} onGrid={setShowGrid} viewport={vp} zoomPct={Math.round(zoomOf(vp.view, design.units) * 100)} />
          <BlockCanvas
            boxRef={stageBox}
            size={size}
            design={design}
            viewerUnits={viewerUnits}
            viewport={vp}
            theme={theme}
            showGrid={showGrid}
            controller={ctl}
            patch={tool === 'motif' ? motif.patch : null}
            showOwnOrder={tool === 'order'}
            check={check.check}
            strokes={shownStrokes}
            needle={player.needle}
            preview={motifShown ?? joinPreview ?? ctl.preview}
            guides={guides}
          />
          <p className="text-sm text-indigo-ink" data-testid="tool-hint" aria-live="polite">{notice ?? toolHint(tool, ctl.progress)}</p>
          <p className="text-xs text-denim-700">
            Wheel or two fingers: move · Ctrl+wheel or pinch: zoom · {snapOn ? 'Snapping to grid, seam ends, crossings, midpoints and guides' : 'Snapping off'} · Press <kbd>?</kbd> for all keys.
          </p>
        </div>
        <SidePanels
          designId={designId}
          design={design}
          doc={doc}
          viewerUnits={viewerUnits}
          unitPair={unitPair}
          dispatch={dispatch}
          motif={tool === 'motif' ? motif : null}
          check={check}
          shownJoin={shownJoin}
          onShowJoin={setShownJoin}
          routes={routes}
          player={player}
          onClearOwn={() => {
            ctl.clearOwnOrder();
            dispatch({ kind: 'setRoute', route: null });
          }}
        />
      </div>
    </div>
  );
}
