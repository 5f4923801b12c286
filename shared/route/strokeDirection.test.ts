import { describe, expect, it } from 'vitest';
import { findStrokeDirection } from './strokeDirection.ts';

describe('findStrokeDirection', () => {
  it('reads y down as toward the quilter', () => {
    expect(findStrokeDirection([[1, 1], [1, 5]])).toBe('toward');
    expect(findStrokeDirection([[1, 5], [1, 1]])).toBe('away');
    expect(findStrokeDirection([[1, 1], [6, 2]])).toBe('right');
    expect(findStrokeDirection([[6, 1], [1, 1.5]])).toBe('left');
  });
  it('calls a 45° diagonal vertical and a bent or closed stroke curved', () => {
    expect(findStrokeDirection([[0, 0], [2, 2]])).toBe('toward');
    expect(findStrokeDirection([[0, 0], [2, 2], [4, 0]])).toBe('curved');
    expect(findStrokeDirection([[0, 0], [2, 0], [2, 2], [0, 0]])).toBe('curved');
    expect(findStrokeDirection([[0, 0], [5, 0], [4, 0]])).toBe('curved');
  });
  it('keeps a nearly straight polyline straight', () => {
    expect(findStrokeDirection([[0, 0], [2, 0.1], [4, 0]])).toBe('right');
  });
});
