import { z } from 'zod';
import { CM_PER_INCH, type Units } from '../design/design.schema.ts';
import { err, ok, type Result } from '../result.ts';
import { bordersWidth, type QuiltFrame, type Size } from './finishedSize.ts';
import type { Cell, Quilt } from './quilt.schema.ts';

/**
 * Quilt-as-you-go settings, in the quilt's units unless said otherwise. Every field has a default:
 * - `seamAllowance`: the seam that joins two quilted blocks: 1/4 in (0.635 cm), common practice, no source;
 * - `shrinkage`: how much quilting draws the sandwich in, in percent of its size: 3 %, from memory (quilters quote
 *   roughly 2–5 %, more for dense quilting and cotton batting);
 * - `margin`: fabric and batting left beyond each side's cut line before quilting: 1 in (2.5 cm), from memory.
 */
export const trimSettingsSchema = z
  .object({
    seamAllowance: z.number().finite().positive().max(2).optional(),
    shrinkage: z.number().finite().min(0).max(20).default(3),
    margin: z.number().finite().min(0).max(10).optional(),
  })
  .strict();
export type TrimSettings = z.output<typeof trimSettingsSchema>;

export const TRIM_SOURCES = {
  seamAllowance: 'common practice, no source',
  shrinkage: 'from memory: quilting draws a sandwich in by roughly 2–5 %',
  margin: 'from memory: about 1 in of batting and backing beyond the cut line',
} as const;

export type Side = 'top' | 'right' | 'bottom' | 'left';
export const SIDES: readonly Side[] = ['top', 'right', 'bottom', 'left'];

/** Where a block sits: `corner` (two or more sides on the quilt's edge), `edge` (one) or `inner` (none). */
export type BlockPosition = 'corner' | 'edge' | 'inner';

export interface SideTrim {
  readonly side: Side;
  /** `inner`: joined to a neighbour; `outer`: on the quilt's edge. */
  readonly faces: 'inner' | 'outer';
  /** What stays beyond the block's finished edge: half the sashing + the seam allowance (inner), or all borders + the binding allowance (outer). */
  readonly keep: number;
  /** Where to cut, measured from the block's centre: half the finished block + `keep`. */
  readonly cutFromCentre: number;
  /** Expected width of the strip cut off, after quilting has drawn the piece in. */
  readonly trim: number;
}

export interface BlockTrim {
  readonly cell: Cell;
  readonly position: BlockPosition;
  readonly sides: readonly SideTrim[];
  /** The piece before quilting: finished block + keep + margin on every side. */
  readonly before: Size;
  /** The piece once trimmed. */
  readonly cut: Size;
}

export interface TrimPlan {
  readonly units: Units;
  readonly seamAllowance: number;
  readonly bindingAllowance: number;
  readonly shrinkage: number;
  readonly margin: number;
  readonly blocks: readonly BlockTrim[];
  /** The joined top before binding: Σ cut sizes along a row or column − 2 seam allowances per join. */
  readonly joined: Size;
  /** The quilt once bound: `joined` − 2 binding allowances, which equals the planned finished size. */
  readonly bound: Size;
}

export type TrimProblem = {
  readonly kind: 'margin-too-small';
  /** The least margin (quilt units) that leaves something to trim on every side at this shrinkage. */
  readonly leastMargin: number;
  readonly message: string;
};

/**
 * The trim plan of a quilt made quilt-as-you-go, each block quilted with its share of the sashing (half the sashing
 * width on each joined side) and, on the quilt's edge, with the borders. Each side is cut at
 * keep = sashing/2 + seam allowance (joined sides) or Σ borders + binding allowance (outer sides) beyond the finished
 * block, measured from the block's centre so that every block in a row or column is cut alike. Joining two blocks
 * takes a seam allowance from each, and binding takes the binding allowance on each outer side, so the bound quilt
 * comes out at the planned finished size exactly (docs/engine.md, "Whole quilt", worked example).
 *
 * Shrinkage: the piece is made `margin` larger than the cut on every side and quilting draws it in by `shrinkage`
 * percent about its centre, so a side's trim is (1 − s)(half block + keep + margin) − (half block + keep). A trim
 * below zero means the piece would come out smaller than the cut: refused with the least margin that works.
 */
export function planTrim(quilt: QuiltFrame & Pick<Quilt, 'units' | 'placements'>, bindingAllowance: number, settings: TrimSettings): Result<TrimPlan, TrimProblem> {
  const perInch = quilt.units === 'in' ? 1 : CM_PER_INCH;
  const seam = settings.seamAllowance ?? 0.25 * perInch;
  const margin = settings.margin ?? (quilt.units === 'in' ? 1 : 2.5);
  const shrink = settings.shrinkage / 100;
  const border = bordersWidth(quilt);
  const outerSides = (row: number, column: number): Record<Side, boolean> => ({ top: row === 0, right: column === quilt.columns - 1, bottom: row === quilt.rows - 1, left: column === 0 });
  const keepOf = (outer: boolean): number => (outer ? border + bindingAllowance : quilt.sashing / 2 + seam);
  const cutOf = (row: number, column: number): Size => {
    const o = outerSides(row, column);
    return { width: quilt.block.width + keepOf(o.left) + keepOf(o.right), height: quilt.block.height + keepOf(o.top) + keepOf(o.bottom) };
  };
  const blocks: BlockTrim[] = [];
  let leastMargin = 0;
  for (let row = 0; row < quilt.rows; row++) {
    for (let column = 0; column < quilt.columns; column++) {
      if (!quilt.placements[row]?.[column]) continue;
      const outer = outerSides(row, column);
      const sides = SIDES.map((side): SideTrim => {
        const keep = keepOf(outer[side]);
        const half = (side === 'top' || side === 'bottom' ? quilt.block.height : quilt.block.width) / 2;
        const cutFromCentre = half + keep;
        leastMargin = Math.max(leastMargin, (shrink * cutFromCentre) / (1 - shrink));
        return { side, faces: outer[side] ? 'outer' : 'inner', keep, cutFromCentre, trim: (1 - shrink) * (cutFromCentre + margin) - cutFromCentre };
      });
      const outerCount = SIDES.filter((s) => outer[s]).length;
      const cut = cutOf(row, column);
      blocks.push({
        cell: { row, column },
        position: outerCount >= 2 ? 'corner' : outerCount === 1 ? 'edge' : 'inner',
        sides,
        before: { width: cut.width + 2 * margin, height: cut.height + 2 * margin },
        cut,
      });
    }
  }
  if (margin < leastMargin) {
    return err({ kind: 'margin-too-small', leastMargin, message: `At ${settings.shrinkage} % shrinkage leave at least ${leastMargin.toFixed(2)} ${quilt.units} beyond each cut line before quilting.` });
  }
  // Joined top: the cut widths along the top row and the cut heights down the left column (every row and column
  // is cut alike), less one seam allowance from each block at each join.
  let width = -2 * seam * (quilt.columns - 1);
  for (let column = 0; column < quilt.columns; column++) width += cutOf(0, column).width;
  let height = -2 * seam * (quilt.rows - 1);
  for (let row = 0; row < quilt.rows; row++) height += cutOf(row, 0).height;
  return ok({
    units: quilt.units,
    seamAllowance: seam,
    bindingAllowance,
    shrinkage: settings.shrinkage,
    margin,
    blocks,
    joined: { width, height },
    bound: { width: width - 2 * bindingAllowance, height: height - 2 * bindingAllowance },
  });
}
