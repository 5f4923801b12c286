import { z } from 'zod';
import { DESIGN_LIMITS, threadSettingsSchema, unitsSchema } from '../design/design.schema.ts';
import { checkHandOrder } from './order.ts';

/**
 * The stored quilt format (version 1): a quilt map of rows × columns of cells, each empty or holding a placed design,
 * with sashing between the blocks and borders around them. Lengths are in the quilt's own `units`; the origin is the
 * finished quilt's top-left corner, x right, y down (toward the quilter), as for designs.
 */
export const QUILT_VERSION = 1 as const;

export const QUILT_LIMITS = {
  /** Rows and columns of blocks: 20 × 20 = 400 blocks is far beyond a king-size quilt of 6 in blocks. */
  maxRows: 20,
  maxColumns: 20,
  /** At most this many borders around the blocks. */
  maxBorders: 6,
  /** Longest finished side, as for a design (120 in / 305 cm). */
  maxSide: DESIGN_LIMITS.maxSide,
} as const;

/** Quarter turns, clockwise as seen on the quilt top. */
export const rotationSchema = z.union([z.literal(0), z.literal(90), z.literal(180), z.literal(270)]);
export type Rotation = z.infer<typeof rotationSchema>;

/**
 * How a design sits in its cell: first mirrored left-to-right when `mirror` is true, then turned clockwise by
 * `rotation` degrees (cornerMap.ts holds the exact mapping).
 */
export const orientationSchema = z.object({ rotation: rotationSchema.default(0), mirror: z.boolean().default(false) }).strict();
export type Orientation = z.infer<typeof orientationSchema>;

export const placementSchema = z
  .object({
    /** The placed design (its id as the server stores it). */
    designId: z.string().min(1).max(100),
    rotation: rotationSchema.default(0),
    mirror: z.boolean().default(false),
  })
  .strict();
export type Placement = z.infer<typeof placementSchema>;

/** A cell of the quilt map, counted from the top-left block: row 0 is the top row, column 0 the left column. */
export const cellSchema = z.object({ row: z.number().int().min(0), column: z.number().int().min(0) }).strict();
export type Cell = z.infer<typeof cellSchema>;

/**
 * Order in which the blocks are quilted: row by row from the top left (`rows`), the same but every other row right
 * to left (`serpentine`), or the quilter's own order of the filled cells (`hand`, checked by order.ts).
 */
export const quiltOrderSchema = z.discriminatedUnion('kind', [
  z.object({ kind: z.literal('rows') }).strict(),
  z.object({ kind: z.literal('serpentine') }).strict(),
  z.object({ kind: z.literal('hand'), cells: z.array(cellSchema).max(QUILT_LIMITS.maxRows * QUILT_LIMITS.maxColumns) }).strict(),
]);
export type QuiltOrder = z.infer<typeof quiltOrderSchema>;

const length = z.number().finite();

export const quiltSchema = z
  .object({
    version: z.literal(QUILT_VERSION),
    units: unitsSchema,
    rows: z.number().int().min(1).max(QUILT_LIMITS.maxRows),
    columns: z.number().int().min(1).max(QUILT_LIMITS.maxColumns),
    /** Finished size of every block as it sits in the quilt (after rotation), in quilt units. */
    block: z.object({ width: length.positive(), height: length.positive() }).strict(),
    /** `placements[row][column]`: the design in that cell, or null while the cell is empty. */
    placements: z.array(z.array(placementSchema.nullable())),
    /** Finished width of the sashing strips between neighbouring blocks (0: blocks sewn straight together). */
    sashing: length.min(0).default(0),
    /** Finished widths of the borders, innermost first. */
    borders: z.array(length.positive()).max(QUILT_LIMITS.maxBorders).default([]),
    /** What lies beyond the finished edge until the binding is sewn on (its seam allowance), in quilt units. */
    bindingAllowance: length.min(0).optional(),
    order: quiltOrderSchema.default({ kind: 'rows' }),
    /** Thread-budget settings for the whole quilt (threadBudget.ts names the defaults' sources). */
    thread: threadSettingsSchema.optional(),
  })
  .strict()
  .superRefine((quilt, ctx) => {
    if (quilt.placements.length !== quilt.rows) {
      ctx.addIssue({ code: 'custom', path: ['placements'], message: `the map has ${quilt.placements.length} rows; the quilt has ${quilt.rows}` });
      return;
    }
    quilt.placements.forEach((row, r) => {
      if (row.length !== quilt.columns) {
        ctx.addIssue({ code: 'custom', path: ['placements', r], message: `row ${r + 1} has ${row.length} cells; the quilt has ${quilt.columns} columns` });
      }
    });
    const maxSide = QUILT_LIMITS.maxSide[quilt.units];
    const borders = quilt.borders.reduce((s, b) => s + b, 0);
    const width = quilt.columns * quilt.block.width + (quilt.columns - 1) * quilt.sashing + 2 * borders;
    const height = quilt.rows * quilt.block.height + (quilt.rows - 1) * quilt.sashing + 2 * borders;
    if (width > maxSide) ctx.addIssue({ code: 'custom', path: ['columns'], message: `the finished quilt is over ${maxSide} ${quilt.units} wide` });
    if (height > maxSide) ctx.addIssue({ code: 'custom', path: ['rows'], message: `the finished quilt is over ${maxSide} ${quilt.units} long` });
    if (quilt.order.kind === 'hand') {
      const checked = checkHandOrder(quilt, quilt.order.cells);
      if (!checked.ok) ctx.addIssue({ code: 'custom', path: ['order', 'cells'], message: checked.error.message });
    }
  });

/** A validated quilt (defaults applied). */
export type Quilt = z.infer<typeof quiltSchema>;
/** A quilt as it may arrive. */
export type QuiltInput = z.input<typeof quiltSchema>;

/** Binding allowance in the quilt's units: as set, else 1/4 in (common practice, no source). */
export function bindingAllowanceOf(quilt: Pick<Quilt, 'units' | 'bindingAllowance'>): number {
  return quilt.bindingAllowance ?? (quilt.units === 'in' ? 0.25 : 0.635);
}
