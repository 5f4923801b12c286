import { memo } from 'react';
import type { ShortcutAction } from './shortcuts.ts';

/** The drawing and marking tools of the workbench (our own names; see docs/glossary.md). */
export type ToolId = 'select' | 'seam' | 'ruler' | 'polyline' | 'curve' | 'freehand' | 'motif' | 'ends' | 'order';

export const TOOLS: readonly { readonly id: ToolId; readonly label: string; readonly key: string; readonly icon: string; readonly shortcut: ShortcutAction }[] = [
  { id: 'select', label: 'Pick and move', key: 'S', icon: '⬚', shortcut: 'tool-select' },
  { id: 'ruler', label: 'Ruler line', key: 'R', icon: '╱', shortcut: 'tool-ruler' },
  { id: 'polyline', label: 'Corner line', key: 'P', icon: '⋀', shortcut: 'tool-polyline' },
  { id: 'curve', label: 'Smooth curve', key: 'C', icon: '∿', shortcut: 'tool-curve' },
  { id: 'freehand', label: 'Freehand', key: 'F', icon: '✎', shortcut: 'tool-freehand' },
  { id: 'motif', label: 'Motif in a patch', key: 'M', icon: '❀', shortcut: 'tool-motif' },
  { id: 'seam', label: 'Seam line', key: 'E', icon: '┼', shortcut: 'tool-seam' },
  { id: 'ends', label: 'Start and end', key: 'T', icon: '◉', shortcut: 'tool-ends' },
  { id: 'order', label: 'My stitching order', key: 'O', icon: '①', shortcut: 'tool-order' },
];

export interface ToolbarProps {
  readonly tool: ToolId;
  readonly onTool: (tool: ToolId) => void;
}

/** The tool rail: one pressed button per tool, with its key in the accessible name. */
export const Toolbar = memo(function Toolbar({ tool, onTool }: ToolbarProps) {
  return (
    <div role="toolbar" aria-label="Drawing tools" aria-orientation="vertical" className="flex flex-row flex-wrap gap-1 lg:flex-col">
      {TOOLS.map((t) => (
        <button
          key={t.id}
          type="button"
          aria-pressed={tool === t.id}
          aria-keyshortcuts={t.key}
          title={`${t.label} (${t.key})`}
          onClick={() => onTool(t.id)}
          className={`flex items-center gap-2 rounded px-2 py-1.5 text-left text-sm ${tool === t.id ? 'bg-denim-600 text-white' : 'bg-white text-indigo-ink hover:bg-muslin-100'} border border-muslin-300`}
        >
          <span aria-hidden="true" className="w-4 text-center">{t.icon}</span>
          <span>{t.label}</span>
        </button>
      ))}
    </div>
  );
});
