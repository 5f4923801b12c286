import { describe, expect, it } from 'vitest';
import { bindingAllowanceOf, quiltSchema } from './quilt.schema.ts';

const base = {
  version: 1,
  units: 'in',
  rows: 1,
  columns: 2,
  block: { width: 12, height: 12 },
  placements: [[{ designId: 'a' }, null]],
};

describe('quiltSchema', () => {
  it('applies defaults: no sashing, no borders, unturned placements, row order', () => {
    const q = quiltSchema.parse(base);
    expect(q.sashing).toBe(0);
    expect(q.borders).toEqual([]);
    expect(q.placements[0]![0]).toEqual({ designId: 'a', rotation: 0, mirror: false });
    expect(q.order).toEqual({ kind: 'rows' });
  });

  it('refuses a map whose rows or cells do not match the grid', () => {
    expect(quiltSchema.safeParse({ ...base, rows: 2 }).success).toBe(false);
    expect(quiltSchema.safeParse({ ...base, placements: [[null]] }).success).toBe(false);
  });

  it('refuses turns other than quarter turns, negative widths and unknown fields', () => {
    expect(quiltSchema.safeParse({ ...base, placements: [[{ designId: 'a', rotation: 45 }, null]] }).success).toBe(false);
    expect(quiltSchema.safeParse({ ...base, sashing: -1 }).success).toBe(false);
    expect(quiltSchema.safeParse({ ...base, borders: [0] }).success).toBe(false);
    expect(quiltSchema.safeParse({ ...base, colour: 'red' }).success).toBe(false);
  });

  it('refuses a quilt over the longest side (120 in), counting sashing and borders', () => {
    const wide = { ...base, rows: 1, columns: 10, placements: [Array.from({ length: 10 }, () => null)] };
    expect(quiltSchema.safeParse({ ...wide, sashing: 0 }).success).toBe(true); // 120 in exactly
    expect(quiltSchema.safeParse({ ...wide, borders: [1] }).success).toBe(false);
  });

  it('checks a hand order against the filled cells', () => {
    expect(quiltSchema.safeParse({ ...base, order: { kind: 'hand', cells: [{ row: 0, column: 0 }] } }).success).toBe(true);
    const bad = quiltSchema.safeParse({ ...base, order: { kind: 'hand', cells: [{ row: 0, column: 1 }] } });
    expect(bad.success).toBe(false);
    expect(bad.error?.issues[0]?.path).toEqual(['order', 'cells']);
  });

  it('defaults the binding allowance to 1/4 in or 0.635 cm (common practice, no source)', () => {
    expect(bindingAllowanceOf({ units: 'in' })).toBe(0.25);
    expect(bindingAllowanceOf({ units: 'cm' })).toBeCloseTo(0.25 * 2.54, 12);
    expect(bindingAllowanceOf({ units: 'in', bindingAllowance: 0.375 })).toBe(0.375);
  });
});
