import { DESIGN_LIMITS, type Design } from '../design/design.schema.ts';
import type { Point, Polyline } from '../geometry/point.ts';
import { err, ok, type Result } from '../result.ts';

/** Which list of a design a line belongs to. */
export type LineGroup = 'lines' | 'seams' | 'route';

/**
 * Why the engine refuses a design (expected failures, returned as values). Each carries a plain message
 * a quilter can read; `group`/`index` point at the line (index into `design[group]`).
 */
export type DesignProblem =
  | { readonly kind: 'empty-design'; readonly message: string }
  | { readonly kind: 'invalid-block'; readonly message: string }
  | { readonly kind: 'non-finite'; readonly message: string; readonly group: LineGroup; readonly index: number }
  | { readonly kind: 'line-too-short'; readonly message: string; readonly group: LineGroup; readonly index: number }
  | { readonly kind: 'outside-block'; readonly message: string; readonly group: LineGroup; readonly index: number; readonly point: Point }
  | { readonly kind: 'too-large'; readonly message: string; readonly points: number; readonly cap: number }
  | { readonly kind: 'too-many-crossings'; readonly message: string; readonly cap: number };

/** Most contacts (crossings, junctions, overlap ends) the planar graph will compute before refusing. */
export const MAX_CONTACTS = 500_000;

/**
 * Checks a design the way the schema does, for designs built in code rather than parsed:
 * block size within `DESIGN_LIMITS.maxSide`, at most `DESIGN_LIMITS.maxPoints` points and `maxLines` lines
 * per group, finite coordinates, every line with 2 distinct points, no point further outside the block
 * than `outsideSlack` × the longer side, and at least one quilting line. `withRoute` also checks `route`.
 * Cheap (one pass over the points) and done before any geometry, so bad input never reaches the noder.
 */
export function checkDesign(design: Design, withRoute: boolean): Result<null, DesignProblem> {
  const { width, height, units } = design;
  const maxSide = DESIGN_LIMITS.maxSide[units];
  if (!(width > 0 && height > 0 && width <= maxSide && height <= maxSide)) {
    return err({ kind: 'invalid-block', message: `the block must be between 0 and ${maxSide} ${units} on each side` });
  }
  const groups: [LineGroup, readonly Polyline[]][] = [['lines', design.lines], ['seams', design.seams]];
  if (withRoute) groups.push(['route', design.route ?? []]);
  let points = 0;
  for (const [, group] of groups) {
    for (const line of group) points += line.length;
    if (group.length > DESIGN_LIMITS.maxLines) points = Math.max(points, DESIGN_LIMITS.maxPoints + 1);
  }
  if (points > DESIGN_LIMITS.maxPoints) {
    return err({ kind: 'too-large', message: `the design has ${points} points or too many lines; the cap is ${DESIGN_LIMITS.maxPoints} points and ${DESIGN_LIMITS.maxLines} lines per list`, points, cap: DESIGN_LIMITS.maxPoints });
  }
  const slack = DESIGN_LIMITS.outsideSlack * Math.max(width, height);
  for (const [group, lines] of groups) {
    for (let index = 0; index < lines.length; index++) {
      const line = lines[index]!;
      const where = `${group}[${index}]`;
      if (line.some(([x, y]) => !Number.isFinite(x) || !Number.isFinite(y))) {
        return err({ kind: 'non-finite', message: `${where} has a coordinate that is not a finite number`, group, index });
      }
      if (!hasTwoDistinctPoints(line)) {
        return err({ kind: 'line-too-short', message: `${where} needs at least 2 distinct points`, group, index });
      }
      const far = line.find(([x, y]) => x < -slack || y < -slack || x > width + slack || y > height + slack);
      if (far !== undefined) {
        return err({ kind: 'outside-block', message: `${where} has the point (${far[0]}, ${far[1]}), far outside the ${width} × ${height} ${units} block`, group, index, point: far });
      }
    }
  }
  if (design.lines.length === 0) return err({ kind: 'empty-design', message: 'the design has no quilting lines' });
  return ok(null);
}

function hasTwoDistinctPoints(line: Polyline): boolean {
  const first = line[0];
  return first !== undefined && line.some(([x, y]) => x !== first[0] || y !== first[1]);
}
