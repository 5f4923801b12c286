import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { quiltSchema, type Quilt } from '@shared/quilt/quilt.schema.ts';
import { finishedSize } from '@shared/quilt/finishedSize.ts';
import { budgetOf, clearCell, moveBlock, newQuilt, placeDesign, toggleMirror, trimTableOf, turnQuarter } from './quiltEdits.ts';
import { addBorder, setSashing } from './quiltFrameEdits.ts';
import type { DesignSummary } from '@shared/contract/figures.ts';

describe('quilt map edits', () => {
  it('a new map passes the shared quilt schema unchanged, and so does every edit', () => {
    let q = newQuilt('in', 2, 3, 12);
    expect(quiltSchema.parse(q)).toEqual(q);
    q = placeDesign(q, 1, 2, 'design-a');
    q = turnQuarter(q, 1, 2);
    q = toggleMirror(q, 1, 2);
    q = addBorder(setSashing(q, 2), 3);
    expect(quiltSchema.parse(q)).toEqual(q);
    expect(q.placements[1]![2]).toEqual({ designId: 'design-a', rotation: 90, mirror: true });
    expect(q.placements[0]).toEqual([null, null, null]);
  });

  it('four quarter turns bring a block back; a new design keeps the cell’s turn; an empty cell stays empty', () => {
    let q = placeDesign(newQuilt('in', 2, 2, 12), 0, 0, 'a');
    const turns: number[] = [];
    for (let i = 0; i < 4; i++) {
      q = turnQuarter(q, 0, 0);
      turns.push(q.placements[0]![0]!.rotation);
    }
    expect(turns).toEqual([90, 180, 270, 0]);
    q = placeDesign(turnQuarter(q, 0, 0), 0, 0, 'b');
    expect(q.placements[0]![0]).toEqual({ designId: 'b', rotation: 90, mirror: false });
    expect(turnQuarter(q, 1, 1).placements[1]![1]).toBeNull();
    expect(placeDesign(q, 0, 0, null).placements[0]![0]).toBeNull();
  });

  it('sashing and a border give the finished size of the worked check (issue 15): 3 × 3 of 12 in, 3 in border → 42 in', () => {
    // Arithmetic of the layout, not a source: 3·12 + 2·0 + 2·3 = 42.
    const q = addBorder(newQuilt('in', 3, 3, 12), 3);
    expect(finishedSize(q)).toEqual({ width: 42, height: 42 });
    // With 2 in sashing: 3·12 + 2·2 + 2·3 = 46.
    expect(finishedSize(setSashing(q, 2))).toEqual({ width: 46, height: 46 });
  });

  it('trim table has one row per placed block, in reading order', () => {
    let q = addBorder(newQuilt('in', 3, 3, 12), 3);
    for (let r = 0; r < 3; r++) for (let c = 0; c < 3; c++) q = placeDesign(q, r, c, `d${r}${c}`);
    const t = trimTableOf(q);
    if (!('rows' in t)) throw new Error(t.problem);
    expect(t.rows).toHaveLength(9);
    expect(t.assumptions.map((a) => a.setting).sort()).toEqual(['margin', 'seamAllowance', 'shrinkage']);
    expect(t.rows.map((r) => r.position)).toEqual(['corner', 'edge', 'corner', 'edge', 'inner', 'edge', 'corner', 'edge', 'corner']);
  });

  it('the budget waits for every placed design’s figures and adds the blocks’ passes when it has them', () => {
    const summary = (passes: number): DesignSummary => ({
      units: 'in', passes, stops: passes - 1, pieces: 1, oddPoints: 0, stitchLength: 100, travelLength: 10, retraceLength: 0, ditchLength: 10, edgeLength: 0,
      travelLowerBound: 10, optimal: true, thread: { totalYards: 1, topYards: 0.5, bobbinYards: 0.5, bobbins: 1, stitches: 1000, minutes: 5 },
    });
    const q = placeDesign(placeDesign(newQuilt('in', 1, 2, 12), 0, 0, 'a'), 0, 1, 'b');
    expect(budgetOf(q, new Map([['a', summary(1)]])).budget).toBeNull();
    expect(budgetOf(q, new Map([['a', summary(1)]])).missing).toBe(1);
    const { budget } = budgetOf(q, new Map([['a', summary(1)], ['b', summary(2)]]));
    expect(budget?.passes).toBe(3);
    expect(budget?.stitchLength).toBe(200);
    expect(budget?.chained).toBe(false);
  });
});

describe('placing, replacing, moving and clearing blocks', () => {
  it('a design dropped on a filled cell replaces the design and keeps the cell’s turn and mirror', () => {
    let q = toggleMirror(turnQuarter(placeDesign(newQuilt('in', 1, 2, 12), 0, 0, 'a'), 0, 0), 0, 0);
    q = placeDesign(q, 0, 0, 'b');
    expect(q.placements[0]![0]).toEqual({ designId: 'b', rotation: 90, mirror: true });
  });

  it('moving a block swaps it with what is in the target cell, turn and mirror travelling with each block', () => {
    let q = placeDesign(newQuilt('in', 2, 2, 12), 0, 0, 'a');
    q = turnQuarter(q, 0, 0);
    q = placeDesign(q, 1, 1, 'b');
    const moved = moveBlock(q, { row: 0, column: 0 }, { row: 1, column: 1 });
    expect(moved.placements).toEqual([[{ designId: 'b', rotation: 0, mirror: false }, null], [null, { designId: 'a', rotation: 90, mirror: false }]]);
    const toEmpty = moveBlock(q, { row: 0, column: 0 }, { row: 0, column: 1 });
    expect(toEmpty.placements[0]).toEqual([null, { designId: 'a', rotation: 90, mirror: false }]);
    expect(moveBlock(q, { row: 1, column: 1 }, { row: 1, column: 1 })).toEqual(q);
    expect(() => moveBlock(q, { row: 2, column: 0 }, { row: 0, column: 0 })).toThrow(/outside/);
  });

  it('clearing empties the cell and the map still passes the schema; a random run of edits never leaves the schema', () => {
    const q = clearCell(placeDesign(newQuilt('in', 2, 2, 12), 0, 1, 'a'), 0, 1);
    expect(q.placements).toEqual([[null, null], [null, null]]);
    const cell = fc.record({ row: fc.integer({ min: 0, max: 2 }), column: fc.integer({ min: 0, max: 3 }) });
    const edit = fc.oneof(
      fc.record({ c: cell, d: fc.constantFrom('a', 'b', 'c') }).map(({ c, d }) => (x: Quilt) => placeDesign(x, c.row, c.column, d)),
      cell.map((c) => (x: Quilt) => clearCell(x, c.row, c.column)),
      cell.map((c) => (x: Quilt) => turnQuarter(x, c.row, c.column)),
      cell.map((c) => (x: Quilt) => toggleMirror(x, c.row, c.column)),
      fc.tuple(cell, cell).map(([a, b]) => (x: Quilt) => moveBlock(x, a, b)),
    );
    fc.assert(
      fc.property(fc.array(edit, { maxLength: 25 }), (edits) => {
        const start = newQuilt('in', 3, 4, 10);
        const end = edits.reduce((x, f) => f(x), start);
        expect(quiltSchema.parse(end)).toEqual(end);
        expect(end.placements.map((r) => r.length)).toEqual([4, 4, 4]);
      }),
    );
  });
});
