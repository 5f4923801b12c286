import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { checkHandOrder, orderCells, rowOrder, serpentineOrder } from './order.ts';
import { makeQuilt } from './testQuilts.ts';

const gridArb = fc
  .record({ rows: fc.integer({ min: 1, max: 6 }), columns: fc.integer({ min: 1, max: 6 }), empty: fc.array(fc.integer({ min: 0, max: 35 }), { maxLength: 6 }) })
  .map((s) => makeQuilt(s));

describe('rowOrder and serpentineOrder', () => {
  it('2 × 3: rows read like a page; serpentine turns back on the second row', () => {
    const q = makeQuilt({ rows: 2, columns: 3 });
    const cells = (list: { row: number; column: number }[]): string => list.map((c) => `${c.row}${c.column}`).join(' ');
    expect(cells(rowOrder(q))).toBe('00 01 02 10 11 12');
    expect(cells(serpentineOrder(q))).toBe('00 01 02 12 11 10');
  });

  it('skips empty cells', () => {
    const q = makeQuilt({ rows: 2, columns: 2, empty: [1] });
    expect(rowOrder(q)).toEqual([{ row: 0, column: 0 }, { row: 1, column: 0 }, { row: 1, column: 1 }]);
  });

  it('on a full map serpentine steps only to a neighbouring cell (each step is one block over or down)', () => {
    fc.assert(
      fc.property(fc.integer({ min: 1, max: 8 }), fc.integer({ min: 1, max: 8 }), (rows, columns) => {
        const order = serpentineOrder(makeQuilt({ rows, columns }));
        expect(order).toHaveLength(rows * columns);
        for (let i = 1; i < order.length; i++) {
          const a = order[i - 1]!;
          const b = order[i]!;
          expect(Math.abs(a.row - b.row) + Math.abs(a.column - b.column)).toBe(1);
        }
      }),
    );
  });

  it('both are permutations of the filled cells, so both pass the hand-order check', () => {
    fc.assert(
      fc.property(gridArb, (q) => {
        expect(checkHandOrder(q, rowOrder(q)).ok).toBe(true);
        expect(checkHandOrder(q, serpentineOrder(q)).ok).toBe(true);
      }),
    );
  });
});

describe('checkHandOrder', () => {
  it('accepts every shuffle of the filled cells', () => {
    fc.assert(
      fc.property(
        gridArb.chain((q) => fc.shuffledSubarray(rowOrder(q), { minLength: rowOrder(q).length }).map((cells) => ({ q, cells }))),
        ({ q, cells }) => {
          const r = orderCells(q, { kind: 'hand', cells });
          expect(r.ok && r.value).toEqual(cells);
        },
      ),
    );
  });

  it('names the problem: a repeated, missing, empty or outside cell', () => {
    const q = makeQuilt({ rows: 2, columns: 2, empty: [3] });
    const kind = (cells: { row: number; column: number }[]): string => {
      const r = checkHandOrder(q, cells);
      return r.ok ? 'ok' : r.error.kind;
    };
    expect(kind([{ row: 0, column: 0 }, { row: 0, column: 1 }, { row: 1, column: 0 }])).toBe('ok');
    expect(kind([{ row: 0, column: 0 }, { row: 0, column: 0 }, { row: 0, column: 1 }, { row: 1, column: 0 }])).toBe('repeated-cell');
    expect(kind([{ row: 0, column: 0 }, { row: 1, column: 0 }])).toBe('missing-cell');
    expect(kind([{ row: 0, column: 0 }, { row: 0, column: 1 }, { row: 1, column: 0 }, { row: 1, column: 1 }])).toBe('empty-cell');
    expect(kind([{ row: 2, column: 0 }])).toBe('outside-grid');
  });
});
