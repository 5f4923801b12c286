// The quilt map editor's edits as pure functions over the shared quilt schema's type: a new map, placing a design in
// a cell, clearing it, moving (swapping) blocks, a quarter turn, a mirror (sashing and borders: quiltFrameEdits.ts); and the figures the page shows from the map and the
// designs' stored summaries (finished size, trim plan, quilt budget). No React, no fetch.
import type { Units } from '@shared/design/design.schema.ts';
import { QUILT_VERSION, type Cell, type Quilt, type Rotation } from '@shared/quilt/quilt.schema.ts';

/** An empty map: every cell empty, no sashing or borders, blocks quilted row by row. */
export function newQuilt(units: Units, rows: number, columns: number, blockSize: number): Quilt {
  return {
    version: QUILT_VERSION,
    units,
    rows,
    columns,
    block: { width: blockSize, height: blockSize },
    placements: Array.from({ length: rows }, () => Array.from({ length: columns }, () => null)),
    sashing: 0,
    borders: [],
    order: { kind: 'rows' },
    linkMetric: 'straight',
    trim: {},
  };
}

function withCell(quilt: Quilt, row: number, column: number, f: (p: Quilt['placements'][number][number]) => Quilt['placements'][number][number]): Quilt {
  return { ...quilt, placements: quilt.placements.map((cells, r) => (r === row ? cells.map((p, c) => (c === column ? f(p) : p)) : cells)) };
}

/** Puts a design in a cell (keeping the cell's turn and mirror), or empties it with null. */
export function placeDesign(quilt: Quilt, row: number, column: number, designId: string | null): Quilt {
  return withCell(quilt, row, column, (p) => (designId === null ? null : { designId, rotation: p?.rotation ?? 0, mirror: p?.mirror ?? false }));
}

/** Empties a cell (its turn and mirror go with the block). */
export function clearCell(quilt: Quilt, row: number, column: number): Quilt {
  return placeDesign(quilt, row, column, null);
}

/**
 * Moves the block in `from` to `to` with its turn and mirror; whatever was in `to` goes to `from` (a swap, so
 * dragging a block onto another never loses one). Moving a cell onto itself changes nothing.
 */
export function moveBlock(quilt: Quilt, from: Cell, to: Cell): Quilt {
  const a = quilt.placements[from.row]?.[from.column];
  const b = quilt.placements[to.row]?.[to.column];
  if (a === undefined || b === undefined) throw new Error(`quilts/quiltEdits: cell outside the ${quilt.rows} × ${quilt.columns} map`);
  return withCell(withCell(quilt, to.row, to.column, () => a), from.row, from.column, () => b);
}

/** One quarter turn clockwise; four make the cell as it was. An empty cell stays empty. */
export function turnQuarter(quilt: Quilt, row: number, column: number): Quilt {
  return withCell(quilt, row, column, (p) => (p ? { ...p, rotation: (((p.rotation + 90) % 360) as Rotation) } : p));
}

/** Mirrors left to right (again to undo). */
export function toggleMirror(quilt: Quilt, row: number, column: number): Quilt {
  return withCell(quilt, row, column, (p) => (p ? { ...p, mirror: !p.mirror } : p));
}

// The trim table and the block-by-block budget moved to shared/quilt/quiltFigures.ts (the printed plan uses them too).
export { budgetOf, trimTableOf } from '@shared/quilt/quiltFigures.ts';
