import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { blockRect, finishedSize } from './finishedSize.ts';
import { bindingAllowanceOf, type Quilt } from './quilt.schema.ts';
import { makeQuilt, quiltArb } from './testQuilts.ts';
import { planTrim, trimSettingsSchema, type TrimPlan } from './trim.ts';

const TOLERANCE = 1 / 64; // in: the check
const defaults = trimSettingsSchema.parse({});

function plan(q: Quilt, settings = defaults): TrimPlan {
  const r = planTrim(q, bindingAllowanceOf(q), settings);
  if (!r.ok) throw new Error(r.error.message);
  return r.value;
}

describe('planTrim: worked check (issue 15)', () => {
  // 3 × 3 blocks of 12 in finished, 1/4 in joins, one 3 in border, 1/4 in binding allowance, no sashing.
  // Corner: 12 + (3 + 1/4) + 1/4 = 15 1/2 square. Edge: 12 1/2 across × 15 1/2 out. Inner: 12 1/2 square.
  // Added up: 15 1/2 + 12 1/2 + 15 1/2 = 43 1/2; two joins take 4 × 1/4 = 1 → 42 1/2; binding takes 2 × 1/4 → 42,
  // which is 3 × 12 + 2 × 3 = 42, the planned size. All values are exact in binary, so the check is exact.
  const q = makeQuilt({ rows: 3, columns: 3, borders: [3], bindingAllowance: 0.25 });
  const p = plan(q, trimSettingsSchema.parse({ seamAllowance: 0.25 }));

  it('cuts corner, edge and inner blocks to the worked sizes', () => {
    const at = (row: number, column: number) => p.blocks.find((b) => b.cell.row === row && b.cell.column === column)!;
    expect(at(0, 0)).toMatchObject({ position: 'corner', cut: { width: 15.5, height: 15.5 } });
    expect(at(0, 1)).toMatchObject({ position: 'edge', cut: { width: 12.5, height: 15.5 } });
    expect(at(1, 1)).toMatchObject({ position: 'inner', cut: { width: 12.5, height: 12.5 } });
    expect(p.blocks.filter((b) => b.position === 'corner')).toHaveLength(4);
    expect(p.blocks.filter((b) => b.position === 'edge')).toHaveLength(4);
  });

  it('the trimmed blocks added up come out at exactly the planned 42 in × 42 in', () => {
    let sum = 0;
    for (const b of p.blocks.filter((b) => b.cell.row === 1)) sum += b.cut.width;
    expect(sum - 2 * 2 * 0.25 - 2 * 0.25).toBe(42);
    expect(p.joined).toEqual({ width: 42.5, height: 42.5 });
    expect(p.bound).toEqual(finishedSize(q));
    expect(finishedSize(q)).toEqual({ width: 42, height: 42 });
  });
});

describe('planTrim: property', () => {
  /**
   * Sews the trimmed blocks together on paper: each block's cut rectangle is laid so that its joining seam line
   * (one seam allowance in from its cut edge) lies on its neighbour's. The joined top must match the planned
   * finished size once the binding allowance is taken off, and every block's finished square must land where the
   * quilt map puts it, both to 1/64 in.
   */
  it('the joined quilt equals the planned finished size, and every block lands on its place in the map', () => {
    fc.assert(
      fc.property(quiltArb(5, 5), fc.constantFrom(0.25, 0.375, 0.5), (q, seam) => {
        const p = plan(q, trimSettingsSchema.parse({ seamAllowance: seam }));
        const size = finishedSize(q);
        const binding = bindingAllowanceOf(q);
        const at = (row: number, column: number) => p.blocks.find((b) => b.cell.row === row && b.cell.column === column)!;
        const keep = (b: ReturnType<typeof at>, side: string) => b.sides.find((s) => s.side === side)!.keep;
        for (let row = 0; row < q.rows; row++) {
          let x = 0; // left cut edge of the block, in the joined top's coordinates
          for (let column = 0; column < q.columns; column++) {
            const b = at(row, column);
            if (column > 0) x -= 2 * seam; // the seam lines of neighbours meet
            expect(Math.abs(x + keep(b, 'left') - binding - blockRect(q, b.cell).x)).toBeLessThanOrEqual(TOLERANCE);
            x += b.cut.width;
          }
          expect(Math.abs(x - 2 * binding - size.width)).toBeLessThanOrEqual(TOLERANCE);
        }
        for (let column = 0; column < q.columns; column++) {
          let y = 0;
          for (let row = 0; row < q.rows; row++) {
            const b = at(row, column);
            if (row > 0) y -= 2 * seam;
            expect(Math.abs(y + keep(b, 'top') - binding - blockRect(q, b.cell).y)).toBeLessThanOrEqual(TOLERANCE);
            y += b.cut.height;
          }
          expect(Math.abs(y - 2 * binding - size.height)).toBeLessThanOrEqual(TOLERANCE);
        }
        expect(Math.abs(p.bound.width - size.width)).toBeLessThanOrEqual(TOLERANCE);
        expect(Math.abs(p.bound.height - size.height)).toBeLessThanOrEqual(TOLERANCE);
      }),
      { numRuns: 300 },
    );
  });
});

describe('planTrim: shrinkage and margin', () => {
  const q = makeQuilt({ rows: 2, columns: 2, borders: [2] });

  it('without shrinkage every side trims exactly the margin', () => {
    const p = plan(q, trimSettingsSchema.parse({ shrinkage: 0, margin: 1.5 }));
    for (const b of p.blocks) for (const s of b.sides) expect(s.trim).toBeCloseTo(1.5, 12);
  });

  it('worked by hand at 3 %: an outer side 6 + 2 + 1/4 = 8 1/4 from the centre, 1 in margin → trim 0.97 × 9.25 − 8.25', () => {
    const p = plan(q);
    const top = p.blocks[0]!.sides.find((s) => s.side === 'top')!;
    expect(top.cutFromCentre).toBe(8.25);
    expect(top.trim).toBeCloseTo(0.97 * 9.25 - 8.25, 12); // 0.7225 in
    expect(p.blocks[0]!.before).toEqual({ width: 12 + 2.25 + 0.25 + 2, height: 12 + 2.25 + 0.25 + 2 });
  });

  it('refuses a margin that quilting would eat, naming the least margin that works', () => {
    const r = planTrim(q, 0.25, trimSettingsSchema.parse({ shrinkage: 5, margin: 0.25 }));
    expect(r.ok).toBe(false);
    if (r.ok) return;
    expect(r.error.kind).toBe('margin-too-small');
    // Largest cut from the centre is 8.25 in: 0.05 × 8.25 / 0.95 = 0.434 in.
    expect(r.error.leastMargin).toBeCloseTo((0.05 * 8.25) / 0.95, 12);
    expect(planTrim(q, 0.25, trimSettingsSchema.parse({ shrinkage: 5, margin: r.error.leastMargin })).ok).toBe(true);
  });

  it('uses metric defaults for a quilt in centimetres', () => {
    const cm = makeQuilt({ rows: 2, columns: 1, units: 'cm', block: { width: 30, height: 30 } });
    const p = plan(cm);
    expect(p.seamAllowance).toBeCloseTo(0.635, 12);
    expect(p.margin).toBe(2.5);
    expect(p.bound.height).toBeCloseTo(finishedSize(cm).height, 9);
  });
});
