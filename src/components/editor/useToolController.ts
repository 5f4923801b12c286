import { useCallback, useMemo, useRef, useState } from 'react';
import type { DesignCommand, LineTarget } from '@shared/design/commands.ts';
import type { Design } from '@shared/design/design.schema.ts';
import type { Point, Polyline } from '@shared/geometry/point.ts';
import { createDrawTool, isDrawing, stepDrawTool, type DrawMode, type DrawToolState } from '@shared/editor/drawTools.ts';
import { chooseEndsStep, createEndsTool, stepEndsTool, type EndsStep, type EndsToolState } from '@shared/editor/endsTool.ts';
import { projectOntoGuide, type Guide } from '@shared/editor/guides.ts';
import { collectSnapTargets, snapPoint, type SnapKind } from '@shared/editor/snap.ts';
import { orientOwnRoute, pickLine } from '@shared/editor/pickLine.ts';
import { createSelectTool, stepSelectTool, type Selection, type SelectToolState } from '@shared/editor/selectTool.ts';
import type { ToolEvent } from '@shared/editor/tool.types.ts';
import type { CanvasPointer } from './canvas/EditorStage.tsx';
import type { ToolId } from './Toolbar.tsx';
import type { ToolProgress } from './toolHints.ts';
import { SNAP_RADIUS_PX, snapGridPitch } from './tools/snapSettings.ts';

export type { Selection };

const NO_LINES: readonly Polyline[] = [];
/** How far (CSS px) a press may move and still be a click, and two clicks still a double-click. */
const CLICK_SLOP_PX = 4;

export interface ToolController {
  readonly preview: readonly Polyline[];
  readonly snapped: { readonly point: Point; readonly kind: SnapKind } | null;
  readonly selection: Selection | null;
  readonly ownOrder: readonly number[];
  readonly cursor: string;
  /** Where the tool is in its gesture, for the hint under the canvas. */
  readonly progress: ToolProgress;
  /** A word shown beside the pointer (the start-and-end tool names the end the next click sets), or null. */
  readonly pointerTag: { readonly point: Point; readonly text: string } | null;
  /** The start-and-end tool's step chosen in the side column. */
  chooseEndsStep(next: EndsStep): void;
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
  readonly dispatch: (cmd: DesignCommand) => void;
  /** Motif tool: a click picks the patch under the point. */
  readonly onPickPatch: (p: Point) => void;
}

function drawModeOf(tool: ToolId, scale: number): DrawMode | null {
  switch (tool) {
    case 'ruler':
    case 'seam':
      // A press released within the slop is a click (then a second click ends the line), not a drag.
      return { kind: 'ruler', clickSlop: CLICK_SLOP_PX / scale };
    case 'polyline':
      return { kind: 'polyline', clickSlop: CLICK_SLOP_PX / scale };
    case 'curve':
      return { kind: 'curve', samplesPerSpan: 16, clickSlop: CLICK_SLOP_PX / scale };
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
  const { tool, design, scale, snapOn, guides, dispatch, onPickPatch } = o;
  // The preview remembers the tool that drew it, so a line left half-drawn vanishes when the tool changes.
  const [previewOf, setPreviewOf] = useState<{ readonly tool: ToolId; readonly lines: readonly Polyline[] }>({ tool, lines: [] });
  const setPreview = useCallback((lines: readonly Polyline[]) => setPreviewOf({ tool, lines }), [tool]);
  const [snapped, setSnapped] = useState<ToolController['snapped']>(null);
  const [selection, setSelectionState] = useState<Selection | null>(null);
  const [ownOrder, setOwnOrder] = useState<readonly number[]>([]);
  const draw = useRef<DrawToolState | null>(null);
  const select = useRef<SelectToolState>(createSelectTool());
  const ends = useRef<EndsToolState | null>(null);
  const [, setEndsShown] = useState<EndsToolState | null>(null);
  const targets = useMemo(() => (design && snapOn ? collectSnapTargets(design) : []), [design, snapOn]);
  const mode = drawModeOf(tool, scale);
  const lineTarget: LineTarget = tool === 'seam' ? 'seams' : 'lines';
  if (tool !== 'ends') ends.current = null;
  else if (!ends.current) ends.current = createEndsTool();
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
  }, [dispatch, setPreview]);

  const runEnds = useCallback((event: ToolEvent) => {
    if (!ends.current) return;
    const step = stepEndsTool(ends.current, event);
    ends.current = step.state;
    setEndsShown(step.state);
    if (step.command) dispatch(step.command);
  }, [dispatch]);

  const runSelect = useCallback((event: ToolEvent) => {
    if (!design) return;
    const step = stepSelectTool(select.current, event, design, SNAP_RADIUS_PX / scale);
    select.current = step.state;
    setSelectionState(step.state.selection);
    setPreview(step.preview ?? []);
    if (step.command) dispatch(step.command);
  }, [design, scale, dispatch, setPreview]);

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
        runEnds({ kind: e.type === 'down' ? 'pointerDown' : e.type === 'move' ? 'pointerMove' : 'pointerUp', point: s.point });
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
  }, [design, snap, runDraw, runEnds, runSelect, setPreview, scale, tool, dispatch, ownOrder, onPickPatch]);

  const onKey = useCallback((key: 'Enter' | 'Escape' | 'Backspace'): boolean => {
    if (draw.current && isDrawing(draw.current)) {
      runDraw({ kind: 'key', key });
      return true;
    }
    if (key === 'Escape' && ends.current?.next === 'end') {
      runEnds({ kind: 'key', key });
      return true;
    }
    if (key === 'Escape' && select.current.drag) {
      runSelect({ kind: 'key', key });
      return true;
    }
    return false;
  }, [runDraw, runEnds, runSelect]);

  const onDoubleClick = useCallback((point: Point) => {
    if (draw.current) runDraw({ kind: 'doubleClick', point: snap(point).point });
  }, [runDraw, snap]);

  const chooseEnds = useCallback((next: EndsStep) => {
    if (!ends.current) return;
    ends.current = chooseEndsStep(ends.current, next);
    setEndsShown(ends.current);
  }, []);

  // Read from the refs during render: every step sets state, so the render after it sees the new step.
  const endsNow = ends.current;
  const progress: ToolProgress = endsNow ? { kind: 'ends', next: endsNow.next } : draw.current && isDrawing(draw.current) ? { kind: 'drawing' } : { kind: 'idle' };
  const pointerTag = endsNow?.hover ? { point: endsNow.hover, text: endsNow.next === 'start' ? 'Start' : 'Finish' } : null;
  const cursor = tool === 'select' ? 'default' : tool === 'motif' || tool === 'order' ? 'pointer' : 'crosshair';
  return {
    preview: previewOf.tool === tool ? previewOf.lines : NO_LINES,
    snapped,
    selection,
    ownOrder,
    cursor,
    progress,
    pointerTag,
    chooseEndsStep: chooseEnds,
    onPointer,
    onDoubleClick,
    onKey,
    setSelection,
    clearOwnOrder: useCallback(() => setOwnOrder([]), []),
  };
}
