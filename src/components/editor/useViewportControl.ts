import { useCallback, useEffect, useRef, useState } from 'react';
import type { Units } from '../../../shared/design/design.schema.ts';
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
  const fitted = useRef(false);
  const fitView = useCallback(() => fitBlockViewport(width, height, stageWidth, stageHeight), [width, height, stageWidth, stageHeight]);

  useEffect(() => {
    if (fitted.current || stageWidth <= 0 || stageHeight <= 0) return;
    fitted.current = true;
    setView(fitView());
  }, [fitView, stageWidth, stageHeight]);

  const centre = [stageWidth / 2, stageHeight / 2] as const;
  return {
    view,
    setView,
    fit: () => setView(fitView()),
    zoomIn: () => setView((v) => zoomAt(v, ZOOM_STEP, centre, units)),
    zoomOut: () => setView((v) => zoomAt(v, 1 / ZOOM_STEP, centre, units)),
    trueSize: () => setView((v) => zoomTo(v, 1, centre, units)),
    pan: (dx, dy, far) => setView((v) => panBy(v, dx * PAN_STEP_PX * (far ? 4 : 1), dy * PAN_STEP_PX * (far ? 4 : 1))),
  };
}
