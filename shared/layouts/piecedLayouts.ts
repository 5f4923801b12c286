import { z } from 'zod';
import type { Point, Polyline } from '../geometry/point.ts';
import { classifyPatch, orientPositive, type Patch } from './patch.ts';
import { buildSeamsFromPatches } from './seamsFromPatches.ts';
import { friendshipStar, ohioStar, sawtoothStar } from './starPatches.ts';
import {
  flyingGeese, grid, halfSquareTriangle, logCabin, pinwheel, quarterSquareTriangle, rect, squareInASquare, type UnitPatch,
} from './unitPatches.ts';

/** Options some layouts take; every field has a default. */
export const layoutOptionsSchema = z
  .object({
    /** Log cabin: rounds of logs around the centre square. */
    rounds: z.number().int().min(1).max(8).default(3),
    /** Flying geese: geese stacked top to bottom. */
    geese: z.number().int().min(1).max(12).default(4),
  })
  .strict();
export type LayoutOptions = z.input<typeof layoutOptionsSchema>;

type Options = z.output<typeof layoutOptionsSchema>;

/** One entry of the pieced layout registry; `draw` works in the unit square. */
interface LayoutEntry {
  readonly id: string;
  readonly label: string;
  readonly description: string;
  readonly draw: (options: Options) => UnitPatch[];
}

const ENTRIES = [
  { id: 'blank', label: 'Blank', description: 'One whole piece of fabric, no seams.', draw: () => [rect('whole block', 0, 0, 1, 1)] },
  { id: 'half-square-triangle', label: 'Half-square triangle', description: 'Two triangles sewn along one diagonal.', draw: halfSquareTriangle },
  { id: 'quarter-square-triangle', label: 'Quarter-square triangle', description: 'Four triangles meeting at the centre, seams along both diagonals.', draw: quarterSquareTriangle },
  { id: 'square-in-a-square', label: 'Square in a square', description: 'A centre square set on point with a triangle in each corner.', draw: squareInASquare },
  { id: 'flying-geese', label: 'Flying geese', description: 'Geese triangles stacked in a column, each with two sky triangles.', draw: (o) => flyingGeese(o.geese) },
  { id: 'four-patch', label: 'Four-patch', description: 'Two rows of two equal squares.', draw: () => grid(2) },
  { id: 'nine-patch', label: 'Nine-patch', description: 'Three rows of three equal squares.', draw: () => grid(3) },
  { id: 'pinwheel', label: 'Pinwheel', description: 'Four half-square-triangle units turned so their blades spin around the centre.', draw: pinwheel },
  { id: 'log-cabin', label: 'Log cabin', description: 'A centre square with logs added around it, round after round.', draw: (o) => logCabin(o.rounds) },
  { id: 'sawtooth-star', label: 'Sawtooth star', description: 'A large centre square with flying-geese star points on each side.', draw: sawtoothStar },
  { id: 'ohio-star', label: 'Ohio star', description: 'A nine-patch grid with quarter-square-triangle star points on each side.', draw: ohioStar },
  { id: 'friendship-star', label: 'Friendship star', description: 'A nine-patch grid with half-square-triangle points turning around the centre.', draw: friendshipStar },
] as const satisfies readonly LayoutEntry[];

/** Identifier of a pieced layout. */
export type PiecedLayoutId = (typeof ENTRIES)[number]['id'];

/** The layouts a new design can start from, in the order the picker shows them. */
export const PIECED_LAYOUTS: readonly { readonly id: PiecedLayoutId; readonly label: string; readonly description: string }[] =
  ENTRIES.map(({ id, label, description }) => ({ id, label, description }));

/** A pieced layout at a block size: its seam lines and its patches, in design units. */
export interface PiecedLayout {
  readonly id: PiecedLayoutId;
  readonly width: number;
  readonly height: number;
  /** Seam lines (2-point straight lines), never on the block outline, never overlapping each other. */
  readonly seams: readonly Polyline[];
  /** Patches that tile the block: their areas sum to width × height and they do not overlap. */
  readonly patches: readonly Patch[];
}

/**
 * Builds a pieced layout for a block of `width` × `height` design units (inches or cm; the layout does
 * not care). Every coordinate is a unit-square coordinate times width or height, so sizes scale exactly
 * (up to one floating-point rounding). Throws on a non-positive size (a caller bug).
 */
export function buildPiecedLayout(id: PiecedLayoutId, width: number, height: number, options: LayoutOptions = {}): PiecedLayout {
  if (!(width > 0 && height > 0 && Number.isFinite(width) && Number.isFinite(height))) {
    throw new Error(`layouts/piecedLayouts: block size must be positive and finite, got ${width} × ${height}`);
  }
  const entry = ENTRIES.find((e) => e.id === id);
  if (!entry) throw new Error(`layouts/piecedLayouts: unknown layout "${String(id)}"`);
  const unit = canonicalize(entry.draw(layoutOptionsSchema.parse(options)));
  const scale = (points: Polyline): Polyline => points.map(([x, y]) => [x * width, y * height] as const);
  const seams = buildSeamsFromPatches(unit.map((p) => p.points)).map(scale);
  const patches = unit.map((p): Patch => {
    const polygon = orientPositive(scale(p.points));
    return { name: p.name, shape: classifyPatch(polygon), polygon };
  });
  return { id, width, height, seams, patches };
}

/**
 * Replaces coordinate values that differ only by rounding (4/5 + 1/5 vs 1, 3·(1/5) vs 3/5) with one
 * representative, so that patches meeting along a line or at a corner share exact coordinates after
 * scaling, and the outline is exactly 0 or 1.
 */
function canonicalize(patches: readonly UnitPatch[]): UnitPatch[] {
  const seen = new Map<number, number>([[0, 0], [1e9, 1]]);
  const pick = (v: number): number => {
    const key = Math.round(v * 1e9);
    const found = seen.get(key);
    if (found !== undefined) return found;
    seen.set(key, v);
    return v;
  };
  return patches.map((p) => ({ name: p.name, points: p.points.map(([x, y]): Point => [pick(x), pick(y)]) }));
}
