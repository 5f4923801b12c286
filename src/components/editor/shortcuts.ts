/** Everything the workbench keyboard can do. Tools are switched by letter; view and edit actions by the usual keys. */
export type ShortcutAction =
  | 'tool-select'
  | 'tool-seam'
  | 'tool-ruler'
  | 'tool-polyline'
  | 'tool-curve'
  | 'tool-freehand'
  | 'tool-motif'
  | 'tool-ends'
  | 'tool-order'
  | 'undo'
  | 'redo'
  | 'delete'
  | 'split'
  | 'join'
  | 'finish'
  | 'cancel'
  | 'zoom-in'
  | 'zoom-out'
  | 'zoom-fit'
  | 'zoom-true'
  | 'pan-left'
  | 'pan-right'
  | 'pan-up'
  | 'pan-down'
  | 'toggle-snap'
  | 'play-pause'
  | 'show-keys';

export interface Shortcut {
  readonly action: ShortcutAction;
  /** As shown to the quilter, e.g. "Ctrl+Z". */
  readonly keys: string;
  readonly label: string;
  readonly group: 'Tools' | 'Edit' | 'View' | 'Route';
}

/** The keys, in the order the visible list shows them. */
export const SHORTCUTS: readonly Shortcut[] = [
  { action: 'tool-select', keys: 'S', label: 'Pick and move lines', group: 'Tools' },
  { action: 'tool-seam', keys: 'E', label: 'Seam line', group: 'Tools' },
  { action: 'tool-ruler', keys: 'R', label: 'Ruler line (straight)', group: 'Tools' },
  { action: 'tool-polyline', keys: 'P', label: 'Corner line (click each corner)', group: 'Tools' },
  { action: 'tool-curve', keys: 'C', label: 'Smooth curve', group: 'Tools' },
  { action: 'tool-freehand', keys: 'F', label: 'Freehand', group: 'Tools' },
  { action: 'tool-motif', keys: 'M', label: 'Fill a patch with a motif', group: 'Tools' },
  { action: 'tool-ends', keys: 'T', label: 'Set start and end points', group: 'Tools' },
  { action: 'tool-order', keys: 'O', label: 'My stitching order (click lines in turn)', group: 'Tools' },
  { action: 'undo', keys: 'Ctrl+Z', label: 'Undo', group: 'Edit' },
  { action: 'redo', keys: 'Ctrl+Shift+Z or Ctrl+Y', label: 'Redo', group: 'Edit' },
  { action: 'delete', keys: 'Delete or Backspace', label: 'Remove picked lines', group: 'Edit' },
  { action: 'split', keys: 'X', label: 'Split the picked line at its middle point', group: 'Edit' },
  { action: 'join', keys: 'J', label: 'Join two picked lines that share an end', group: 'Edit' },
  { action: 'finish', keys: 'Enter', label: 'Finish the line being drawn', group: 'Edit' },
  { action: 'cancel', keys: 'Esc', label: 'Drop the line being drawn / clear the pick', group: 'Edit' },
  { action: 'toggle-snap', keys: 'G', label: 'Snap to grid, seam ends and crossings on/off', group: 'Edit' },
  { action: 'zoom-in', keys: '+', label: 'Zoom in', group: 'View' },
  { action: 'zoom-out', keys: '−', label: 'Zoom out', group: 'View' },
  { action: 'zoom-fit', keys: '0', label: 'Fit the block', group: 'View' },
  { action: 'zoom-true', keys: '1', label: 'True size (1 in on screen = 1 in)', group: 'View' },
  { action: 'pan-left', keys: '←', label: 'Move the view left (Shift: further)', group: 'View' },
  { action: 'pan-right', keys: '→', label: 'Move the view right', group: 'View' },
  { action: 'pan-up', keys: '↑', label: 'Move the view up', group: 'View' },
  { action: 'pan-down', keys: '↓', label: 'Move the view down', group: 'View' },
  { action: 'play-pause', keys: 'K', label: 'Play or pause the route preview', group: 'Route' },
  { action: 'show-keys', keys: '?', label: 'Show or hide this list', group: 'View' },
];

/** The parts of a KeyboardEvent the matcher reads (so it is testable without a DOM). */
export interface KeyPress {
  readonly key: string;
  readonly ctrlKey: boolean;
  readonly metaKey: boolean;
  readonly shiftKey: boolean;
  readonly altKey: boolean;
}

const LETTERS: Readonly<Record<string, ShortcutAction>> = {
  s: 'tool-select', e: 'tool-seam', r: 'tool-ruler', p: 'tool-polyline', c: 'tool-curve', f: 'tool-freehand',
  m: 'tool-motif', t: 'tool-ends', o: 'tool-order', x: 'split', j: 'join', g: 'toggle-snap', k: 'play-pause',
};

const KEYS: Readonly<Record<string, ShortcutAction>> = {
  Delete: 'delete', Backspace: 'delete', Enter: 'finish', Escape: 'cancel',
  '+': 'zoom-in', '=': 'zoom-in', '-': 'zoom-out', _: 'zoom-out', '0': 'zoom-fit', '1': 'zoom-true',
  ArrowLeft: 'pan-left', ArrowRight: 'pan-right', ArrowUp: 'pan-up', ArrowDown: 'pan-down', '?': 'show-keys',
};

/** The action for a key press, or null. Ctrl and Cmd count alike (Cmd on a Mac). */
export function matchShortcut(e: KeyPress): ShortcutAction | null {
  const mod = e.ctrlKey || e.metaKey;
  const key = e.key.length === 1 ? e.key.toLowerCase() : e.key;
  if (mod && !e.altKey) {
    if (key === 'z') return e.shiftKey ? 'redo' : 'undo';
    if (key === 'y') return 'redo';
    return null;
  }
  if (e.altKey) return null;
  return LETTERS[key] ?? KEYS[e.key] ?? null;
}
