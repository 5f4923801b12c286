import type Konva from 'konva';
import { useRef } from 'react';
import { Stage } from 'react-konva';
import type { Point } from '@shared/geometry/point.ts';
import type { Units } from '@shared/design/design.schema.ts';
import { panBy, pinchViewport, toWorld, zoomAt, type Viewport } from '../viewport.ts';

/** A pointer event on the canvas, already in design units; tools consume these. */
export interface CanvasPointer {
  readonly type: 'down' | 'move' | 'up' | 'cancel';
  readonly point: Point;
  readonly shift: boolean;
  readonly alt: boolean;
}

export interface EditorStageProps {
  readonly width: number;
  readonly height: number;
  readonly units: Units;
  readonly view: Viewport;
  readonly onViewChange: (view: Viewport) => void;
  readonly onPointer: (e: CanvasPointer) => void;
  /** Finishes a corner line or curve; optional for read-only canvases. */
  readonly onDoubleClick?: (point: Point) => void;
  /** CSS cursor over the canvas (the tool decides). */
  readonly cursor: string;
  readonly children: React.ReactNode;
}

/**
 * The Konva stage: turns wheel, trackpad pinch (ctrl+wheel), two-finger touch and pointer input into
 * viewport changes and design-space pointer events. Holds no design state; layers are its children.
 */
export function EditorStage({ width, height, units, view, onViewChange, onPointer, onDoubleClick, cursor, children }: EditorStageProps) {
  const touches = useRef(new Map<number, Point>());
  const pinchFrom = useRef<[Point, Point] | null>(null);
  const viewRef = useRef(view);
  viewRef.current = view;

  function screenPoint(e: Konva.KonvaEventObject<PointerEvent | WheelEvent>): Point {
    const p = e.target.getStage()?.getPointerPosition();
    return p ? [p.x, p.y] : [0, 0];
  }

  function emit(type: CanvasPointer['type'], e: Konva.KonvaEventObject<PointerEvent>) {
    onPointer({ type, point: toWorld(viewRef.current, screenPoint(e)), shift: e.evt.shiftKey, alt: e.evt.altKey });
  }

  function onWheel(e: Konva.KonvaEventObject<WheelEvent>) {
    e.evt.preventDefault();
    const { deltaX, deltaY, ctrlKey, metaKey, deltaMode } = e.evt;
    const line = deltaMode === 1 ? 16 : 1;
    if (ctrlKey || metaKey) {
      // Trackpad pinch arrives as ctrl+wheel with small deltas; a mouse wheel with ctrl as ±100.
      const factor = Math.exp((-deltaY * line) / 300);
      onViewChange(zoomAt(viewRef.current, factor, screenPoint(e), units));
    } else if (e.evt.shiftKey && deltaX === 0) {
      onViewChange(panBy(viewRef.current, -deltaY * line, 0));
    } else {
      onViewChange(panBy(viewRef.current, -deltaX * line, -deltaY * line));
    }
  }

  function onPointerDown(e: Konva.KonvaEventObject<PointerEvent>) {
    if (e.evt.pointerType === 'touch') {
      touches.current.set(e.evt.pointerId, [e.evt.offsetX, e.evt.offsetY]);
      if (touches.current.size === 2) {
        pinchFrom.current = [...touches.current.values()] as [Point, Point];
        onPointer({ type: 'cancel', point: [0, 0], shift: false, alt: false });
        return;
      }
    }
    if (e.evt.button === 1) return; // middle button: reserved for panning (below)
    (e.evt.target as Element | null)?.setPointerCapture?.(e.evt.pointerId);
    emit('down', e);
  }

  function onPointerMove(e: Konva.KonvaEventObject<PointerEvent>) {
    if (e.evt.pointerType === 'touch' && touches.current.has(e.evt.pointerId)) {
      touches.current.set(e.evt.pointerId, [e.evt.offsetX, e.evt.offsetY]);
      if (touches.current.size === 2 && pinchFrom.current) {
        const to = [...touches.current.values()] as [Point, Point];
        onViewChange(pinchViewport(viewRef.current, pinchFrom.current, to, units));
        pinchFrom.current = to;
        return;
      }
    }
    if (e.evt.buttons === 4) {
      onViewChange(panBy(viewRef.current, e.evt.movementX, e.evt.movementY));
      return;
    }
    emit('move', e);
  }

  function onPointerUp(e: Konva.KonvaEventObject<PointerEvent>) {
    if (e.evt.pointerType === 'touch') {
      touches.current.delete(e.evt.pointerId);
      if (pinchFrom.current) {
        if (touches.current.size === 0) pinchFrom.current = null;
        return;
      }
    }
    emit('up', e);
  }

  return (
    <Stage
      width={width}
      height={height}
      onWheel={onWheel}
      onPointerDown={onPointerDown}
      onPointerMove={onPointerMove}
      onPointerUp={onPointerUp}
      onDblClick={(e) => onDoubleClick?.(toWorld(viewRef.current, screenPoint(e as Konva.KonvaEventObject<PointerEvent>)))}
      onPointerCancel={() => onPointer({ type: 'cancel', point: [0, 0], shift: false, alt: false })}
      style={{ cursor, touchAction: 'none' }}
    >
      {children}
    </Stage>
  );
}

