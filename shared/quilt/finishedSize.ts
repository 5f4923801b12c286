import type { Point } from '../geometry/point.ts';
import type { Cell, Quilt } from './quilt.schema.ts';

/** The parts of a quilt its measurements depend on. */
export type QuiltFrame = Pick<Quilt, 'rows' | 'columns' | 'block' | 'sashing' | 'borders'>;

/** A finished width and height, in quilt units. */
export interface Size {
  readonly width: number;
  readonly height: number;
}

/** A block's finished rectangle in quilt coordinates (origin: the finished quilt's top-left corner). */
export interface BlockRect {
  readonly x: number;
  readonly y: number;
  readonly width: number;
  readonly height: number;
}

/** Total finished width of all borders on one side. */
export function bordersWidth(quilt: Pick<Quilt, 'borders'>): number {
  return quilt.borders.reduce((s, b) => s + b, 0);
}

/**
 * Finished size of the quilt: blocks, sashing between neighbouring blocks (none around the outside; an outer frame
 * of sashing is a border), then the borders on all four sides. The binding covers the edge and adds nothing.
 * width = columns·blockWidth + (columns − 1)·sashing + 2·Σborders, and the same down the rows.
 */
export function finishedSize(quilt: QuiltFrame): Size {
  const b = 2 * bordersWidth(quilt);
  return {
    width: quilt.columns * quilt.block.width + (quilt.columns - 1) * quilt.sashing + b,
    height: quilt.rows * quilt.block.height + (quilt.rows - 1) * quilt.sashing + b,
  };
}

/** Where a cell's finished block lies in the quilt. */
export function blockRect(quilt: QuiltFrame, cell: Cell): BlockRect {
  const b = bordersWidth(quilt);
  return {
    x: b + cell.column * (quilt.block.width + quilt.sashing),
    y: b + cell.row * (quilt.block.height + quilt.sashing),
    width: quilt.block.width,
    height: quilt.block.height,
  };
}

/** The four corners of a cell's block in quilt coordinates, clockwise from the top left (see cornerMap.ts). */
export function blockCorners(quilt: QuiltFrame, cell: Cell): readonly [Point, Point, Point, Point] {
  const r = blockRect(quilt, cell);
  return [
    [r.x, r.y],
    [r.x + r.width, r.y],
    [r.x + r.width, r.y + r.height],
    [r.x, r.y + r.height],
  ];
}
