import type { Design, Units } from '../design/design.schema.ts';
import { bboxOfPoints, type BBox } from '../geometry/bbox.ts';
import { pointSegmentDistance } from '../geometry/distance.ts';
import type { Point, Polyline } from '../geometry/point.ts';
import { distanceToOutline, isInsideOrOn } from '../motifs/polygon.ts';
import type { NamedPatch } from './patchNames.ts';

/** What the step texts need to know about where things are in a block. */
export interface BlockPlaces {
  readonly width: number;
  readonly height: number;
  readonly units: Units;
  readonly seams: readonly Polyline[];
  readonly patches: readonly NamedPatch[];
  readonly boxes: readonly BBox[];
  /** Distance (design units) within which a point counts as "at" a corner, an edge or a seam: 1/16 in. */
  readonly near: number;
}

export function buildBlockPlaces(design: Design, patches: readonly NamedPatch[]): BlockPlaces {
  return {
    width: design.width,
    height: design.height,
    units: design.units,
    seams: design.seams,
    patches,
    boxes: patches.map((p) => bboxOfPoints(p.polygon)),
    near: design.units === 'in' ? 1 / 16 : 2.54 / 16,
  };
}

/** Index of the smallest patch holding p (inside or on its outline), or -1 outside every patch. */
export function findPatchAt(places: BlockPlaces, p: Point): number {
  let best = -1;
  places.patches.forEach((patch, i) => {
    const box = places.boxes[i]!;
    if (p[0] < box.minX || p[0] > box.maxX || p[1] < box.minY || p[1] > box.maxY) return;
    if (!isInsideOrOn(p, patch.polygon, 0)) return;
    if (best < 0 || patch.area < places.patches[best]!.area) best = i;
  });
  return best;
}

/** One stretch of a line inside one patch; consecutive stretches are in different patches. */
export interface PatchVisit {
  readonly patch: number;
  readonly length: number;
}

/**
 * The patches a line passes through, in order, with the length inside each (design units). Each segment is cut
 * into pieces no longer than 1/48 of the block's shorter side and each piece is placed by its midpoint, so a
 * crossing is placed to within that resolution. Stretches outside every patch are left out.
 */
export function findPatchVisits(places: BlockPlaces, points: Polyline): PatchVisit[] {
  const stepLength = Math.min(places.width, places.height) / 48;
  const visits: { patch: number; length: number }[] = [];
  for (let i = 1; i < points.length; i++) {
    const [a, b] = [points[i - 1]!, points[i]!];
    const length = Math.hypot(b[0] - a[0], b[1] - a[1]);
    const pieces = Math.max(1, Math.ceil(length / stepLength));
    for (let k = 0; k < pieces; k++) {
      const t = (k + 0.5) / pieces;
      const patch = findPatchAt(places, [a[0] + (b[0] - a[0]) * t, a[1] + (b[1] - a[1]) * t]);
      if (patch < 0) continue;
      const last = visits[visits.length - 1];
      if (last && last.patch === patch) last.length += length / pieces;
      else visits.push({ patch, length: length / pieces });
    }
  }
  return visits;
}

/**
 * Where a point is, in words a quilter can find on the block: "the top-left corner of the block", "the top
 * edge of the block, by the top-left square", "the bottom-right corner of the centre square", "the seam
 * between the top square and the centre square", or "a point inside the centre square".
 */
export function describePlace(places: BlockPlaces, p: Point): string {
  const { width: w, height: h, near } = places;
  const nearX = Math.abs(p[0]) <= near ? 'left' : Math.abs(p[0] - w) <= near ? 'right' : '';
  const nearY = Math.abs(p[1]) <= near ? 'top' : Math.abs(p[1] - h) <= near ? 'bottom' : '';
  if (nearX && nearY) return `the ${nearY}-${nearX} corner of the block`;
  const patchIndex = findPatchAt(places, p);
  const patch = patchIndex >= 0 ? places.patches[patchIndex]! : null;
  const single = places.patches.length === 1;
  if (nearX || nearY) {
    return patch && !single ? `the ${nearY || nearX} edge of the block, by the ${patch.name}` : `the ${nearY || nearX} edge of the block`;
  }
  const cornerOf = smallestPatchWithCorner(places, p);
  if (cornerOf) return `the ${cornerWord(p, cornerOf.centroid)} corner of the ${cornerOf.name}`;
  const touching = places.patches.filter((q) => distanceToOutline(p, q.polygon) <= near);
  if (touching.length === 2 && isOnSeam(places, p)) return `the seam between the ${touching[0]!.name} and the ${touching[1]!.name}`;
  if (isOnSeam(places, p)) return patch ? `the seam by the ${patch.name}` : 'the seam';
  return patch && !single ? `a point inside the ${patch.name}` : 'a point inside the block';
}

function isOnSeam(places: BlockPlaces, p: Point): boolean {
  return places.seams.some((seam) => seam.some((a, i) => i > 0 && pointSegmentDistance(p, seam[i - 1]!, a) <= places.near));
}

function smallestPatchWithCorner(places: BlockPlaces, p: Point): NamedPatch | null {
  if (places.patches.length === 1) return null;
  let best: NamedPatch | null = null;
  for (const patch of places.patches) {
    const at = patch.polygon.some((v) => Math.hypot(v[0] - p[0], v[1] - p[1]) <= places.near);
    if (at && (best === null || patch.area < best.area)) best = patch;
  }
  return best;
}

/** "top-left", "bottom", … : the side of `centre` where `p` lies (diagonal when neither axis dominates 2:1). */
function cornerWord(p: Point, centre: Point): string {
  const dx = p[0] - centre[0];
  const dy = p[1] - centre[1];
  const col = dx < 0 ? 'left' : 'right';
  const row = dy < 0 ? 'top' : 'bottom';
  if (Math.abs(dx) > 2 * Math.abs(dy)) return col;
  if (Math.abs(dy) > 2 * Math.abs(dx)) return row;
  return `${row}-${col}`;
}
