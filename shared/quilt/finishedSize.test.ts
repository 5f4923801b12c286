import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { blockCorners, blockRect, finishedSize } from './finishedSize.ts';
import { formatLength } from './formatLength.ts';
import { gridForSize, presetSize, QUILT_SIZE_PRESETS } from './quiltSizes.ts';
import { makeQuilt, quiltArb } from './testQuilts.ts';

describe('finishedSize', () => {
  it('worked by hand: 3 × 4 blocks of 12 in, 2 in sashing, borders 1 in and 3 in → 48 in × 62 in', () => {
    // width 3·12 + 2·2 + 2·(1 + 3) = 36 + 4 + 8 = 48; height 4·12 + 3·2 + 8 = 48 + 6 + 8 = 62.
    const q = makeQuilt({ rows: 4, columns: 3, sashing: 2, borders: [1, 3] });
    expect(finishedSize(q)).toEqual({ width: 48, height: 62 });
    expect(blockRect(q, { row: 1, column: 2 })).toEqual({ x: 4 + 2 * 14, y: 4 + 14, width: 12, height: 12 });
  });

  it('the last block ends one border width before the edge, and blocks never overlap (laid out edge to edge)', () => {
    fc.assert(
      fc.property(quiltArb(6, 6), (q) => {
        const size = finishedSize(q);
        const border = q.borders.reduce((s, b) => s + b, 0);
        const last = blockRect(q, { row: q.rows - 1, column: q.columns - 1 });
        expect(last.x + last.width + border).toBeCloseTo(size.width, 9);
        expect(last.y + last.height + border).toBeCloseTo(size.height, 9);
        for (let c = 1; c < q.columns; c++) {
          const a = blockRect(q, { row: 0, column: c - 1 });
          const b = blockRect(q, { row: 0, column: c });
          expect(b.x - (a.x + a.width)).toBeCloseTo(q.sashing, 9);
        }
        const [tl, tr, br, bl] = blockCorners(q, { row: 0, column: 0 });
        expect([tl, tr, br, bl]).toEqual([[border, border], [border + q.block.width, border], [border + q.block.width, border + q.block.height], [border, border + q.block.height]]);
      }),
    );
  });
});

describe('quiltSizes', () => {
  it('labels the presets and converts them to whole centimetres', () => {
    const crib = QUILT_SIZE_PRESETS.find((p) => p.key === 'crib')!;
    expect(presetSize(crib, 'in')).toEqual({ width: 36, height: 52 });
    expect(presetSize(crib, 'cm')).toEqual({ width: 91, height: 132 });
  });

  it('picks the grid nearest the target: a twin (70 × 90) of 12 in blocks, 2 in sashing, 4 in border → 4 × 5', () => {
    // columns: (70 − 8 + 2)/14 = 4.57 → 4 gives 62, 5 gives 76: |62−70| = 8 > |76−70| = 6 → 5; rows: (90−8+2)/14 = 6 → 6.
    expect(gridForSize({ width: 70, height: 90 }, { block: { width: 12, height: 12 }, sashing: 2, borders: [4] }, 20)).toEqual({ columns: 5, rows: 6 });
  });

  it('no other count comes nearer the target', () => {
    fc.assert(
      fc.property(quiltArb(1, 1), fc.integer({ min: 20, max: 120 }), fc.integer({ min: 20, max: 120 }), (q, w, h) => {
        const g = gridForSize({ width: w, height: h }, q, 20);
        const off = (cols: number): number => Math.abs(finishedSize({ ...q, columns: cols, rows: 1 }).width - w);
        for (let k = 1; k <= 20; k++) expect(off(g.columns)).toBeLessThanOrEqual(off(k) + 1e-9);
      }),
    );
  });
});

describe('formatLength', () => {
  it('writes inches in eighths, reduced, and centimetres to one decimal', () => {
    expect(formatLength(42, 'in')).toBe('42 in');
    expect(formatLength(42.375, 'in')).toBe('42 3/8 in');
    expect(formatLength(0.25, 'in')).toBe('1/4 in');
    expect(formatLength(12.49, 'in')).toBe('12 1/2 in');
    expect(formatLength(-0.125, 'in')).toBe('−1/8 in');
    expect(formatLength(106.68, 'cm')).toBe('106.7 cm');
  });
});
