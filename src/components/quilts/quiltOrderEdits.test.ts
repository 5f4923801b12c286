import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { quiltSchema, type Cell, type Quilt } from '@shared/quilt/quilt.schema.ts';
import { clearCell, moveBlock, newQuilt, placeDesign } from './quiltEdits.ts';
import { keepHandOrder, moveInOrder, quiltingOrder, setOrderKind, swapInHandOrder } from './quiltOrderEdits.ts';

function full(rows: number, columns: number): Quilt {
  let q = newQuilt('in', rows, columns, 10);
  for (let r = 0; r < rows; r++) for (let c = 0; c < columns; c++) q = placeDesign(q, r, c, `d${r}${c}`);
  return q;
}
const names = (cells: readonly Cell[]) => cells.map((c) => `${c.row}${c.column}`).join(' ');

describe('the quilting order', () => {
  it('rows by default, serpentine on request: worked 2 × 3 orders', () => {
    const q = full(2, 3);
    expect(names(quiltingOrder(q))).toBe('00 01 02 10 11 12');
    expect(names(quiltingOrder(setOrderKind(q, 'serpentine')))).toBe('00 01 02 12 11 10');
  });

  it('choosing "by hand" keeps the order in use; moving a block closes up the others', () => {
    const q = setOrderKind(setOrderKind(full(2, 3), 'serpentine'), 'hand');
    expect(names(quiltingOrder(q))).toBe('00 01 02 12 11 10');
    const moved = moveInOrder(q, 5, 0);
    expect(names(quiltingOrder(moved))).toBe('10 00 01 02 12 11');
    expect(names(quiltingOrder(moveInOrder(moved, 0, 1)))).toBe('00 10 01 02 12 11');
    expect(moveInOrder(moved, 0, 6)).toBe(moved);
    // Moving from a row order makes it a hand order.
    expect(moveInOrder(full(1, 2), 1, 0).order).toEqual({ kind: 'hand', cells: [{ row: 0, column: 1 }, { row: 0, column: 0 }] });
  });

  it('a hand order follows the map: a cleared block drops out, a new block joins at the end, a moved block keeps its number', () => {
    let q = moveInOrder(full(2, 2), 3, 0);
    expect(names(quiltingOrder(q))).toBe('11 00 01 10');
    q = keepHandOrder(clearCell(q, 0, 0));
    expect(names(quiltingOrder(q))).toBe('11 01 10');
    q = keepHandOrder(placeDesign(q, 0, 0, 'x'));
    expect(names(quiltingOrder(q))).toBe('11 01 10 00');
    q = keepHandOrder(clearCell(q, 0, 1));
    q = swapInHandOrder(moveBlock(q, { row: 1, column: 1 }, { row: 0, column: 1 }), { row: 1, column: 1 }, { row: 0, column: 1 });
    expect(names(quiltingOrder(q))).toBe('01 10 00');
  });

  it('after any run of edits the hand order still names every filled cell exactly once (the schema accepts it)', () => {
    const cell = fc.record({ row: fc.integer({ min: 0, max: 2 }), column: fc.integer({ min: 0, max: 2 }) });
    const edit = fc.oneof(
      cell.map((c) => (x: Quilt) => keepHandOrder(placeDesign(x, c.row, c.column, 'a'))),
      cell.map((c) => (x: Quilt) => keepHandOrder(clearCell(x, c.row, c.column))),
      fc.tuple(cell, cell).map(([a, b]) => (x: Quilt) => swapInHandOrder(moveBlock(x, a, b), a, b)),
      fc.tuple(fc.nat(9), fc.nat(9)).map(([a, b]) => (x: Quilt) => moveInOrder(x, a, b)),
      fc.constantFrom('rows', 'serpentine', 'hand').map((k) => (x: Quilt) => setOrderKind(x, k as 'rows')),
    );
    fc.assert(
      fc.property(fc.array(edit, { maxLength: 30 }), (edits) => {
        const end = edits.reduce((x, f) => f(x), setOrderKind(newQuilt('in', 3, 3, 10), 'hand'));
        expect(quiltSchema.safeParse(end).success).toBe(true);
        expect(quiltingOrder(end).length).toBe(end.placements.flat().filter((p) => p !== null).length);
      }),
    );
  });
});
