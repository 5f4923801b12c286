import { useCallback, useEffect, useRef, useState } from 'react';
import type { Units } from '@shared/design/design.schema.ts';
import { fitBlockViewport, panBy, zoomAt, zoomTo, ZOOM_STEP, type Viewport } from './viewport.ts';

/** Keyboard pan step in CSS px (Shift: four times as far). */
const PAN_STEP_PX = 48;

export interface ViewportControl {
  readonly view: Viewport;
  setView(view: Viewport): void;
  fit(): void;
  zoomIn(): void;
  zoomOut(): void;
  trueSize(): void;
  pan(dx: number, dy: number, far: boolean): void;
}

/** The viewport of a block in a stage: fitted once the stage has a size, then zoomed and panned by the quilter. */
export function useViewportControl(width: number, height: number, stageWidth: number, stageHeight: number, units: Units): ViewportControl {
  const [view, setView] = useState<Viewport>({ scale: 1, x: 0, y: 0 });
  // Until the quilter zooms or pans, the block follows the stage size (window resize, tablet rotation).
  const moved = useRef(false);
  const fitView = useCallback(() => fitBlockViewport(width, height, stageWidth, stageHeight), [width, height, stageWidth, stageHeight]);

  useEffect(() => {
    if (moved.current || stageWidth <= 0 || stageHeight <= 0) return;
    setView(fitView());
  }, [fitView, stageWidth, stageHeight]);

  const change = (next: Viewport | ((v: Viewport) => Viewport)) => {
    moved.current = true;
    setView(next);
  };

  const centre = [stageWidth / 2, stageHeight / 2] as const;
  return {
    view,
    setView: change,
    fit: () => {
      moved.current = false;
      setView(fitView());
    },
    zoomIn: () => change((v) => zoomAt(v, ZOOM_STEP, centre, units)),
    zoomOut: () => change((v) => zoomAt(v, 1 / ZOOM_STEP, centre, units)),
    trueSize: () => change((v) => zoomTo(v, 1, centre, units)),
    pan: (dx, dy, far) => change((v) => panBy(v, dx * PAN_STEP_PX * (far ? 4 : 1), dy * PAN_STEP_PX * (far ? 4 : 1))),
  };
}
