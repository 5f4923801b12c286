import { describe, expect, it } from 'vitest';
import { quiltSchema } from '../quilt/quilt.schema.ts';
import { layoutQuiltMap } from './quiltMapLayout.ts';

const p = { designId: 'd' };

describe('layoutQuiltMap', () => {
  it('scales the whole quilt into the area, keeps its proportions and numbers the blocks in the quilt’s order', () => {
    // 2 × 3 blocks of 10 in, sashing 2, border 4: 3·10 + 2·2 + 8 = 42 wide, 2·10 + 2 + 8 = 30 long.
    const q = quiltSchema.parse({ version: 1, units: 'in', rows: 2, columns: 3, block: { width: 10, height: 10 }, placements: [[p, p, p], [p, null, p]], sashing: 2, borders: [4], order: { kind: 'serpentine' } });
    const m = layoutQuiltMap(q, { x: 0, y: 0, width: 420, height: 600 });
    expect(m.scale).toBeCloseTo(10, 12);
    expect(m.outline).toEqual({ x: 0, y: 0, width: 420, height: 300 });
    expect(m.cells.find((c) => c.cell.row === 1 && c.cell.column === 2)!.box).toEqual({ x: 40 + 2 * 120, y: 40 + 120, width: 100, height: 100 });
    // Serpentine: top row left to right (1, 2, 3), bottom row right to left, the empty cell skipped (4, –, 5).
    expect(m.cells.map((c) => c.order)).toEqual([1, 2, 3, 5, null, 4]);
  });
});
