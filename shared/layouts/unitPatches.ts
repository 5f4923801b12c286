import type { Point } from '../geometry/point.ts';

/** A patch drawn in the unit square [0,1]×[0,1] before it is scaled to the block's size. */
export interface UnitPatch {
  readonly name: string;
  readonly points: readonly Point[];
}

export const rect = (name: string, x0: number, y0: number, x1: number, y1: number): UnitPatch => ({
  name,
  points: [[x0, y0], [x1, y0], [x1, y1], [x0, y1]],
});

export const tri = (name: string, a: Point, b: Point, c: Point): UnitPatch => ({ name, points: [a, b, c] });

/** Maps a unit-square layout into the cell [x0,x0+w]×[y0,y0+h] and prefixes the patch names. */
export function placeIn(patches: readonly UnitPatch[], prefix: string, x0: number, y0: number, w: number, h: number): UnitPatch[] {
  return patches.map((p) => ({
    name: `${prefix} ${p.name}`,
    points: p.points.map(([x, y]) => [x0 + x * w, y0 + y * h] as const),
  }));
}

/** Half-square triangle with its seam from the bottom-left to the top-right corner. */
export function halfSquareTriangle(): UnitPatch[] {
  return [tri('top-left triangle', [0, 0], [1, 0], [0, 1]), tri('bottom-right triangle', [1, 0], [1, 1], [0, 1])];
}

/** Half-square triangle with its seam from the top-left to the bottom-right corner. */
export function halfSquareTriangleMirrored(): UnitPatch[] {
  return [tri('top-right triangle', [0, 0], [1, 0], [1, 1]), tri('bottom-left triangle', [0, 0], [1, 1], [0, 1])];
}

/** Quarter-square triangle: both diagonals, four triangles meeting at the centre. */
export function quarterSquareTriangle(): UnitPatch[] {
  const c: Point = [0.5, 0.5];
  return [
    tri('top triangle', [0, 0], [1, 0], c),
    tri('right triangle', [1, 0], [1, 1], c),
    tri('bottom triangle', [1, 1], [0, 1], c),
    tri('left triangle', [0, 1], [0, 0], c),
  ];
}

/** Square-in-a-square: a centre square on point (corners at the edge midpoints) and four corner triangles. */
export function squareInASquare(): UnitPatch[] {
  const [t, r, b, l]: [Point, Point, Point, Point] = [[0.5, 0], [1, 0.5], [0.5, 1], [0, 0.5]];
  return [
    { name: 'centre square', points: [t, r, b, l] },
    tri('top-left corner triangle', [0, 0], t, l),
    tri('top-right corner triangle', [1, 0], r, t),
    tri('bottom-right corner triangle', [1, 1], b, r),
    tri('bottom-left corner triangle', [0, 1], l, b),
  ];
}

/** One flying-geese unit: the goose points up, its base on the bottom edge, sky triangles either side. */
export function goose(): UnitPatch[] {
  return [
    tri('goose', [0, 1], [0.5, 0], [1, 1]),
    tri('left sky', [0, 0], [0.5, 0], [0, 1]),
    tri('right sky', [0.5, 0], [1, 0], [1, 1]),
  ];
}

/** `count` flying-geese units stacked top to bottom, all pointing up. */
export function flyingGeese(count: number): UnitPatch[] {
  return Array.from({ length: count }, (_, i) => placeIn(goose(), `goose ${i + 1}:`, 0, i / count, 1, 1 / count)).flat();
}

/** An n×n grid of equal squares, named by row and column. */
export function grid(n: number): UnitPatch[] {
  const rows = n === 2 ? ['top', 'bottom'] : ['top', 'middle', 'bottom'];
  const cols = n === 2 ? ['left', 'right'] : ['left', 'centre', 'right'];
  return rows.flatMap((row, i) => cols.map((col, j) => rect(`${row}-${col} square`, j / n, i / n, (j + 1) / n, (i + 1) / n)));
}

/**
 * Pinwheel: eight triangles meeting at the centre. The four blades each lie along one edge of the block
 * and point at the centre, turning clockwise.
 */
export function pinwheel(): UnitPatch[] {
  const c: Point = [0.5, 0.5];
  return [
    tri('top blade', [0, 0], [0.5, 0], c),
    tri('top-right background', [0.5, 0], [1, 0], c),
    tri('right blade', [1, 0], [1, 0.5], c),
    tri('bottom-right background', [1, 0.5], [1, 1], c),
    tri('bottom blade', [1, 1], [0.5, 1], c),
    tri('bottom-left background', [0.5, 1], [0, 1], c),
    tri('left blade', [0, 1], [0, 0.5], c),
    tri('top-left background', [0, 0.5], [0, 0], c),
  ];
}

/**
 * Log cabin: a centre square, then `rounds` rounds of four logs added clockwise (right, bottom, left, top),
 * each log one unit wide, where a unit is 1/(2·rounds+1) of the block.
 */
export function logCabin(rounds: number): UnitPatch[] {
  const u = 1 / (2 * rounds + 1);
  let a = rounds * u;
  let b = (rounds + 1) * u;
  const patches: UnitPatch[] = [rect('centre square', a, a, b, b)];
  for (let k = 1; k <= rounds; k++) {
    patches.push(
      rect(`round ${k} right log`, b, a, b + u, b),
      rect(`round ${k} bottom log`, a, b, b + u, b + u),
      rect(`round ${k} left log`, a - u, a, a, b + u),
      rect(`round ${k} top log`, a - u, a - u, b + u, a),
    );
    a -= u;
    b += u;
  }
  return patches;
}
