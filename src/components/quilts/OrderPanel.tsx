import { useEffect, useId, useRef, useState } from 'react';
import type { DesignListItem } from '@shared/contract/designs.ts';
import type { Cell, Quilt } from '@shared/quilt/quilt.schema.ts';
import { moveInOrder, quiltingOrder, setOrderKind, type OrderKind } from './quiltOrderEdits.ts';

export interface OrderPanelProps {
  readonly quilt: Quilt;
  readonly designs: ReadonlyMap<string, DesignListItem>;
  readonly onEdit: (next: Quilt) => void;
}

const KINDS: readonly { kind: OrderKind; label: string }[] = [
  { kind: 'rows', label: 'Row by row from the top left' },
  { kind: 'serpentine', label: 'Serpentine: every other row right to left' },
  { kind: 'hand', label: 'By hand' },
];

/** The position (data-order-index) of the order list item under a screen point, or null. */
function indexAt(x: number, y: number): number | null {
  const el = document.elementFromPoint(x, y)?.closest<HTMLElement>('[data-order-index]');
  return el ? Number(el.dataset.orderIndex) : null;
}

/**
 * Order of quilting: row by row (the default), serpentine, or by hand. By hand, each block's number can be dragged
 * to another place in the list, or moved with the Earlier and Later buttons (the keyboard way; focus stays on the
 * moved block). The numbers match those on the map.
 */
export function OrderPanel({ quilt, designs, onEdit }: OrderPanelProps) {
  const name = useId();
  const cells = quiltingOrder(quilt);
  const [drag, setDrag] = useState<{ from: number; over: number | null } | null>(null);
  const [focusAfter, setFocusAfter] = useState<{ index: number; which: 'earlier' | 'later' } | null>(null);
  const list = useRef<HTMLOListElement>(null);
  // The position being dragged, read by the release handler (state updaters must stay free of side effects).
  const dragFrom = useRef<number | null>(null);

  useEffect(() => {
    if (!focusAfter) return;
    list.current?.querySelector<HTMLButtonElement>(`[data-order-index="${focusAfter.index}"] [data-move="${focusAfter.which}"]`)?.focus();
    setFocusAfter(null);
  }, [focusAfter]);

  const dragging = drag !== null;
  useEffect(() => {
    if (!dragging) return;
    const move = (e: PointerEvent) => setDrag((d) => (d ? { ...d, over: indexAt(e.clientX, e.clientY) } : d));
    const up = (e: PointerEvent) => {
      const to = indexAt(e.clientX, e.clientY);
      const from = dragFrom.current;
      dragFrom.current = null;
      setDrag(null);
      if (from !== null && to !== null && to !== from) onEdit(moveInOrder(quilt, from, to));
    };
    const cancel = () => {
      dragFrom.current = null;
      setDrag(null);
    };
    const key = (e: KeyboardEvent) => e.key === 'Escape' && cancel();
    window.addEventListener('pointermove', move);
    window.addEventListener('pointerup', up);
    window.addEventListener('pointercancel', cancel);
    window.addEventListener('keydown', key);
    return () => {
      window.removeEventListener('pointermove', move);
      window.removeEventListener('pointerup', up);
      window.removeEventListener('pointercancel', cancel);
      window.removeEventListener('keydown', key);
    };
  }, [dragging, onEdit, quilt]);

  const move = (from: number, to: number, which: 'earlier' | 'later') => {
    onEdit(moveInOrder(quilt, from, to));
    setFocusAfter({ index: to, which: to === 0 ? 'later' : to === cells.length - 1 ? 'earlier' : which });
  };
  const title = (c: Cell) => {
    const p = quilt.placements[c.row]?.[c.column];
    return p ? (designs.get(p.designId)?.title ?? 'a design') : 'empty';
  };

  return (
    <section aria-labelledby="order-heading" className="rounded border border-muslin-300 bg-muslin-50 p-3">
      <h2 id="order-heading" className="font-bold">Order of quilting</h2>
      <fieldset className="mt-1">
        <legend className="sr-only">Order of quilting</legend>
        {KINDS.map((k) => (
          <label key={k.kind} className="flex items-center gap-2 py-0.5">
            <input type="radio" name={name} value={k.kind} checked={quilt.order.kind === k.kind} onChange={() => onEdit(setOrderKind(quilt, k.kind))} />
            {k.label}
          </label>
        ))}
      </fieldset>
      {cells.length === 0 ? (
        <p className="mt-2 text-sm">Place blocks to see their order.</p>
      ) : quilt.order.kind !== 'hand' ? (
        <p className="mt-2 text-sm">The numbers on the map show the order. Choose “By hand” to change it.</p>
      ) : (
        <>
          <p className="mt-2 text-sm">Drag a number to another place in the list, or use Earlier and Later.</p>
          <ol ref={list} className="mt-1 space-y-1" data-testid="order-list">
            {cells.map((c, i) => (
              <li
                key={`${c.row}-${c.column}`}
                data-order-index={i}
                className={`flex items-center gap-2 rounded px-1 ${drag?.over === i && drag.from !== i ? 'bg-ochre-500/30' : ''} ${drag?.from === i ? 'opacity-60' : ''}`}
              >
                <span
                  aria-hidden="true"
                  data-order-handle={i}
                  onPointerDown={(e) => {
                    if (e.button !== 0) return;
                    dragFrom.current = i;
                    setDrag({ from: i, over: i });
                  }}
                  className="min-w-8 cursor-grab touch-none select-none rounded-full bg-indigo-ink px-2 text-center text-sm font-bold leading-7 text-white"
                >
                  {i + 1}
                </span>
                <span className="min-w-0 flex-1 text-sm">
                  <span className="sr-only">{i + 1}. </span>Row {c.row + 1}, column {c.column + 1}: {title(c)}
                </span>
                <button type="button" data-move="earlier" disabled={i === 0} onClick={() => move(i, i - 1, 'earlier')} aria-label={`Quilt row ${c.row + 1}, column ${c.column + 1} earlier`} className="rounded border border-denim-600 px-2 text-sm font-semibold text-denim-700 disabled:opacity-40">
                  Earlier
                </button>
                <button type="button" data-move="later" disabled={i === cells.length - 1} onClick={() => move(i, i + 1, 'later')} aria-label={`Quilt row ${c.row + 1}, column ${c.column + 1} later`} className="rounded border border-denim-600 px-2 text-sm font-semibold text-denim-700 disabled:opacity-40">
                  Later
                </button>
              </li>
            ))}
          </ol>
        </>
      )}
    </section>
  );
}
