import type { Point, Polyline } from '../geometry/point.ts';
import type { LineTarget } from '../design/commands.ts';
import { simplifyPolyline } from './simplify.ts';
import { catmullRomCurve, chaikinSmooth } from './smooth.ts';
import type { ToolEvent, ToolStep } from './tool.types.ts';

/** How a drawing tool turns the points it gathered into a line. */
export type DrawMode =
  /**
   * Ruler: press at the start and drag to the end, or click the start and then click the end. A release closer
   * than `clickSlop` (design units; the caller passes a few screen pixels) to the press counts as a click, so a
   * shaky click never makes a stub line.
   */
  | { readonly kind: 'ruler'; readonly clickSlop: number }
  /**
   * Polyline: click each corner; double-click or Enter finishes. A press within `clickSlop` of the last corner
   * adds none, and only a double-click whose second press was such a repeat finishes: the canvas reports any two
   * quick clicks as a double-click, wherever they land.
   */
  | { readonly kind: 'polyline'; readonly clickSlop: number }
  /** Smooth curve: click points the curve passes through; finished like a polyline, drawn as Catmull–Rom. */
  | { readonly kind: 'curve'; readonly samplesPerSpan: number; readonly clickSlop: number }
  /** Freehand: press, drag, release; the stroke is simplified (RDP, tolerance in design units), then smoothed. */
  | { readonly kind: 'freehand'; readonly tolerance: number; readonly smoothingPasses: number };

/** State of a drawing tool: which list it draws into, its mode, and the points placed so far. */
export interface DrawToolState {
  readonly target: LineTarget;
  readonly mode: DrawMode;
  readonly points: readonly Point[];
  /** Where the pointer is, for the rubber-band preview. */
  readonly hover: Point | null;
  /** Whether the pointer is still down since the press that placed the first point (ruler and freehand). */
  readonly dragging: boolean;
  /** Corner line and curve: the last press landed on the last point placed (the second click of a double-click). */
  readonly repeatedPress: boolean;
}

export function createDrawTool(target: LineTarget, mode: DrawMode): DrawToolState {
  return { target, mode, points: [], hover: null, dragging: false, repeatedPress: false };
}

/** Whether a line is in progress (at least one point placed): Escape then drops it. */
export function isDrawing(state: DrawToolState): boolean {
  return state.points.length > 0;
}

/**
 * One step of a drawing tool: idle (no points) → placing points → a command that adds the finished line.
 * Escape drops the gesture; Backspace removes the last placed point. A line that would not have two
 * distinct points is dropped rather than committed. While points are placed, the preview is the line as it
 * would be if the pointer were the next point (the rubber band; for curves the curve itself bends to it).
 */
export function stepDrawTool(state: DrawToolState, event: ToolEvent): ToolStep<DrawToolState> {
  const reset: DrawToolState = { ...state, points: [], dragging: false, repeatedPress: false };
  if (event.kind === 'key' && event.key === 'Escape') return { state: reset };
  if (event.kind === 'key' && event.key === 'Backspace') return withPreview({ ...state, points: state.points.slice(0, -1) });
  switch (state.mode.kind) {
    case 'ruler': {
      const start = state.points[0];
      if (event.kind === 'pointerDown') {
        if (!start) return withPreview({ ...state, points: [event.point], hover: event.point, dragging: true });
        return finish(reset, state.target, [start, event.point]);
      }
      if (event.kind === 'pointerUp' && start && state.dragging) {
        const dragged = distance(event.point, start) >= state.mode.clickSlop;
        if (dragged) return finish(reset, state.target, [start, event.point]);
        // A click: the line waits for its end click, still following the pointer.
        return withPreview({ ...state, dragging: false, hover: event.point });
      }
      break;
    }
    case 'polyline':
    case 'curve':
      if (event.kind === 'pointerDown') {
        if (isNearLast(state, event.point, state.mode.clickSlop)) return withPreview({ ...state, repeatedPress: true });
        return withPreview({ ...state, points: [...state.points, event.point], hover: event.point, repeatedPress: false });
      }
      if (event.kind === 'doubleClick' && !state.repeatedPress) break;
      if (event.kind === 'doubleClick' || (event.kind === 'key' && event.key === 'Enter')) {
        return finish(reset, state.target, shape(state.mode, state.points));
      }
      break;
    case 'freehand':
      if (event.kind === 'pointerDown') return withPreview({ ...state, points: [event.point], dragging: true, hover: event.point });
      if (event.kind === 'pointerMove' && state.dragging) return withPreview({ ...state, points: appendDistinct(state.points, event.point), hover: event.point });
      if (event.kind === 'pointerUp' && state.dragging) return finish(reset, state.target, shape(state.mode, appendDistinct(state.points, event.point)));
      break;
  }
  if (event.kind === 'pointerMove') return withPreview({ ...state, hover: event.point });
  return { state };
}

/** The line a mode makes from its placed points. */
function shape(mode: DrawMode, points: readonly Point[]): Polyline {
  switch (mode.kind) {
    case 'ruler':
    case 'polyline':
      return points;
    case 'curve':
      return catmullRomCurve(points, mode.samplesPerSpan);
    case 'freehand':
      return chaikinSmooth(simplifyPolyline(points, mode.tolerance), mode.smoothingPasses);
  }
}

function withPreview(state: DrawToolState): ToolStep<DrawToolState> {
  if (state.points.length === 0) return { state };
  if (state.mode.kind === 'freehand') return { state, preview: state.points.length >= 2 ? [state.points] : [] };
  const withPointer = state.hover ? appendDistinct(state.points, state.hover) : [...state.points];
  const line = state.mode.kind === 'ruler' ? withPointer.slice(0, 2) : shape(state.mode, withPointer);
  return { state, preview: line.length >= 2 ? [line] : [] };
}

function finish(reset: DrawToolState, target: LineTarget, line: Polyline): ToolStep<DrawToolState> {
  const distinct = line.some((p) => p[0] !== line[0]![0] || p[1] !== line[0]![1]);
  if (line.length < 2 || !distinct) return { state: reset };
  return { state: reset, command: { kind: 'addLines', target, lines: [line] } };
}

function distance(a: Point, b: Point): number {
  return Math.hypot(a[0] - b[0], a[1] - b[1]);
}

function isNearLast(state: DrawToolState, p: Point, slop: number): boolean {
  const last = state.points[state.points.length - 1];
  return last !== undefined && distance(last, p) <= slop;
}

function appendDistinct(points: readonly Point[], p: Point): Point[] {
  const last = points[points.length - 1];
  return last && last[0] === p[0] && last[1] === p[1] ? [...points] : [...points, p];
}
