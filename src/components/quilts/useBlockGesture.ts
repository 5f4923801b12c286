// Wires the pure block gesture (blockGesture.ts) to the page: pointer moves and releases are followed on the window
// while a press or drag is under way (so the release lands on whichever cell is under the pointer), Escape cancels,
// and the cell under a point is found by the map's `data-cell="row-column"` attributes.
import { useCallback, useEffect, useRef, useState } from 'react';
import type { Cell } from '@shared/quilt/quilt.schema.ts';
import { IDLE, stepBlockGesture, type BlockDrop, type BlockGesture, type BlockGestureEvent } from './blockGesture.ts';

/** The map cell under a screen point (CSS px), or null off the map. */
export function cellAtPoint(x: number, y: number): Cell | null {
  const el = document.elementFromPoint(x, y)?.closest<HTMLElement>('[data-cell]');
  const m = el ? /^(\d+)-(\d+)$/.exec(el.dataset.cell ?? '') : null;
  return m ? { row: Number(m[1]), column: Number(m[2]) } : null;
}

export function useBlockGesture(onDrop: (drop: BlockDrop) => void, onSelect: (cell: Cell) => void) {
  const [gesture, setGesture] = useState<BlockGesture>(IDLE);
  const current = useRef<BlockGesture>(IDLE);
  const handlers = useRef({ onDrop, onSelect });
  useEffect(() => {
    handlers.current = { onDrop, onSelect };
  }, [onDrop, onSelect]);

  const dispatch = useCallback((event: BlockGestureEvent) => {
    const step = stepBlockGesture(current.current, event);
    current.current = step.gesture;
    setGesture(step.gesture);
    if (step.drop) handlers.current.onDrop(step.drop);
    if (step.select) handlers.current.onSelect(step.select);
  }, []);

  const following = gesture.kind === 'pressing' || gesture.kind === 'dragging';
  useEffect(() => {
    if (!following) return;
    const move = (e: PointerEvent) => dispatch({ kind: 'pointer-move', at: { x: e.clientX, y: e.clientY }, over: cellAtPoint(e.clientX, e.clientY) });
    const up = (e: PointerEvent) => dispatch({ kind: 'pointer-up', over: cellAtPoint(e.clientX, e.clientY) });
    const cancel = () => dispatch({ kind: 'cancel' });
    window.addEventListener('pointermove', move);
    window.addEventListener('pointerup', up);
    window.addEventListener('pointercancel', cancel);
    return () => {
      window.removeEventListener('pointermove', move);
      window.removeEventListener('pointerup', up);
      window.removeEventListener('pointercancel', cancel);
    };
  }, [following, dispatch]);

  const active = gesture.kind !== 'idle';
  useEffect(() => {
    if (!active) return;
    const key = (e: KeyboardEvent) => {
      if (e.key === 'Escape') dispatch({ kind: 'cancel' });
    };
    window.addEventListener('keydown', key);
    return () => window.removeEventListener('keydown', key);
  }, [active, dispatch]);

  return { gesture, dispatch };
}
