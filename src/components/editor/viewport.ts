import type { Point } from '@shared/geometry/point.ts';
import { inchesPerUnit, type Units } from '@shared/design/design.schema.ts';

/**
 * How the block sits on screen: `scale` CSS pixels per design unit, and the screen position (CSS px)
 * of the design origin. screen = world · scale + offset. View state only: never saved, never undone.
 */
export interface Viewport {
  readonly scale: number;
  readonly x: number;
  readonly y: number;
}

/** CSS reference pixels per inch (CSS Values and Units Level 3, §5.2: 1in = 96px). */
export const CSS_PX_PER_INCH = 96;

/** Zoom limits as a fraction of true size (1 = the block at its real size on a 96 dpi screen). */
export const ZOOM_LIMITS = { min: 0.05, max: 16 } as const;

/** One keyboard or wheel notch of zoom. */
export const ZOOM_STEP = 1.25;

/** Pixels per design unit at true size. */
export function trueScale(units: Units): number {
  return CSS_PX_PER_INCH * inchesPerUnit(units);
}

/** The zoom as a fraction of true size (1 = 100 %). */
export function zoomOf(view: Viewport, units: Units): number {
  return view.scale / trueScale(units);
}

export function toScreen(view: Viewport, [x, y]: Point): Point {
  return [x * view.scale + view.x, y * view.scale + view.y];
}

export function toWorld(view: Viewport, [x, y]: Point): Point {
  return [(x - view.x) / view.scale, (y - view.y) / view.scale];
}

/**
 * The viewport that shows the whole block (`width` × `height` design units) centred in a stage of
 * `stageWidth` × `stageHeight` CSS px with `margin` px left on every side.
 */
export function fitViewport(width: number, height: number, stageWidth: number, stageHeight: number, margin = 32): Viewport {
  const availW = Math.max(1, stageWidth - 2 * margin);
  const availH = Math.max(1, stageHeight - 2 * margin);
  const scale = Math.min(availW / width, availH / height);
  return { scale, x: (stageWidth - width * scale) / 2, y: (stageHeight - height * scale) / 2 };
}

/**
 * Zooms by `factor` keeping the design point under `anchor` (screen px) where it is, as a pointer
 * zoom should. The resulting zoom is clamped to ZOOM_LIMITS of true size.
 */
export function zoomAt(view: Viewport, factor: number, anchor: Point, units: Units): Viewport {
  const base = trueScale(units);
  const scale = Math.min(ZOOM_LIMITS.max * base, Math.max(ZOOM_LIMITS.min * base, view.scale * factor));
  const k = scale / view.scale;
  return { scale, x: anchor[0] - (anchor[0] - view.x) * k, y: anchor[1] - (anchor[1] - view.y) * k };
}

/** Thickness of the rulers along the top and left edges of the stage, in CSS px. */
export const RULER_PX = 22;

/** The fit-to-block viewport of the workbench: the block centred in the stage area right of and below the rulers. */
export function fitBlockViewport(width: number, height: number, stageWidth: number, stageHeight: number): Viewport {
  return panBy(fitViewport(width, height, stageWidth - RULER_PX, stageHeight - RULER_PX, 24), RULER_PX, RULER_PX);
}

/** The viewport at a given zoom (fraction of true size) around the stage centre. */
export function zoomTo(view: Viewport, zoom: number, centre: Point, units: Units): Viewport {
  return zoomAt(view, (zoom * trueScale(units)) / view.scale, centre, units);
}

export function panBy(view: Viewport, dx: number, dy: number): Viewport {
  return { scale: view.scale, x: view.x + dx, y: view.y + dy };
}

/**
 * Two-finger gesture: the viewport that keeps the design points first under `from` (two touches)
 * under `to`. The zoom follows the change of finger distance; the pan follows their midpoint.
 */
export function pinchViewport(view: Viewport, from: readonly [Point, Point], to: readonly [Point, Point], units: Units): Viewport {
  const d0 = Math.hypot(from[1][0] - from[0][0], from[1][1] - from[0][1]);
  const d1 = Math.hypot(to[1][0] - to[0][0], to[1][1] - to[0][1]);
  const m0: Point = [(from[0][0] + from[1][0]) / 2, (from[0][1] + from[1][1]) / 2];
  const m1: Point = [(to[0][0] + to[1][0]) / 2, (to[0][1] + to[1][1]) / 2];
  const zoomed = d0 > 0 ? zoomAt(view, d1 / d0, m0, units) : view;
  return panBy(zoomed, m1[0] - m0[0], m1[1] - m0[1]);
}

/** The rectangle of design space visible in the stage: [minX, minY, maxX, maxY] in design units. */
export function visibleWorld(view: Viewport, stageWidth: number, stageHeight: number): readonly [number, number, number, number] {
  const [x0, y0] = toWorld(view, [0, 0]);
  const [x1, y1] = toWorld(view, [stageWidth, stageHeight]);
  return [x0, y0, x1, y1];
}
