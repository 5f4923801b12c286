import type { Point, Polyline } from '../geometry/point.ts';
import { polylineLength } from '../geometry/polyline.ts';
import type { StrokeKind } from '../contract/strokes.ts';
import { findStrokeDirection, type StrokeDirection } from '../route/strokeDirection.ts';
import { assertNever } from '../assertNever.ts';
import type { LineShape } from './lineShape.ts';
import { describePlace, findPatchVisits, type BlockPlaces } from './locate.ts';
import { findMainPatch } from './groupSteps.ts';
import { formatRulerLength } from './rulerLength.ts';

/**
 * Direction words relative to the block, never to the quilter's seat: the tip may ask her to turn the block, and
 * "toward the top edge" stays true after a turn where "away from you" would not (stepConsistency.ts checks this).
 */
export function directionWords(direction: StrokeDirection): string {
  switch (direction) {
    case 'away':
      return 'toward the top edge';
    case 'toward':
      return 'toward the bottom edge';
    case 'left':
      return 'toward the left edge';
    case 'right':
      return 'toward the right edge';
    case 'curved':
      return 'curving';
    default:
      return assertNever(direction);
  }
}

/** "in the top-left triangle", "through the top square, the centre square and the bottom square", … */
export function patchWords(places: BlockPlaces, points: Polyline): { words: string; main: string | null } {
  const visits = findPatchVisits(places, points);
  const main = findMainPatch(visits);
  if (main >= 0) return { words: `in the ${places.patches[main]!.name}`, main: places.patches[main]!.name };
  const order: number[] = [];
  for (const v of visits) if (!order.includes(v.patch)) order.push(v.patch);
  const names = order.map((i) => `the ${places.patches[i]!.name}`);
  if (names.length === 0) return { words: 'in the block', main: null };
  if (names.length <= 3) return { words: `through ${joinWords(names)}`, main: null };
  return { words: `through ${names.length} patches, from ${names[0]} to ${names[names.length - 1]}`, main: null };
}

/** The sentence for a stitch step. */
export function stitchInstruction(places: BlockPlaces, points: Polyline, shape: LineShape, direction: StrokeDirection, where: string): string {
  const length = formatRulerLength(polylineLength(points), places.units);
  const end = describePlace(places, points[points.length - 1]!);
  switch (shape.kind) {
    case 'straight':
      return `Stitch a straight line ${length} long ${where}, ${directionWords(direction)} of the block. End at ${end}.`;
    case 'straight-lines':
      return `Stitch ${length} of straight lines ${where}, pivoting at ${shape.turns} ${shape.turns === 1 ? 'corner' : 'corners'} with the needle down. End at ${end}.`;
    case 'curves':
      return `Stitch ${length} of curving line ${where}. End at ${end}.`;
    default:
      return assertNever(shape);
  }
}

/** One travel stroke as the text sees it. */
export interface TravelPart {
  readonly kind: Exclude<StrokeKind, 'stitch'>;
  readonly points: Polyline;
}

/** Heading and sentence for a travel step (one or more travel strokes in a row). */
export function travelText(places: BlockPlaces, parts: readonly TravelPart[]): { title: string; instruction: string; length: number } {
  const lengths = parts.map((p) => polylineLength(p.points));
  const total = lengths.reduce((s, l) => s + l, 0);
  const last = parts[parts.length - 1]!.points;
  const end = describePlace(places, last[last.length - 1]!);
  const kinds = new Set(parts.map((p) => p.kind));
  const fmt = (l: number) => formatRulerLength(l, places.units);
  if (kinds.size === 1) {
    const kind = parts[0]!.kind;
    const way = travelDirectionWords(findStrokeDirection(joinPoints(parts.map((p) => p.points))));
    switch (kind) {
      case 'retrace':
        return { title: 'Retrace', instruction: `Retrace ${fmt(total)} over your stitching, ${way}, to ${end}.`, length: total };
      case 'ditch':
        return { title: 'Travel in the ditch', instruction: `Travel ${fmt(total)} along the seam, in the ditch, ${way}, to ${end}.`, length: total };
      case 'edge':
        return { title: 'Travel along the edge', instruction: `Travel ${fmt(total)} along the edge, inside the binding band, ${way}, to ${end}.`, length: total };
      default:
        return assertNever(kind);
    }
  }
  const legs = parts.map((p, i) => `${fmt(lengths[i]!)} ${travelKindWords(p.kind)} ${travelDirectionWords(findStrokeDirection(p.points))}`);
  return { title: 'Travel', instruction: `Travel ${fmt(total)} to ${end}: ${legs.join(', then ')}.`, length: total };
}

function travelKindWords(kind: TravelPart['kind']): string {
  switch (kind) {
    case 'retrace':
      return 'over your stitching';
    case 'ditch':
      return 'along the seam';
    case 'edge':
      return 'along the edge';
    default:
      return assertNever(kind);
  }
}

/** Travel follows a line already there, so a bending travel "follows the line" rather than "curving". */
function travelDirectionWords(direction: StrokeDirection): string {
  return direction === 'curved' ? 'following the line' : directionWords(direction);
}

/** Points of consecutive strokes joined into one line (each stroke starts where the last one ended). */
export function joinPoints(lines: readonly Polyline[]): Point[] {
  const out: Point[] = [...lines[0]!];
  for (let i = 1; i < lines.length; i++) {
    const line = lines[i]!;
    const last = out[out.length - 1]!;
    const joined = line[0]![0] === last[0] && line[0]![1] === last[1];
    out.push(...(joined ? line.slice(1) : line));
  }
  return out;
}

function joinWords(items: readonly string[]): string {
  if (items.length <= 1) return items.join('');
  return `${items.slice(0, -1).join(', ')} and ${items[items.length - 1]}`;
}
