import { WALKTHROUGH_KEYS } from './walkthroughKeys.ts';

/** The keyboard shortcuts, always on screen on desktop widths (a tablet has no keyboard to list). */
export function KeyList() {
  return (
    <section aria-label="Keyboard shortcuts" className="hidden rounded border border-muslin-300 bg-white p-4 md:block pointer-coarse:hidden print:hidden">
      <h2 className="text-lg font-semibold">Keyboard</h2>
      <dl className="mt-1 grid grid-cols-[auto_1fr] gap-x-3 gap-y-1">
        {WALKTHROUGH_KEYS.map((k) => (
          <div key={k.action} className="contents">
            <dt><kbd className="rounded border border-muslin-300 bg-muslin-50 px-1">{k.keys}</kbd></dt>
            <dd>{k.label}</dd>
          </div>
        ))}
      </dl>
    </section>
  );
}
