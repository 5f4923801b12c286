/** Quilt fixtures for the quilt core's tests: random small quilts (fast-check) and a plain builder. */
import fc from 'fast-check';
import type { Units } from '../design/design.schema.ts';
import { quiltSchema, type Placement, type Quilt, type Rotation } from './quilt.schema.ts';

export interface QuiltShape {
  readonly rows: number;
  readonly columns: number;
  readonly units?: Units;
  readonly block?: { width: number; height: number };
  readonly sashing?: number;
  readonly borders?: number[];
  readonly bindingAllowance?: number;
  /** Cells left empty, as `row*columns + column`. */
  readonly empty?: readonly number[];
}

/** A quilt with every cell (but `empty`) holding design `d<row>-<column>` unturned. */
export function makeQuilt(shape: QuiltShape): Quilt {
  const placements: (Placement | null)[][] = [];
  for (let r = 0; r < shape.rows; r++) {
    const row: (Placement | null)[] = [];
    for (let c = 0; c < shape.columns; c++) {
      row.push(shape.empty?.includes(r * shape.columns + c) ? null : { designId: `d${r}-${c}`, rotation: 0, mirror: false });
    }
    placements.push(row);
  }
  return quiltSchema.parse({
    version: 1,
    units: shape.units ?? 'in',
    rows: shape.rows,
    columns: shape.columns,
    block: shape.block ?? { width: 12, height: 12 },
    placements,
    sashing: shape.sashing ?? 0,
    borders: shape.borders ?? [],
    ...(shape.bindingAllowance !== undefined ? { bindingAllowance: shape.bindingAllowance } : {}),
  });
}

/** Lengths on a 1/8 in grid, as a quilter measures. */
const eighths = (min: number, max: number): fc.Arbitrary<number> => fc.integer({ min: min * 8, max: max * 8 }).map((k) => k / 8);

/** Random quilts in inches: 1–`maxRows` × 1–`maxColumns`, 3–16 in blocks, 0–3 in sashing, up to 3 borders, at most 120 in a side. */
export function quiltArb(maxRows: number, maxColumns: number): fc.Arbitrary<Quilt> {
  return fc
    .record({
      rows: fc.integer({ min: 1, max: maxRows }),
      columns: fc.integer({ min: 1, max: maxColumns }),
      width: eighths(3, 16),
      height: eighths(3, 16),
      sashing: fc.oneof(fc.constant(0), eighths(0, 3)),
      borders: fc.array(eighths(0.5, 6), { maxLength: 3 }),
      bindingAllowance: fc.constantFrom(0, 0.25, 0.375, 0.5),
      turns: fc.array(fc.record({ rotation: fc.constantFrom<Rotation>(0, 90, 180, 270), mirror: fc.boolean() }), { minLength: 400, maxLength: 400 }),
    })
    // Keep within the 120 in longest side the schema allows.
    .filter((q) => {
      const b = 2 * q.borders.reduce((s, x) => s + x, 0);
      return q.columns * q.width + (q.columns - 1) * q.sashing + b <= 120 && q.rows * q.height + (q.rows - 1) * q.sashing + b <= 120;
    })
    .map((q) => {
      const quilt = makeQuilt({ rows: q.rows, columns: q.columns, block: { width: q.width, height: q.height }, sashing: q.sashing, borders: q.borders, bindingAllowance: q.bindingAllowance });
      const placements = quilt.placements.map((row, r) => row.map((p, c) => (p ? { ...p, ...q.turns[r * q.columns + c]! } : null)));
      return { ...quilt, placements };
    });
}
