import type { ShortcutAction } from './shortcuts.ts';
import type { ToolId } from './Toolbar.tsx';

/** What the workbench can be asked to do from the keyboard; the Workbench supplies each one. */
export interface WorkbenchCommands {
  undo(): void;
  redo(): void;
  removeSelection(): void;
  split(): void;
  join(): void;
  /** Enter: finishes the line being drawn. */
  finish(): void;
  /** Escape: drops the line being drawn or the drag, else the pick. */
  cancel(): void;
  zoomIn(): void;
  zoomOut(): void;
  fit(): void;
  trueSize(): void;
  /** Moves the view by one step in screen directions (+1 right/down); `far` with Shift. */
  pan(dx: number, dy: number, far: boolean): void;
  toggleSnap(): void;
  playPause(): void;
  toggleKeys(): void;
  chooseTool(tool: ToolId): void;
}

/** How the key was pressed, for the actions that care (Shift moves the view four times as far). */
export interface ActionPress {
  readonly shift: boolean;
}

type ActionRun = (c: WorkbenchCommands, press: ActionPress) => void;

/**
 * Every shortcut action and what it does, one row each. A Record over the closed union: an action added to
 * shortcuts.ts without a row here fails to compile.
 */
export const WORKBENCH_ACTIONS: Readonly<Record<ShortcutAction, ActionRun>> = {
  'tool-select': (c) => c.chooseTool('select'),
  'tool-seam': (c) => c.chooseTool('seam'),
  'tool-ruler': (c) => c.chooseTool('ruler'),
  'tool-polyline': (c) => c.chooseTool('polyline'),
  'tool-curve': (c) => c.chooseTool('curve'),
  'tool-freehand': (c) => c.chooseTool('freehand'),
  'tool-motif': (c) => c.chooseTool('motif'),
  'tool-ends': (c) => c.chooseTool('ends'),
  'tool-order': (c) => c.chooseTool('order'),
  undo: (c) => c.undo(),
  redo: (c) => c.redo(),
  delete: (c) => c.removeSelection(),
  split: (c) => c.split(),
  join: (c) => c.join(),
  finish: (c) => c.finish(),
  cancel: (c) => c.cancel(),
  'zoom-in': (c) => c.zoomIn(),
  'zoom-out': (c) => c.zoomOut(),
  'zoom-fit': (c) => c.fit(),
  'zoom-true': (c) => c.trueSize(),
  // The view moves opposite to the arrow's content direction: ← shows more of the left, so the block moves right.
  'pan-left': (c, p) => c.pan(1, 0, p.shift),
  'pan-right': (c, p) => c.pan(-1, 0, p.shift),
  'pan-up': (c, p) => c.pan(0, 1, p.shift),
  'pan-down': (c, p) => c.pan(0, -1, p.shift),
  'toggle-snap': (c) => c.toggleSnap(),
  'play-pause': (c) => c.playPause(),
  'show-keys': (c) => c.toggleKeys(),
};

export function runWorkbenchAction(action: ShortcutAction, commands: WorkbenchCommands, press: ActionPress): void {
  WORKBENCH_ACTIONS[action](commands, press);
}
