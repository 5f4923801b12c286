import { useEffect, useRef } from 'react';
import { SHORTCUTS } from './shortcuts.ts';

export interface ShortcutListProps {
  readonly onClose: () => void;
}

/**
 * The keyboard shortcuts, grouped, as a modal overlay over the workbench: a native <dialog> opened with
 * showModal(), so the canvas does not move, focus stays inside, and Esc closes it (the browser's own behaviour).
 */
export function ShortcutList({ onClose }: ShortcutListProps) {
  const groups = ['Tools', 'Edit', 'View', 'Route'] as const;
  const dialog = useRef<HTMLDialogElement>(null);
  useEffect(() => {
    const el = dialog.current;
    if (el && !el.open) el.showModal();
    return () => el?.close();
  }, []);
  return (
    <dialog
      ref={dialog}
      aria-labelledby="shortcut-heading"
      onClose={onClose}
      onClick={(e) => {
        if (e.target === e.currentTarget) onClose(); // a click on the backdrop
      }}
      className="m-auto max-h-[85vh] w-[min(40rem,92vw)] overflow-y-auto rounded border border-muslin-300 bg-white p-4 shadow-lg backdrop:bg-indigo-ink/40"
    >
      <div className="flex items-center justify-between">
        <h2 id="shortcut-heading" className="text-lg font-semibold">Keyboard shortcuts</h2>
        <button type="button" onClick={onClose} className="min-h-11 px-2 underline">Close</button>
      </div>
      <div className="mt-2 grid gap-4 sm:grid-cols-2">
        {groups.map((g) => (
          <div key={g}>
            <h3 className="font-semibold">{g}</h3>
            <dl className="mt-1 grid grid-cols-[auto_1fr] gap-x-3 gap-y-1 text-sm">
              {SHORTCUTS.filter((s) => s.group === g).map((s) => (
                <div key={s.action} className="contents">
                  <dt><kbd className="rounded border border-muslin-300 bg-muslin-50 px-1">{s.keys}</kbd></dt>
                  <dd>{s.label}</dd>
                </div>
              ))}
            </dl>
          </div>
        ))}
      </div>
    </dialog>
  );
}
