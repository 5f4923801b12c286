import { describe, expect, it } from 'vitest';
import { convertQuilt } from './convertQuilt.ts';
import { finishedSize } from './finishedSize.ts';
import { quiltSchema } from './quilt.schema.ts';

describe('convertQuilt', () => {
  it('redraws every length in centimetres (1 in = 2.54 cm) and keeps the shrinkage percentage', () => {
    const q = quiltSchema.parse({ version: 1, units: 'in', rows: 2, columns: 3, block: { width: 12, height: 12 }, placements: [[null, null, null], [null, null, null]], sashing: 2, borders: [3], trim: { seamAllowance: 0.25, shrinkage: 3, margin: 1 } });
    const c = convertQuilt(q, 'cm');
    // Finished size: 3·12 + 2·2 + 2·3 = 46 in and 2·12 + 2 + 6 = 32 in → 116.84 × 81.28 cm.
    expect(finishedSize(c).width).toBeCloseTo(116.84, 9);
    expect(finishedSize(c).height).toBeCloseTo(81.28, 9);
    expect(c.trim).toEqual({ seamAllowance: 0.635, shrinkage: 3, margin: 2.54 });
    expect(convertQuilt(c, 'in').block.width).toBeCloseTo(12, 12);
  });
});
