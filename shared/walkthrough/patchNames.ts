import type { Design } from '../design/design.schema.ts';
import type { Point } from '../geometry/point.ts';
import { classifyPatch, type PatchShape } from '../layouts/patch.ts';
import { assertNever } from '../assertNever.ts';
import type { PatchFace } from './patchFaces.ts';

/** A patch face with the plain name a quilter would use for it ("top-left triangle", "centre square"). */
export interface NamedPatch extends PatchFace {
  readonly name: string;
  readonly shape: PatchShape;
}

/**
 * How far (as a fraction of the block's width or height) a patch's centroid must sit from the block's centre
 * line to be called left/right or top/bottom. Our own choice: 1/8 puts the corner triangles of a half-square
 * triangle (centroids at 1/6) and the outer squares of a nine-patch (1/3) on their sides, and the centre
 * square of a nine-patch, log cabin or square in a square in the centre.
 */
export const SIDE_THRESHOLD = 1 / 8;

/**
 * Names patches by where they sit in the block and what shape they are. When several patches share a name,
 * each gets its place within that group ("upper one of the top triangles"); if that still repeats, its
 * place in reading order ("2nd of the 3 left triangles, reading from the top"). A block with one patch
 * is "block". Names are unique within the result and read after "the" ("in the top-left triangle").
 */
export function namePatches(faces: readonly PatchFace[], design: Pick<Design, 'width' | 'height'>): NamedPatch[] {
  const centre: Point = [design.width / 2, design.height / 2];
  const base = faces.map((face) => {
    const shape = classifyPatch(face.polygon, 1e-6);
    const where = placeWord(face.centroid, centre, design.width * SIDE_THRESHOLD, design.height * SIDE_THRESHOLD, 'block');
    return { face, shape, noun: faces.length === 1 ? 'block' : nounOf(shape), where };
  });
  const names = base.map((b) => (b.noun === 'block' ? 'block' : `${b.where} ${b.noun}`));
  for (const group of groupsOf(names)) {
    const members = group.map((i) => base[i]!.face.centroid);
    const sub = subPlaces(members);
    const plural = `${names[group[0]!]!}s`;
    if (new Set(sub).size === sub.length) {
      group.forEach((i, k) => (names[i] = `${sub[k]} one of the ${plural}`));
    } else {
      const order = [...group].sort((a, b) => readingOrder(base[a]!.face.centroid, base[b]!.face.centroid));
      order.forEach((i, k) => (names[i] = `${ordinal(k + 1)} of the ${group.length} ${plural}, reading from the top left`));
    }
  }
  return base.map((b, i) => ({ ...b.face, shape: b.shape, name: names[i]! }));
}

/** The name of the patch's place, e.g. "top-left", "right", "centre". */
function placeWord(p: Point, centre: Point, tx: number, ty: number, scale: 'block' | 'group'): string {
  const dx = p[0] - centre[0];
  const dy = p[1] - centre[1];
  const col = dx < -tx ? 'left' : dx > tx ? 'right' : '';
  const row = dy < -ty ? (scale === 'block' ? 'top' : 'upper') : dy > ty ? (scale === 'block' ? 'bottom' : 'lower') : '';
  if (row && col) return `${row}-${col}`;
  return row || col || (scale === 'block' ? 'centre' : 'middle');
}

/** Place of each member within its group, relative to the group's own spread. */
function subPlaces(points: readonly Point[]): string[] {
  const xs = points.map((p) => p[0]);
  const ys = points.map((p) => p[1]);
  const [x0, x1, y0, y1] = [Math.min(...xs), Math.max(...xs), Math.min(...ys), Math.max(...ys)];
  const centre: Point = [(x0 + x1) / 2, (y0 + y1) / 2];
  return points.map((p) => placeWord(p, centre, (x1 - x0) / 4 + 1e-12, (y1 - y0) / 4 + 1e-12, 'group'));
}

function groupsOf(names: readonly string[]): number[][] {
  const by = new Map<string, number[]>();
  names.forEach((n, i) => by.set(n, [...(by.get(n) ?? []), i]));
  return [...by.values()].filter((g) => g.length > 1);
}

function readingOrder(a: Point, b: Point): number {
  return Math.abs(a[1] - b[1]) > 1e-9 ? a[1] - b[1] : a[0] - b[0];
}

function ordinal(n: number): string {
  const tens = n % 100;
  const suffix = tens >= 11 && tens <= 13 ? 'th' : n % 10 === 1 ? 'st' : n % 10 === 2 ? 'nd' : n % 10 === 3 ? 'rd' : 'th';
  return `${n}${suffix}`;
}

function nounOf(shape: PatchShape): string {
  switch (shape) {
    case 'triangle':
    case 'square':
    case 'rectangle':
    case 'strip':
      return shape;
    case 'polygon':
      return 'patch';
    default:
      return assertNever(shape);
  }
}
