import { useCallback, useMemo, useRef, useState } from 'react';
import type { DesignCommand, LineTarget } from '@shared/design/commands.ts';
import type { Design } from '@shared/design/design.schema.ts';
import type { Point, Polyline } from '@shared/geometry/point.ts';
import { createDrawTool, stepDrawTool, type DrawMode, type DrawToolState } from '@shared/editor/drawTools.ts';
import { projectOntoGuide, type Guide } from '@shared/editor/guides.ts';
import { collectSnapTargets, snapPoint, type SnapKind } from '@shared/editor/snap.ts';
import { orientOwnRoute, pickLine } from '@shared/editor/pickLine.ts';
import { createSelectTool, stepSelectTool, type Selection, type SelectToolState } from '@shared/editor/selectTool.ts';
import type { ToolEvent } from '@shared/editor/tool.types.ts';
import type { CanvasPointer } from './canvas/EditorStage.tsx';
import type { ToolId } from './Toolbar.tsx';
import { SNAP_RADIUS_PX, snapGridPitch } from './tools/snapSettings.ts';

export type { Selection };

export interface ToolController {
  readonly preview: readonly Polyline[];
  readonly snapped: { readonly point: Point; readonly kind: SnapKind } | null;
  readonly selection: Selection | null;
  readonly ownOrder: readonly number[];
  readonly cursor: string;
  onPointer(e: CanvasPointer): void;
  onDoubleClick(point: Point): void;
  /** Enter / Escape / Backspace for the tool in use; true when the tool used the key. */
  onKey(key: 'Enter' | 'Escape' | 'Backspace'): boolean;
  setSelection(s: Selection | null): void;
  clearOwnOrder(): void;
}

export interface ToolOptions {
  readonly tool: ToolId;
  readonly design: Design | null;
  readonly scale: number;
  readonly snapOn: boolean;
  readonly guides: readonly Guide[];
  /** Which end the start/end tool places. */
  readonly endsMode: 'start' | 'end';
  readonly dispatch: (cmd: DesignCommand) => void;
  /** Motif tool: a click picks the patch under the point. */
  readonly onPickPatch: (p: Point) => void;
}

function drawModeOf(tool: ToolId, scale: number): DrawMode | null {
  switch (tool) {
    case 'ruler':
    case 'seam':
      return { kind: 'ruler' };
    case 'polyline':
      return { kind: 'polyline' };
    case 'curve':
      return { kind: 'curve', samplesPerSpan: 16 };
    case 'freehand':
      // Simplify to 1.5 screen px: wobble of the hand, not of the design.
      return { kind: 'freehand', tolerance: 1.5 / scale, smoothingPasses: 2 };
    default:
      return null;
  }
}

/**
 * Turns canvas pointer events into tool steps: drawing tools run the shared state machines
 * (shared/editor/drawTools.ts) on snapped points, pick-and-move runs shared/editor/selectTool.ts; the
 * start/end and stitching-order tools (one command per click) are handled here. Every finished gesture is exactly one command.
 */
