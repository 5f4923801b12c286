import type { Selection } from '@shared/editor/selectTool.ts';
import type { EditHistory } from './useEditHistory.ts';
import type { SelectionEdits } from './selectionEdits.ts';
import type { ViewportControl } from './useViewportControl.ts';

export interface CanvasBarProps {
  readonly history: EditHistory;
  readonly selection: Selection | null;
  readonly edits: SelectionEdits;
  readonly hasGuides: boolean;
  readonly onClearGuides: () => void;
  readonly snapOn: boolean;
  readonly onSnap: (on: boolean) => void;
  readonly showGrid: boolean;
  readonly onGrid: (on: boolean) => void;
  readonly viewport: ViewportControl;
  /** Zoom in percent of true size. */
  readonly zoomPct: number;
}

/** The bar above the canvas: undo/redo, edits of the pick, guides, snapping, grid and zoom. */
export function CanvasBar({ history, selection, edits, hasGuides, onClearGuides, snapOn, onSnap, showGrid, onGrid, viewport: vp, zoomPct }: CanvasBarProps) {
  return (
    <div className="flex flex-wrap items-center gap-2 text-sm" role="toolbar" aria-label="Canvas">
      <button type="button" onClick={history.undo} disabled={!history.canUndo} className="rounded border px-2 py-1 disabled:opacity-40" aria-keyshortcuts="Control+Z">Undo</button>
      <button type="button" onClick={history.redo} disabled={!history.canRedo} className="rounded border px-2 py-1 disabled:opacity-40" aria-keyshortcuts="Control+Shift+Z">Redo</button>
      <button type="button" onClick={edits.remove} disabled={!selection} className="rounded border px-2 py-1 disabled:opacity-40">Remove</button>
      <button type="button" onClick={edits.split} disabled={selection?.indices.length !== 1} className="rounded border px-2 py-1 disabled:opacity-40">Split</button>
      <button type="button" onClick={edits.join} disabled={selection?.indices.length !== 2} className="rounded border px-2 py-1 disabled:opacity-40">Join</button>
      <button type="button" onClick={edits.addGuide} disabled={!selection || selection.indices.length > 2} className="rounded border px-2 py-1 disabled:opacity-40" title="Two picked lines: the line halfway between. One picked line: its extension across the block.">Guide</button>
      {hasGuides && <button type="button" onClick={onClearGuides} className="rounded border px-2 py-1">Clear guides</button>}
      <label className="flex items-center gap-1"><input type="checkbox" checked={snapOn} onChange={(e) => onSnap(e.target.checked)} /> Snap</label>
      <label className="flex items-center gap-1"><input type="checkbox" checked={showGrid} onChange={(e) => onGrid(e.target.checked)} /> Grid</label>
      <span className="ml-auto flex items-center gap-1">
        <button type="button" onClick={vp.zoomOut} className="rounded border px-2 py-1" aria-label="Zoom out">−</button>
        <span className="w-14 text-center tabular-nums" aria-label="Zoom">{zoomPct}%</span>
        <button type="button" onClick={vp.zoomIn} className="rounded border px-2 py-1" aria-label="Zoom in">+</button>
        <button type="button" onClick={vp.fit} className="rounded border px-2 py-1">Fit</button>
        <button type="button" onClick={vp.trueSize} className="rounded border px-2 py-1">True size</button>
      </span>
    </div>
  );
}
