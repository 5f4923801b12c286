// Edits of the quilting order (shared/quilt/order.ts): the kind of order, moving a block earlier or later by hand, and
// keeping a hand order true to the map when blocks are placed, moved or cleared, so a saved quilt always passes the
// schema's check that a hand order names every filled cell exactly once.
import type { Cell, Quilt, QuiltOrder } from '@shared/quilt/quilt.schema.ts';
import { orderCells, rowOrder } from '@shared/quilt/order.ts';

export type OrderKind = QuiltOrder['kind'];

const key = (c: Cell): string => `${c.row}-${c.column}`;

/** The cells in quilting order; a hand order that no longer fits the map is read as kept by `keepHandOrder`. */
export function quiltingOrder(quilt: Quilt): Cell[] {
  const ordered = orderCells(quilt, keepHandOrder(quilt).order);
  if (!ordered.ok) throw new Error(`quilts/quiltOrderEdits: ${ordered.error.message}`);
  return ordered.value;
}

/** Chooses the kind of order. Choosing `hand` starts from the order in use, so nothing moves until the quilter moves it. */
export function setOrderKind(quilt: Quilt, kind: OrderKind): Quilt {
  if (kind === quilt.order.kind) return quilt;
  if (kind === 'hand') return { ...quilt, order: { kind: 'hand', cells: quiltingOrder(quilt) } };
  return { ...quilt, order: { kind } };
}

/**
 * Moves the block quilted at position `from` (0-based) to position `to`, the others closing up; the order becomes a
 * hand order. Positions outside the order change nothing.
 */
export function moveInOrder(quilt: Quilt, from: number, to: number): Quilt {
  const cells = quiltingOrder(quilt);
  if (from < 0 || from >= cells.length || to < 0 || to >= cells.length || from === to) return quilt;
  const [moved] = cells.splice(from, 1);
  cells.splice(to, 0, moved!);
  return { ...quilt, order: { kind: 'hand', cells } };
}

/**
 * A hand order made true to the map again: cells left empty drop out, newly filled cells join at the end in row
 * order. Other kinds of order follow the map by themselves and are returned unchanged.
 */
export function keepHandOrder(quilt: Quilt): Quilt {
  if (quilt.order.kind !== 'hand') return quilt;
  const filled = new Set(rowOrder(quilt).map(key));
  const seen = new Set<string>();
  const kept = quilt.order.cells.filter((c) => {
    const k = key(c);
    if (!filled.has(k) || seen.has(k)) return false;
    seen.add(k);
    return true;
  });
  const added = rowOrder(quilt).filter((c) => !seen.has(key(c)));
  return { ...quilt, order: { kind: 'hand', cells: [...kept, ...added] } };
}

/**
 * A block moved from one cell to another (quiltEdits.ts `moveBlock` swaps the two cells): in a hand order the two
 * cells swap places too, so each block keeps its number.
 */
export function swapInHandOrder(quilt: Quilt, a: Cell, b: Cell): Quilt {
  if (quilt.order.kind !== 'hand') return quilt;
  const swap = (c: Cell): Cell => (key(c) === key(a) ? { ...b } : key(c) === key(b) ? { ...a } : c);
  return keepHandOrder({ ...quilt, order: { kind: 'hand', cells: quilt.order.cells.map(swap) } });
}
