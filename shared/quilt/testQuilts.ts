/** Quilt fixtures for the quilt core's tests: a plain builder and seeded random quilts (no fast-check here: shared/ may not import it). */
import type { Units } from '../design/design.schema.ts';
import { seededRandom } from '../seededRandom.ts';
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

/**
 * A random quilt in inches from a seed (mulberry32, so a failing seed can be pinned): 1–`maxRows` × 1–`maxColumns`,
 * 3–16 in blocks, no sashing or 1/8–3 in, up to 3 borders of 1/2–6 in, all on a 1/8 in grid as a quilter measures,
 * a binding allowance of 0, 1/4, 3/8 or 1/2 in, every cell filled with a random turn and mirror, and at most 120 in a
 * side (the schema's cap; drawn again until it fits). Property tests draw the seed with fast-check.
 */
export function randomQuilt(seed: number, maxRows: number, maxColumns: number): Quilt {
  const rnd = seededRandom(seed);
  const int = (min: number, max: number): number => min + Math.floor(rnd() * (max - min + 1));
  const eighths = (min: number, max: number): number => int(min * 8, max * 8) / 8;
  for (;;) {
    const rows = int(1, maxRows);
    const columns = int(1, maxColumns);
    const width = eighths(3, 16);
    const height = eighths(3, 16);
    const sashing = rnd() < 0.3 ? 0 : eighths(0.125, 3);
    const borders = Array.from({ length: int(0, 3) }, () => eighths(0.5, 6));
    const b = 2 * borders.reduce((s, x) => s + x, 0);
    if (columns * width + (columns - 1) * sashing + b > 120 || rows * height + (rows - 1) * sashing + b > 120) continue;
    const quilt = makeQuilt({ rows, columns, block: { width, height }, sashing, borders, bindingAllowance: [0, 0.25, 0.375, 0.5][int(0, 3)]! });
    const turns: Rotation[] = [0, 90, 180, 270];
    const placements = quilt.placements.map((row) => row.map((p) => (p ? { ...p, rotation: turns[int(0, 3)]!, mirror: rnd() < 0.5 } : null)));
    return { ...quilt, placements };
  }
}
