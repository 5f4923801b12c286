import { describe, expect, it } from 'vitest';
import { clipLinesToBlock, clipPolylineToBlock, isInsideBlock } from './blockBounds.ts';

const block = { width: 12, height: 12 };

describe('design/blockBounds', () => {
  it('keeps a line inside the block as it is, edges included, and rounding noise on the edge', () => {
    expect(clipPolylineToBlock([[0, 0], [12, 12]], block)).toEqual([[[0, 0], [12, 12]]]);
    expect(isInsideBlock([12 + 1e-9, 6], block)).toBe(true);
    expect(isInsideBlock([12.01, 6], block)).toBe(false);
  });

  it('cuts a line at the edge it crosses (analytic: y = x/2 meets x = 12 at y = 6)', () => {
    expect(clipPolylineToBlock([[0, 0], [16, 8]], block)).toEqual([[[0, 0], [12, 6]]]);
    // Both ends outside, crossing the block: x from -4 to 16 along y = 3 keeps 0..12.
    expect(clipPolylineToBlock([[-4, 3], [16, 3]], block)).toEqual([[[0, 3], [12, 3]]]);
  });

  it('drops a line wholly outside and splits one that leaves and comes back', () => {
    expect(clipPolylineToBlock([[13, 1], [15, 5]], block)).toEqual([]);
    expect(clipPolylineToBlock([[10, 2], [14, 2], [14, 4], [10, 4]], block)).toEqual([[[10, 2], [12, 2]], [[12, 4], [10, 4]]]);
  });

  it('clips only the quilting lines, and returns the same design when nothing is outside', () => {
    const inside = { width: 12, height: 12, lines: [[[1, 1], [2, 2]]] as [number, number][][] };
    expect(clipLinesToBlock(inside)).toBe(inside);
    const outside = { ...inside, lines: [[[6, 6], [14, 6]]] as [number, number][][] };
    expect(clipLinesToBlock(outside).lines).toEqual([[[6, 6], [12, 6]]]);
  });
});
