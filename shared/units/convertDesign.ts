import type { Design, Units } from '../design/design.schema.ts';
import type { Point } from '../geometry/point.ts';
import { convertLength } from './units.ts';

/**
 * A design redrawn in other units, for pages that show it to a viewer who works in those units (a walkthrough's
 * step lengths, a printed scale). Every coordinate and every length setting held in design units is scaled;
 * thread settings that carry their own fixed units (SPI, sandwich thickness and tails in inches, bobbins in yards)
 * stay as they are. The result describes the same block: the planner's figures for it are the originals × factor.
 */
export function convertDesign(design: Design, to: Units): Design {
  if (design.units === to) return design;
  const k = convertLength(1, design.units, to);
  const line = (pts: readonly Point[]) => pts.map((p) => scalePoint(p, k));
  const { start, end, route, bindingBand, thread, ...rest } = design;
  const spacing = thread?.battingSpacing;
  return {
    ...rest,
    units: to,
    width: design.width * k,
    height: design.height * k,
    seams: design.seams.map(line),
    lines: design.lines.map(line),
    ...(start ? { start: scalePoint(start, k) } : {}),
    ...(end ? { end: scalePoint(end, k) } : {}),
    ...(route ? { route: route.map(line) } : {}),
    ...(bindingBand !== undefined ? { bindingBand: bindingBand * k } : {}),
    ...(thread ? { thread: { ...thread, ...(spacing !== undefined ? { battingSpacing: spacing * k } : {}) } } : {}),
  };
}

/** Route strokes (any shape with `points`) redrawn from one unit to another. */
export function convertStrokes<S extends { readonly points: readonly Point[] }>(strokes: readonly S[], from: Units, to: Units): S[] {
  if (from === to) return [...strokes];
  const k = convertLength(1, from, to);
  return strokes.map((s) => ({ ...s, points: s.points.map((p) => scalePoint(p, k)) }));
}

function scalePoint(p: Point, k: number): Point {
  return [p[0] * k, p[1] * k];
}
