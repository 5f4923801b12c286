import type { LineTarget } from '../design/commands.ts';
import type { Design } from '../design/design.schema.ts';
import type { Point, Polyline } from '../geometry/point.ts';
import { pickLine } from './pickLine.ts';
import type { ToolEvent, ToolStep } from './tool.types.ts';

/** The picked lines (view state: never saved, never undone). All from one list: quilting lines or seams. */
export interface Selection {
  readonly target: LineTarget;
  readonly indices: readonly number[];
}

/** Pick-and-move tool state: the pick and a drag in progress (`moved` once the pointer left its start). */
export interface SelectToolState {
  readonly selection: Selection | null;
  readonly drag: { readonly from: Point; readonly moved: boolean } | null;
}

export function createSelectTool(): SelectToolState {
  return { selection: null, drag: null };
}

/**
 * One step of pick-and-move. Pressing on a line picks it (keeping a pick it already belongs to, so several
 * lines move together); with shift it adds or takes the line from a pick of the same list; pressing on empty
 * canvas drops the pick (not with shift). Dragging previews the picked lines moved; releasing after a real move
 * commits one moveLines command. Escape cancels a drag, or else drops the pick. Removing the pick is the
 * workbench's `delete` action, not a key of this tool.
 *
 * `hitRadius` is in design units (the caller converts its pixel tolerance at the current zoom); quilting lines
 * win over seams at equal distance (pickLine).
 */
export function stepSelectTool(state: SelectToolState, event: ToolEvent, design: Pick<Design, 'lines' | 'seams'>, hitRadius: number): ToolStep<SelectToolState> {
  switch (event.kind) {
    case 'pointerDown':
      return { state: pressed(state, event.raw ?? event.point, event.point, event.shift ?? false, design, hitRadius) };
    case 'pointerMove': {
      const { drag, selection } = state;
      if (!drag || !selection) return { state };
      const dx = event.point[0] - drag.from[0];
      const dy = event.point[1] - drag.from[1];
      const next = dx !== 0 || dy !== 0 ? { ...state, drag: { ...drag, moved: true } } : state;
      return { state: next, preview: movedLines(design[selection.target], selection.indices, dx, dy) };
    }
    case 'pointerUp': {
      const { drag, selection } = state;
      if (!drag) return { state };
      const next = { ...state, drag: null };
      const dx = event.point[0] - drag.from[0];
      const dy = event.point[1] - drag.from[1];
      if (!drag.moved || !selection || (dx === 0 && dy === 0)) return { state: next };
      return { state: next, command: { kind: 'moveLines', target: selection.target, indices: selection.indices, dx, dy } };
    }
    case 'doubleClick':
      return { state };
    case 'key':
      if (event.key !== 'Escape') return { state };
      return { state: state.drag ? { ...state, drag: null } : { ...state, selection: null } };
  }
}

function pressed(state: SelectToolState, at: Point, snapped: Point, shift: boolean, design: Pick<Design, 'lines' | 'seams'>, hitRadius: number): SelectToolState {
  const hit = pickLine(design, at, hitRadius);
  const current = state.selection;
  if (!hit) return shift ? { ...state, drag: null } : { selection: null, drag: null };
  const already = current?.target === hit.target && current.indices.includes(hit.index);
  let next: Selection;
  if (shift && current?.target === hit.target) {
    next = { target: hit.target, indices: already ? current.indices.filter((i) => i !== hit.index) : [...current.indices, hit.index] };
  } else next = already && current ? current : { target: hit.target, indices: [hit.index] };
  return { selection: next.indices.length > 0 ? next : null, drag: { from: snapped, moved: false } };
}

function movedLines(lines: readonly Polyline[], indices: readonly number[], dx: number, dy: number): Polyline[] {
  return indices.map((i) => lines[i]!.map(([x, y]) => [x + dx, y + dy] as const));
}