export function useToolController(o: ToolOptions): ToolController {
  const { tool, design, scale, snapOn, guides, endsMode, dispatch, onPickPatch } = o;
  const [preview, setPreview] = useState<readonly Polyline[]>([]);
  const [snapped, setSnapped] = useState<ToolController['snapped']>(null);
  const [selection, setSelectionState] = useState<Selection | null>(null);
  const [ownOrder, setOwnOrder] = useState<readonly number[]>([]);
  const draw = useRef<DrawToolState | null>(null);
  const select = useRef<SelectToolState>(createSelectTool());
  const targets = useMemo(() => (design && snapOn ? collectSnapTargets(design) : []), [design, snapOn]);
  const mode = drawModeOf(tool, scale);
  const lineTarget: LineTarget = tool === 'seam' ? 'seams' : 'lines';
  if (mode === null) draw.current = null;
  else if (!draw.current || draw.current.mode.kind !== mode.kind || draw.current.target !== lineTarget) draw.current = createDrawTool(lineTarget, mode);

  const snap = useCallback((p: Point): { point: Point; kind: SnapKind } => {
    if (!design || !snapOn) return { point: p, kind: 'none' };
    const radius = SNAP_RADIUS_PX / scale;
    const hit = snapPoint(p, targets, { radius });
    if (hit.kind !== 'none') return hit;
    for (const g of guides) {
      const q = projectOntoGuide(p, g);
      if (Math.hypot(q[0] - p[0], q[1] - p[1]) <= radius) return { point: q, kind: 'midpoint' };
    }
    return snapPoint(p, [], { radius, gridPitch: snapGridPitch(design.units) });
  }, [design, snapOn, scale, targets, guides]);

  const runDraw = useCallback((event: ToolEvent) => {
    const state = draw.current;
    if (!state) return;
    const step = stepDrawTool(state, event);
    draw.current = step.state;
    setPreview(step.preview ?? []);
    if (step.command) dispatch(step.command);
  }, [dispatch]);

  const runSelect = useCallback((event: ToolEvent) => {
    if (!design) return;
    const step = stepSelectTool(select.current, event, design, SNAP_RADIUS_PX / scale);
    select.current = step.state;
    setSelectionState(step.state.selection);
    setPreview(step.preview ?? []);
    if (step.command) dispatch(step.command);
  }, [design, scale, dispatch]);

  const setSelection = useCallback((next: Selection | null) => {
    select.current = { selection: next, drag: null };
    setSelectionState(next);
  }, []);

  const onPointer = useCallback((e: CanvasPointer) => {
    if (!design) return;
    if (e.type === 'cancel') {
      runDraw({ kind: 'key', key: 'Escape' });
      select.current = { ...select.current, drag: null };
      setPreview([]);
      return;
    }
    const s = snap(e.point);
    setSnapped(s.kind === 'none' ? null : s);
    if (draw.current) {
      const kind = e.type === 'down' ? 'pointerDown' : e.type === 'move' ? 'pointerMove' : 'pointerUp';
      runDraw({ kind, point: s.point });
      return;
    }
    const radius = SNAP_RADIUS_PX / scale;
    switch (tool) {
      case 'select':
        if (e.type === 'down') runSelect({ kind: 'pointerDown', point: s.point, raw: e.point, shift: e.shift });
        else runSelect({ kind: e.type === 'move' ? 'pointerMove' : 'pointerUp', point: s.point });
        return;
      case 'ends':
        if (e.type === 'down') dispatch(endsMode === 'start' ? { kind: 'setStart', point: s.point } : { kind: 'setEnd', point: s.point });
        return;
      case 'order':
        if (e.type === 'down') {
          const hit = pickLine(design, e.point, radius, ['lines']);
          if (!hit || ownOrder.includes(hit.index)) return;
          const order = [...ownOrder, hit.index];
          setOwnOrder(order);
          dispatch({ kind: 'setRoute', route: orientOwnRoute(order.map((i) => design.lines[i]!)) });
        }
        return;
      case 'motif':
        if (e.type === 'down') onPickPatch(e.point);
        return;
      default:
        return;
    }
  }, [design, snap, runDraw, runSelect, scale, tool, dispatch, endsMode, ownOrder, onPickPatch]);

  const onKey = useCallback((key: 'Enter' | 'Escape' | 'Backspace'): boolean => {
    if (draw.current && draw.current.points.length > 0) {
      runDraw({ kind: 'key', key });
      return true;
    }
    if (key === 'Escape' && select.current.drag) {
      runSelect({ kind: 'key', key });
      return true;
    }
    return false;
  }, [runDraw, runSelect]);

  const onDoubleClick = useCallback((point: Point) => {
    if (draw.current) runDraw({ kind: 'doubleClick', point: snap(point).point });
  }, [runDraw, snap]);

  const cursor = tool === 'select' ? 'default' : tool === 'motif' || tool === 'order' ? 'pointer' : 'crosshair';
  return {
    preview,
    snapped,
    selection,
    ownOrder,
    cursor,
    onPointer,
    onDoubleClick,
    onKey,
    setSelection,
    clearOwnOrder: useCallback(() => setOwnOrder([]), []),
  };
}
