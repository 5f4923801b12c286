// The quilt map's block gesture as a small pure state machine (as the workbench's tools are): a design from the tray,
// or a block already on the map, is carried to a cell either by pointer drag or by picking it and then picking a
// cell (the keyboard way, also a tap). Screen points are CSS pixels; cells come from the page's hit test.
import { assertNever } from '@shared/assertNever.ts';
import type { Cell } from '@shared/quilt/quilt.schema.ts';

/** What is being carried: a design from the tray, or the block in a cell (dropping it on another cell swaps them). */
export type CarriedBlock = { readonly kind: 'design'; readonly designId: string } | { readonly kind: 'cell'; readonly cell: Cell };

/** A point on the screen in CSS pixels. */
export interface ScreenPoint {
  readonly x: number;
  readonly y: number;
}

export type BlockGesture =
  | { readonly kind: 'idle' }
  /** Pointer down on a tray design or a block, not yet moved far enough to be a drag (it may still be a click). */
  | { readonly kind: 'pressing'; readonly carried: CarriedBlock; readonly origin: ScreenPoint }
  | { readonly kind: 'dragging'; readonly carried: CarriedBlock; readonly at: ScreenPoint; readonly over: Cell | null }
  /** Picked with a click or the keyboard: the next cell picked receives it. */
  | { readonly kind: 'holding'; readonly carried: CarriedBlock };

export type BlockGestureEvent =
  | { readonly kind: 'pick'; readonly carried: CarriedBlock }
  | { readonly kind: 'pointer-down'; readonly carried: CarriedBlock; readonly at: ScreenPoint }
  | { readonly kind: 'pointer-move'; readonly at: ScreenPoint; readonly over: Cell | null }
  | { readonly kind: 'pointer-up'; readonly over: Cell | null }
  | { readonly kind: 'cell'; readonly cell: Cell }
  | { readonly kind: 'cancel' };

/** The map edit a gesture ends in. */
export type BlockDrop = { readonly kind: 'place'; readonly cell: Cell; readonly designId: string } | { readonly kind: 'move'; readonly from: Cell; readonly to: Cell };

export interface BlockGestureStep {
  readonly gesture: BlockGesture;
  readonly drop?: BlockDrop;
  /** A cell picked without anything carried: the page selects it for turning, mirroring or clearing. */
  readonly select?: Cell;
}

/** Pointer travel (CSS px) before a press becomes a drag, so a slightly shaky click is still a click. */
export const DRAG_THRESHOLD_PX = 5;

export const IDLE: BlockGesture = { kind: 'idle' };

const sameCell = (a: Cell, b: Cell): boolean => a.row === b.row && a.column === b.column;
const sameCarried = (a: CarriedBlock, b: CarriedBlock): boolean =>
  a.kind === 'design' ? b.kind === 'design' && a.designId === b.designId : b.kind === 'cell' && sameCell(a.cell, b.cell);

function dropOn(carried: CarriedBlock, cell: Cell): BlockDrop | undefined {
  if (carried.kind === 'design') return { kind: 'place', cell, designId: carried.designId };
  return sameCell(carried.cell, cell) ? undefined : { kind: 'move', from: carried.cell, to: cell };
}

/**
 * One step of the gesture. Picking the carried thing again puts it back (a toggle); a press that never moved is left
 * to the click that follows it; a drag released outside the map, or cancelled (Escape), changes nothing.
 */
export function stepBlockGesture(gesture: BlockGesture, event: BlockGestureEvent): BlockGestureStep {
  switch (event.kind) {
    case 'pick':
      return { gesture: gesture.kind === 'holding' && sameCarried(gesture.carried, event.carried) ? IDLE : { kind: 'holding', carried: event.carried } };
    case 'pointer-down':
      // While something is held, a press is the start of the click that places it, not a new drag.
      if (gesture.kind === 'holding') return { gesture };
      return { gesture: { kind: 'pressing', carried: event.carried, origin: event.at } };
    case 'pointer-move':
      if (gesture.kind === 'pressing') {
        const moved = Math.hypot(event.at.x - gesture.origin.x, event.at.y - gesture.origin.y);
        return { gesture: moved < DRAG_THRESHOLD_PX ? gesture : { kind: 'dragging', carried: gesture.carried, at: event.at, over: event.over } };
      }
      if (gesture.kind === 'dragging') return { gesture: { ...gesture, at: event.at, over: event.over } };
      return { gesture };
    case 'pointer-up': {
      if (gesture.kind === 'pressing') return { gesture: IDLE };
      if (gesture.kind !== 'dragging') return { gesture };
      const drop = event.over ? dropOn(gesture.carried, event.over) : undefined;
      return drop ? { gesture: IDLE, drop, select: event.over! } : { gesture: IDLE };
    }
    case 'cell': {
      if (gesture.kind !== 'holding') return { gesture, select: event.cell };
      const drop = dropOn(gesture.carried, event.cell);
      return drop ? { gesture: IDLE, drop, select: event.cell } : { gesture: IDLE, select: event.cell };
    }
    case 'cancel':
      return { gesture: IDLE };
    default:
      return assertNever(event);
  }
}
