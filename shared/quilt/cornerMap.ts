import type { Point } from '../geometry/point.ts';
import type { Orientation } from './quilt.schema.ts';

/** Block corners, clockwise from the top left as seen on the quilt top (y down): 0 top-left … 3 bottom-left. */
export const CORNERS = ['top-left', 'top-right', 'bottom-right', 'bottom-left'] as const;
export type Corner = 0 | 1 | 2 | 3;
export type CornerName = (typeof CORNERS)[number];

/** A cost for each (entry corner, exit corner) pair: `costs[entry][exit]`, 4 × 4. */
export type CornerCosts = readonly (readonly number[])[];

const asCorner = (k: number): Corner => (((k % 4) + 4) % 4) as Corner;

/**
 * Where a design's corner lands once the design is placed: mirroring left-to-right swaps top-left with top-right and
 * bottom-right with bottom-left (c → 1 − c mod 4); each clockwise quarter turn moves every corner one place on
 * clockwise (c → c + 1 mod 4). Mirror first, then turn, as in `placePoint`.
 */
export function placedCorner(designCorner: Corner, o: Orientation): Corner {
  const mirrored = o.mirror ? asCorner(1 - designCorner) : designCorner;
  return asCorner(mirrored + o.rotation / 90);
}

/** The design corner that lands on a placed corner (the inverse of `placedCorner`). */
export function designCorner(placed: Corner, o: Orientation): Corner {
  const unturned = asCorner(placed - o.rotation / 90);
  return o.mirror ? asCorner(1 - unturned) : unturned;
}

/**
 * A point of a `width` × `height` design in its placed frame (origin: the placed block's top-left corner): mirrored
 * left-to-right (x → width − x) when asked, then turned clockwise by quarter turns. A quarter turn clockwise on a
 * y-down page takes (x, y) in a w × h block to (h − y, x) in the h × w block it becomes.
 */
export function placePoint(p: Point, width: number, height: number, o: Orientation): Point {
  let x = o.mirror ? width - p[0] : p[0];
  let y = p[1];
  let w = width;
  let h = height;
  for (let k = 0; k < o.rotation / 90; k++) {
    [x, y] = [h - y, x];
    [w, h] = [h, w];
  }
  return [x, y];
}

/** Size of the placed block: a quarter or three-quarter turn swaps width and height. */
export function placedSize(width: number, height: number, o: Orientation): { width: number; height: number } {
  return o.rotation % 180 === 0 ? { width, height } : { width: height, height: width };
}

/**
 * The corner-pair costs of a placed block from the design's own table (in design corners), times `scale` (design
 * units → quilt units): placed[e][x] = scale · design[designCorner(e)][designCorner(x)]. Turning and mirroring
 * keep every length, so the design's table serves all eight orientations.
 */
export function placeCornerCosts(designCosts: CornerCosts, o: Orientation, scale = 1): CornerCosts {
  checkCornerCosts(designCosts);
  return [0, 1, 2, 3].map((e) => [0, 1, 2, 3].map((x) => scale * designCosts[designCorner(e as Corner, o)]![designCorner(x as Corner, o)]!));
}

/** Throws unless `costs` is 4 × 4 of finite lengths ≥ 0 (a broken table is a bug, not a user error). */
export function checkCornerCosts(costs: CornerCosts): void {
  if (costs.length !== 4 || costs.some((row) => row.length !== 4 || row.some((c) => !Number.isFinite(c) || c < 0))) {
    throw new Error('quilt/cornerMap: corner-pair costs must be 4 × 4 finite lengths ≥ 0');
  }
}
