import { goose, halfSquareTriangle, halfSquareTriangleMirrored, placeIn, quarterSquareTriangle, rect, type UnitPatch } from './unitPatches.ts';

/** Star points made from a unit drawn pointing up, turned to point up, right, down or left (about the cell centre). */
function turned(patches: readonly UnitPatch[], quarterTurns: number): UnitPatch[] {
  return patches.map((p) => ({
    name: p.name,
    points: p.points.map(([x, y]) => {
      let [px, py] = [x, y];
      for (let i = 0; i < quarterTurns; i++) [px, py] = [1 - py, px];
      return [px, py] as const;
    }),
  }));
}

/**
 * Sawtooth star on a 4×4 grid: a 2×2 centre square, four corner squares and four flying-geese units
 * whose geese point outward as the star points.
 */
export function sawtoothStar(): UnitPatch[] {
  const q = 0.25;
  const corners = [
    rect('top-left corner square', 0, 0, q, q),
    rect('top-right corner square', 1 - q, 0, 1, q),
    rect('bottom-right corner square', 1 - q, 1 - q, 1, 1),
    rect('bottom-left corner square', 0, 1 - q, q, 1),
  ];
  // The goose unit is drawn pointing up with its base at y=1, which is against the centre in the top cell.
  const side = (quarterTurns: number, skyNames: readonly [string, string]): UnitPatch[] =>
    turned(goose(), quarterTurns).map((p) => ({
      name: p.name === 'goose' ? 'star point' : p.name === 'left sky' ? skyNames[0] : skyNames[1],
      points: p.points,
    }));
  const top = side(0, ['left sky', 'right sky']);
  const right = side(1, ['upper sky', 'lower sky']);
  const bottom = side(2, ['right sky', 'left sky']);
  const left = side(3, ['lower sky', 'upper sky']);
  return [
    rect('centre square', q, q, 1 - q, 1 - q),
    ...corners,
    ...placeIn(top, 'top', q, 0, 2 * q, q),
    ...placeIn(right, 'right', 1 - q, q, q, 2 * q),
    ...placeIn(bottom, 'bottom', q, 1 - q, 2 * q, q),
    ...placeIn(left, 'left', 0, q, q, 2 * q),
  ];
}

/** Ohio star on a 3×3 grid: centre and corner squares, and a quarter-square-triangle unit in each side cell. */
export function ohioStar(): UnitPatch[] {
  const t = 1 / 3;
  const qst = quarterSquareTriangle();
  return [
    rect('centre square', t, t, 2 * t, 2 * t),
    rect('top-left corner square', 0, 0, t, t),
    rect('top-right corner square', 2 * t, 0, 1, t),
    rect('bottom-right corner square', 2 * t, 2 * t, 1, 1),
    rect('bottom-left corner square', 0, 2 * t, t, 1),
    ...placeIn(qst, 'top unit', t, 0, t, t),
    ...placeIn(qst, 'right unit', 2 * t, t, t, t),
    ...placeIn(qst, 'bottom unit', t, 2 * t, t, t),
    ...placeIn(qst, 'left unit', 0, t, t, t),
  ];
}

/** Friendship star on a 3×3 grid: centre and corner squares, and a half-square-triangle unit in each side cell, turning. */
export function friendshipStar(): UnitPatch[] {
  const t = 1 / 3;
  return [
    rect('centre square', t, t, 2 * t, 2 * t),
    rect('top-left corner square', 0, 0, t, t),
    rect('top-right corner square', 2 * t, 0, 1, t),
    rect('bottom-right corner square', 2 * t, 2 * t, 1, 1),
    rect('bottom-left corner square', 0, 2 * t, t, 1),
    ...placeIn(halfSquareTriangle(), 'top unit', t, 0, t, t),
    ...placeIn(halfSquareTriangleMirrored(), 'right unit', 2 * t, t, t, t),
    ...placeIn(halfSquareTriangle(), 'bottom unit', t, 2 * t, t, t),
    ...placeIn(halfSquareTriangleMirrored(), 'left unit', 0, t, t, t),
  ];
}
