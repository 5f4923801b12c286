import { assertNever } from '../assertNever.ts';
import { err, ok, type Result } from '../result.ts';
import type { Cell, QuiltOrder } from './quilt.schema.ts';

/** The part of a quilt the order depends on: the grid and which cells hold a block. */
export interface QuiltGrid {
  readonly rows: number;
  readonly columns: number;
  readonly placements: readonly (readonly (unknown | null)[])[];
}

/** Why a hand order is refused; `message` is in quilting words for the form. */
export type HandOrderProblem =
  | { readonly kind: 'outside-grid'; readonly cell: Cell; readonly message: string }
  | { readonly kind: 'empty-cell'; readonly cell: Cell; readonly message: string }
  | { readonly kind: 'repeated-cell'; readonly cell: Cell; readonly message: string }
  | { readonly kind: 'missing-cell'; readonly cell: Cell; readonly message: string };

const name = (c: Cell): string => `row ${c.row + 1}, column ${c.column + 1}`;

/** Filled cells row by row from the top left, each row left to right. */
export function rowOrder(grid: QuiltGrid): Cell[] {
  const out: Cell[] = [];
  for (let row = 0; row < grid.rows; row++) for (let column = 0; column < grid.columns; column++) if (isFilled(grid, row, column)) out.push({ row, column });
  return out;
}

/** Filled cells row by row from the top left, rows alternately left to right and right to left (no jump back). */
export function serpentineOrder(grid: QuiltGrid): Cell[] {
  const out: Cell[] = [];
  for (let row = 0; row < grid.rows; row++) {
    for (let k = 0; k < grid.columns; k++) {
      const column = row % 2 === 0 ? k : grid.columns - 1 - k;
      if (isFilled(grid, row, column)) out.push({ row, column });
    }
  }
  return out;
}

/**
 * Checks that a hand order names every filled cell exactly once and nothing else (a permutation of the filled
 * cells); returns the cells as given.
 */
export function checkHandOrder(grid: QuiltGrid, cells: readonly Cell[]): Result<Cell[], HandOrderProblem> {
  const seen = new Set<number>();
  for (const cell of cells) {
    if (cell.row >= grid.rows || cell.column >= grid.columns) return err({ kind: 'outside-grid', cell, message: `${name(cell)} is outside the quilt map.` });
    if (!isFilled(grid, cell.row, cell.column)) return err({ kind: 'empty-cell', cell, message: `${name(cell)} has no block to quilt.` });
    const key = cell.row * grid.columns + cell.column;
    if (seen.has(key)) return err({ kind: 'repeated-cell', cell, message: `${name(cell)} comes twice in the order.` });
    seen.add(key);
  }
  for (const cell of rowOrder(grid)) {
    if (!seen.has(cell.row * grid.columns + cell.column)) return err({ kind: 'missing-cell', cell, message: `${name(cell)} is missing from the order.` });
  }
  return ok(cells.map((c) => ({ row: c.row, column: c.column })));
}

/** The quilting order of the filled cells for the quilt's chosen kind of order. */
export function orderCells(grid: QuiltGrid, order: QuiltOrder): Result<Cell[], HandOrderProblem> {
  switch (order.kind) {
    case 'rows':
      return ok(rowOrder(grid));
    case 'serpentine':
      return ok(serpentineOrder(grid));
    case 'hand':
      return checkHandOrder(grid, order.cells);
    default:
      return assertNever(order);
  }
}

function isFilled(grid: QuiltGrid, row: number, column: number): boolean {
  const value = grid.placements[row]?.[column];
  return value !== null && value !== undefined;
}
