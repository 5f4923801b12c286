import { useId, useState } from 'react';

/**
 * A small "?" beside a figure's name: the hint shows on hover (title) and on tap or keyboard (a toggled note), so
 * quilters on a tablet at the machine can read it too.
 */
export function FigureHint({ label, text }: { label: string; text: string }) {
  const [open, setOpen] = useState(false);
  const id = useId();
  return (
    <>
      <button
        type="button"
        className="ml-1 inline-flex h-5 w-5 items-center justify-center rounded-full border border-denim-500 text-xs text-denim-700 align-middle"
        title={text}
        aria-label={`What “${label}” means`}
        aria-expanded={open}
        aria-controls={id}
        onClick={() => setOpen((o) => !o)}
      >
        ?
      </button>
      {open && <span id={id} role="note" className="mt-1 block text-xs font-normal text-denim-700">{text}</span>}
    </>
  );
}
