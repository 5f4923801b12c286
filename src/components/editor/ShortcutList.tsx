import { SHORTCUTS } from './shortcuts.ts';

export interface ShortcutListProps {
  readonly onClose: () => void;
}

/** The visible list of keyboard shortcuts, grouped. */
export function ShortcutList({ onClose }: ShortcutListProps) {
  const groups = ['Tools', 'Edit', 'View', 'Route'] as const;
  return (
    <section aria-label="Keyboard shortcuts" className="rounded border border-muslin-300 bg-white p-4 shadow">
      <div className="flex items-center justify-between">
        <h2 className="text-lg font-semibold">Keyboard shortcuts</h2>
        <button type="button" onClick={onClose} className="underline">Close</button>
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
    </section>
  );
}
