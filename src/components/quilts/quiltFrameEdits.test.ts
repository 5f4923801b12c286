import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { QUILT_LIMITS, quiltSchema } from '@shared/quilt/quilt.schema.ts';
import { finishedSize } from '@shared/quilt/finishedSize.ts';
import { formatQuiltSize } from '@shared/quilt/formatLength.ts';
import { newQuilt } from './quiltEdits.ts';
import { addBorder, removeBorder, setBorderWidth, setSashing, sizesByBorder } from './quiltFrameEdits.ts';

describe('sashing and borders', () => {
  it('worked example: 3 × 3 blocks of 12 in, 2 in sashing, borders of 1 1/2 in and 4 in', () => {
    // Arithmetic of the layout, not a source: 3·12 + 2·2 = 40; + 2·1.5 = 43; + 2·4 = 51.
    const q = addBorder(addBorder(setSashing(newQuilt('in', 3, 3, 12), 2), 1.5), 4);
    expect(q.borders).toEqual([1.5, 4]);
    expect(sizesByBorder(q).map((s) => s.width)).toEqual([40, 43, 51]);
    expect(finishedSize(q)).toEqual({ width: 51, height: 51 });
    // 51 in = 129.54 cm with 1 in = 2.54 cm exactly (the international inch).
    expect(formatQuiltSize(51, 51, 'in', 'cm')).toBe('129.5 × 129.5 cm');
    expect(quiltSchema.parse(q)).toEqual(q);
  });

  it('a border is changed or taken away by its place; a width not above 0 changes nothing', () => {
    let q = addBorder(addBorder(addBorder(newQuilt('in', 2, 2, 10), 1), 2), 3);
    q = setBorderWidth(q, 1, 2.625);
    expect(q.borders).toEqual([1, 2.625, 3]);
    expect(setBorderWidth(q, 0, 0)).toBe(q);
    expect(setBorderWidth(q, 5, 1)).toBe(q);
    expect(removeBorder(q, 0).borders).toEqual([2.625, 3]);
    expect(setSashing(q, -1).sashing).toBe(0);
  });

  it(`never more than ${QUILT_LIMITS.maxBorders} borders; the finished size grows by twice each border`, () => {
    fc.assert(
      fc.property(fc.array(fc.double({ min: 0.125, max: 6, noNaN: true }), { maxLength: 10 }), fc.double({ min: 0, max: 4, noNaN: true }), (widths, sashing) => {
        const q = widths.reduce((x, w) => addBorder(x, w), setSashing(newQuilt('in', 3, 2, 8), sashing));
        expect(q.borders.length).toBe(Math.min(widths.length, QUILT_LIMITS.maxBorders));
        const sizes = sizesByBorder(q);
        q.borders.forEach((b, k) => {
          expect(sizes[k + 1]!.width - sizes[k]!.width).toBeCloseTo(2 * b, 9);
          expect(sizes[k + 1]!.height - sizes[k]!.height).toBeCloseTo(2 * b, 9);
        });
      }),
    );
  });
});
