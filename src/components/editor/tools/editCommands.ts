import type { DesignCommand, LineTarget } from '@shared/design/commands.ts';
import type { Design } from '@shared/design/design.schema.ts';
import type { Point } from '@shared/geometry/point.ts';
import { buildPlayback, needleAt } from '../../route/routePlayback.ts';

/** Ends closer than this (design units) count as shared when joining: 1/64 in or 0.04 cm. */
export function joinTolerance(units: Design['units']): number {
  return units === 'in' ? 1 / 64 : 0.04;
}

/** Splits line `index` at half its length (the natural place when no point is given). */
export function splitAtMiddle(design: Design, target: LineTarget, index: number): DesignCommand | null {
  const line = design[target][index];
  if (!line) return null;
  const playback = buildPlayback([{ pass: 1, kind: 'stitch', points: line }]);
  const at = needleAt(playback, playback.total / 2);
  if (!at || playback.total <= 0) return null;
  // needleAt counts the segment by its end point; splitLine by its start point.
  return { kind: 'splitLine', target, index, segment: at.segment - 1, point: at.point };
}

/**
 * Joins two lines that share an end (within joinTolerance): picks which of each to reverse so the end of
 * the first meets the start of the second. Null when no pair of ends meets.
 */
export function joinShared(design: Design, target: LineTarget, first: number, second: number): DesignCommand | null {
  const a = design[target][first];
  const b = design[target][second];
  if (!a || !b || first === second) return null;
  const tol = joinTolerance(design.units);
  const near = (p: Point, q: Point) => Math.hypot(p[0] - q[0], p[1] - q[1]) <= tol;
  const aStart = a[0]!;
  const aEnd = a[a.length - 1]!;
  const bStart = b[0]!;
  const bEnd = b[b.length - 1]!;
  const options: [boolean, boolean, boolean][] = [
    [near(aEnd, bStart), false, false],
    [near(aEnd, bEnd), false, true],
    [near(aStart, bStart), true, false],
    [near(aStart, bEnd), true, true],
  ];
  const found = options.find(([ok]) => ok);
  if (!found) return null;
  return { kind: 'joinLines', target, first, second, reverseFirst: found[1], reverseSecond: found[2] };
}
