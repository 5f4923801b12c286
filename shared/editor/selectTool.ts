import { pointSegmentDistance } from '../geometry/distance.ts';
import type { Point, Polyline } from '../geometry/point.ts';
import type { LineTarget } from '../design/commands.ts';
import type { Design } from '../design/design.schema.ts';
import type { ToolEvent, ToolStep } from './tool.types.ts';

/** Select/move tool state: the selected line indices (view state, never in history) and a drag in progress. */
export interface SelectToolState {
  readonly target: LineTarget;
  /** Hit radius in design units (the caller converts its pixel tolerance at the current zoom). */
  readonly hitRadius: number;
  readonly selection: readonly number[];
  readonly drag: { readonly from: Point; readonly to: Point } | null;
}

export function createSelectTool(target: LineTarget, hitRadius: number): SelectToolState {
  return { target, hitRadius, selection: [], drag: null };
}

/**
 * The index of the line nearest to p within `radius` (design units), or null. Ties go to the line drawn
 * last (it is on top).
 */
export function hitTestLine(lines: readonly Polyline[], p: Point, radius: number): number | null {
  let best: number | null = null;
  let bestDistance = radius;
  lines.forEach((line, index) => {
    for (let i = 1; i < line.length; i++) {
      const d = pointSegmentDistance(p, line[i - 1]!, line[i]!);
      if (d <= bestDistance) [best, bestDistance] = [index, d];
    }
  });
  return best;
}

/**
 * One step of select/move: pressing on a line selects it (keeping a multi-selection it already belongs
 * to) and starts a drag; pressing on empty canvas clears the selection; dragging previews the moved lines;
 * releasing after a real move commits one moveLines command. Delete/Backspace deletes the selection;
 * Escape cancels a drag, or else clears the selection.
 */
export function stepSelectTool(state: SelectToolState, event: ToolEvent, design: Design): ToolStep<SelectToolState> {
  const lines = design[state.target];
  switch (event.kind) {
    case 'pointerDown': {
      const hit = hitTestLine(lines, event.point, state.hitRadius);
      if (hit === null) return { state: { ...state, selection: [], drag: null } };
      const selection = state.selection.includes(hit) ? state.selection : [hit];
      return { state: { ...state, selection, drag: { from: event.point, to: event.point } } };
    }
    case 'pointerMove': {
      if (!state.drag) return { state };
      const next = { ...state, drag: { from: state.drag.from, to: event.point } };
      return { state: next, preview: movedPreview(lines, next) };
    }
    case 'pointerUp': {
      if (!state.drag) return { state };
      const dx = event.point[0] - state.drag.from[0];
      const dy = event.point[1] - state.drag.from[1];
      const next = { ...state, drag: null };
      if (dx === 0 && dy === 0) return { state: next };
      return { state: next, command: { kind: 'moveLines', target: state.target, indices: state.selection, dx, dy } };
    }
    case 'doubleClick':
      return { state };
    case 'key':
      if (event.key === 'Escape') return { state: state.drag ? { ...state, drag: null } : { ...state, selection: [] } };
      if ((event.key === 'Delete' || event.key === 'Backspace') && state.selection.length > 0 && !state.drag) {
        return { state: { ...state, selection: [] }, command: { kind: 'deleteLines', target: state.target, indices: state.selection } };
      }
      return { state };
  }
}

function movedPreview(lines: readonly Polyline[], state: SelectToolState): Polyline[] {
  if (!state.drag) return [];
  const dx = state.drag.to[0] - state.drag.from[0];
  const dy = state.drag.to[1] - state.drag.from[1];
  return state.selection.map((i) => lines[i]!.map(([x, y]) => [x + dx, y + dy] as const));
}
