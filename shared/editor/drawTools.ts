import type { Point, Polyline } from '../geometry/point.ts';
import type { LineTarget } from '../design/commands.ts';
import { simplifyPolyline } from './simplify.ts';
import { catmullRomCurve, chaikinSmooth } from './smooth.ts';
import type { ToolEvent, ToolStep } from './tool.types.ts';

/** How a drawing tool turns the points it gathered into a line. */
export type DrawMode =
  /** Ruler: click the start, click the end. */
  | { readonly kind: 'ruler' }
  /** Polyline: click each corner; double-click or Enter finishes. */
  | { readonly kind: 'polyline' }
  /** Smooth curve: click points the curve passes through; finished like a polyline, drawn as Catmull–Rom. */
  | { readonly kind: 'curve'; readonly samplesPerSpan: number }
  /** Freehand: press, drag, release; the stroke is simplified (RDP, tolerance in design units), then smoothed. */
  | { readonly kind: 'freehand'; readonly tolerance: number; readonly smoothingPasses: number };

/** State of a drawing tool: which list it draws into, its mode, and the points placed so far. */
export interface DrawToolState {
  readonly target: LineTarget;
  readonly mode: DrawMode;
  readonly points: readonly Point[];
  /** Where the pointer is, for the rubber-band preview. */
  readonly hover: Point | null;
  /** Freehand only: whether the pointer is down. */
  readonly dragging: boolean;
}

export function createDrawTool(target: LineTarget, mode: DrawMode): DrawToolState {
  return { target, mode, points: [], hover: null, dragging: false };
}

/**
 * One step of a drawing tool: idle (no points) → placing points → a command that adds the finished line.
 * Escape drops the gesture; Backspace removes the last placed point. A line that would not have two
 * distinct points is dropped rather than committed.
 */
export function stepDrawTool(state: DrawToolState, event: ToolEvent): ToolStep<DrawToolState> {
  const reset: DrawToolState = { ...state, points: [], dragging: false };
  if (event.kind === 'key' && event.key === 'Escape') return { state: reset };
  if (event.kind === 'key' && event.key === 'Backspace') return withPreview({ ...state, points: state.points.slice(0, -1) });
  switch (state.mode.kind) {
    case 'ruler':
      if (event.kind === 'pointerDown') {
        if (state.points.length === 0) return withPreview({ ...state, points: [event.point], hover: event.point });
        return finish(reset, state.target, [state.points[0]!, event.point]);
      }
      break;
    case 'polyline':
    case 'curve':
      if (event.kind === 'pointerDown') return withPreview({ ...state, points: appendDistinct(state.points, event.point), hover: event.point });
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
  const placed = state.mode.kind === 'freehand' ? state.points : shape(state.mode, state.points);
  const rubber = state.hover && state.mode.kind !== 'freehand' ? [...placed, state.hover] : placed;
  return { state, preview: rubber.length >= 2 ? [rubber] : [] };
}

function finish(reset: DrawToolState, target: LineTarget, line: Polyline): ToolStep<DrawToolState> {
  const distinct = line.some((p) => p[0] !== line[0]![0] || p[1] !== line[0]![1]);
  if (line.length < 2 || !distinct) return { state: reset };
  return { state: reset, command: { kind: 'addLines', target, lines: [line] } };
}

function appendDistinct(points: readonly Point[], p: Point): Point[] {
  const last = points[points.length - 1];
  return last && last[0] === p[0] && last[1] === p[1] ? [...points] : [...points, p];
}
