import type { Point, Polyline } from '../geometry/point.ts';
import type { IndexedLine } from './commands.ts';
import { CM_PER_INCH, type Design, type Units } from './design.schema.ts';

/** The list with each entry inserted so it lands at its index (entries ascending by index). */
export function insertAt(list: readonly Polyline[], entries: readonly IndexedLine[]): Polyline[] {
  const out = [...list];
  let previous = -1;
  for (const { index, line } of entries) {
    if (!(Number.isInteger(index) && index > previous && index <= out.length)) {
      throw new Error(`design/commands: insert index ${index} is out of order or out of range`);
    }
    out.splice(index, 0, line);
    previous = index;
  }
  return out;
}

/** The list without the given indices, and the removed lines as ascending insert entries (the inverse). */
export function deleteAt(list: readonly Polyline[], indices: readonly number[]): { rest: Polyline[]; removed: IndexedLine[] } {
  const sorted = [...indices].sort((a, b) => a - b);
  sorted.forEach((index, i) => {
    if (!(Number.isInteger(index) && index >= 0 && index < list.length) || sorted[i - 1] === index) {
      throw new Error(`design/commands: cannot delete index ${index}`);
    }
  });
  const drop = new Set(sorted);
  return { rest: list.filter((_, i) => !drop.has(i)), removed: sorted.map((index) => ({ index, line: list[index]! })) };
}

/** The list with the given entries replaced, and the old lines at those indices. */
export function replaceAt(list: readonly Polyline[], entries: readonly IndexedLine[]): { next: Polyline[]; old: IndexedLine[] } {
  const next = [...list];
  const old = entries.map(({ index, line }) => {
    const before = next[index];
    if (before === undefined) throw new Error(`design/commands: cannot replace index ${index}`);
    next[index] = line;
    return { index, line: before };
  });
  // Replacing the same index twice must restore the first old value last.
  return { next, old: old.reverse() };
}

/** Splits a polyline at `point` on segment `segment` (between points segment and segment+1). */
export function splitPolyline(line: Polyline, segment: number, point: Point): [Polyline, Polyline] {
  if (!(Number.isInteger(segment) && segment >= 0 && segment + 1 < line.length)) {
    throw new Error(`design/commands: no segment ${segment} to split`);
  }
  const first = withoutRepeats([...line.slice(0, segment + 1), point]);
  const second = withoutRepeats([point, ...line.slice(segment + 1)]);
  if (first.length < 2 || second.length < 2) throw new Error('design/commands: a split must leave two lines of two distinct points');
  return [first, second];
}

/** Joins b after a, sharing the point where a ends when b starts there. */
export function joinPolylines(a: Polyline, b: Polyline): Polyline {
  const last = a[a.length - 1]!;
  const first = b[0]!;
  return last[0] === first[0] && last[1] === first[1] ? [...a, ...b.slice(1)] : [...a, ...b];
}

function withoutRepeats(points: readonly Point[]): Point[] {
  return points.filter((p, i) => i === 0 || p[0] !== points[i - 1]![0] || p[1] !== points[i - 1]![1]);
}

type OptionalKey = 'start' | 'end' | 'bindingBand' | 'thread' | 'route';

/** The design with an optional field set, or removed (not set to undefined) when the value is null. */
export function withOptional<K extends OptionalKey>(design: Design, key: K, value: NonNullable<Design[K]> | null): Design {
  const copy: Design = { ...design };
  if (value === null) delete copy[key];
  else copy[key] = value;
  return copy;
}

/**
 * The design in other units: every coordinate, the size, the binding band and the batting spacing are
 * scaled by 2.54 cm per inch (exact by definition, International Yard and Pound Agreement, 1959).
 * Thread settings given per inch or in inches (SPI, thickness, tail) keep their own units.
 */
export function convertDesignUnits(design: Design, units: Units): Design {
  if (units === design.units) return design;
  const k = units === 'cm' ? CM_PER_INCH : 1 / CM_PER_INCH;
  const scaleLine = (line: Polyline): Polyline => line.map(([x, y]) => [x * k, y * k] as const);
  let next: Design = { ...design, units, width: design.width * k, height: design.height * k, seams: design.seams.map(scaleLine), lines: design.lines.map(scaleLine) };
  if (design.start) next = withOptional(next, 'start', [design.start[0] * k, design.start[1] * k]);
  if (design.end) next = withOptional(next, 'end', [design.end[0] * k, design.end[1] * k]);
  if (design.route) next = withOptional(next, 'route', design.route.map(scaleLine));
  if (design.bindingBand !== undefined) next = withOptional(next, 'bindingBand', design.bindingBand * k);
  if (design.thread?.battingSpacing !== undefined) next = withOptional(next, 'thread', { ...design.thread, battingSpacing: design.thread.battingSpacing * k });
  return next;
}
