import { blockRect, finishedSize } from '../quilt/finishedSize.ts';
import { orderCells, rowOrder } from '../quilt/order.ts';
import type { Cell, Placement, Quilt } from '../quilt/quilt.schema.ts';
import type { Box } from './paper.ts';

/** One cell of the printed quilt map. */
export interface MapCell {
  readonly cell: Cell;
  readonly box: Box;
  readonly placement: Placement | null;
  /** Its place in the quilting order (1 = first), null for an empty cell. */
  readonly order: number | null;
}

export interface QuiltMapLayout {
  /** Points per quilt unit on the page (the map is a scale drawing). */
  readonly scale: number;
  /** The finished quilt's outline on the page. */
  readonly outline: Box;
  readonly cells: readonly MapCell[];
}

/**
 * The quilt map scaled to fit `area` (points), centred across it, at its top: every block where blockRect puts it,
 * numbered in the quilt's order (rows, serpentine or the quilter's own, order.ts). A hand order the quilt schema
 * would refuse falls back to rows (the map still prints).
 */
export function layoutQuiltMap(quilt: Quilt, area: Box): QuiltMapLayout {
  const size = finishedSize(quilt);
  const scale = Math.min(area.width / size.width, area.height / size.height);
  const outline: Box = { x: area.x + (area.width - size.width * scale) / 2, y: area.y, width: size.width * scale, height: size.height * scale };
  const ordered = orderCells(quilt, quilt.order);
  const rank = new Map<number, number>();
  (ordered.ok ? ordered.value : rowOrder(quilt)).forEach((c, i) => rank.set(c.row * quilt.columns + c.column, i + 1));
  const cells: MapCell[] = [];
  for (let row = 0; row < quilt.rows; row++) {
    for (let column = 0; column < quilt.columns; column++) {
      const r = blockRect(quilt, { row, column });
      cells.push({
        cell: { row, column },
        box: { x: outline.x + r.x * scale, y: outline.y + r.y * scale, width: r.width * scale, height: r.height * scale },
        placement: quilt.placements[row]?.[column] ?? null,
        order: rank.get(row * quilt.columns + column) ?? null,
      });
    }
  }
  return { scale, outline, cells };
}
