import type { Design } from '../design/design.schema.ts';
import type { Point } from '../geometry/point.ts';
import { buildPlanarGraph } from '../graph/planarGraph.ts';
import type { PlanarGraph } from '../graph/planarGraph.types.ts';
import { signedArea, type Polygon } from '../layouts/patch.ts';

/** One face of the seam lines and the block outline: a patch of fabric as it lies in the finished block. */
export interface PatchFace {
  /** Vertices in design units, positive shoelace area (clockwise on screen), collinear vertices dropped. */
  readonly polygon: Polygon;
  /** Area in square design units (> 0). */
  readonly area: number;
  /** Area centroid (design units). */
  readonly centroid: Point;
}

/**
 * The patches of a design: the bounded faces of the planar subdivision made by its seam lines and the block
 * outline (noded by graph/planarGraph, so seams are split at crossings and T-junctions and snapped alike).
 * Faces are traced over half-edges: arriving at a vertex, leave by the next edge clockwise from the one
 * arrived on (the standard planar face walk, e.g. de Berg et al., Computational Geometry, 3rd ed., §2.2).
 * Each bounded face is traced once with positive signed area; the unbounded face and the outer boundaries of
 * seam loops that do not touch the outline come out negative and are dropped, so such a loop's face overlaps
 * the face around it (point location takes the smallest face, see `locatePoint`). A block with no seams is one
 * face. Dangling seam ends are walked around and leave no face of their own.
 */
export function findPatchFaces(design: Design): PatchFace[] {
  const outline: Polygon = [[0, 0], [design.width, 0], [design.width, design.height], [0, design.height]];
  if (design.seams.length === 0) return [toFace(outline)];
  const { start: _s, end: _e, route: _r, ...rest } = design;
  // The noder treats the seams as "lines" here only to reuse its splitting and snapping; kinds do not matter.
  const built = buildPlanarGraph({ ...rest, lines: design.seams, seams: [], edgeTravel: true });
  if (!built.ok) return [toFace(outline)];
  return traceFaces(built.value)
    .filter((polygon) => signedArea(polygon) > 0)
    .map(toFace)
    .filter((face) => face.area > 1e-12 * design.width * design.height);
}

function traceFaces(graph: PlanarGraph): Polygon[] {
  const halfCount = graph.edges.length * 2;
  // Half-edge h = 2e (u→v) or 2e+1 (v→u); outgoing half-edges of each vertex sorted by leaving angle.
  const angleOf = (h: number): number => {
    const pts = graph.edges[h >> 1]!.points;
    const [a, b] = h & 1 ? [pts[pts.length - 1]!, pts[pts.length - 2]!] : [pts[0]!, pts[1]!];
    return Math.atan2(b[1] - a[1], b[0] - a[0]);
  };
  const tail = (h: number): number => (h & 1 ? graph.edges[h >> 1]!.v : graph.edges[h >> 1]!.u);
  const around: number[][] = graph.vertices.map(() => []);
  for (let h = 0; h < halfCount; h++) around[tail(h)]!.push(h);
  const rank = new Int32Array(halfCount);
  for (const list of around) {
    list.sort((a, b) => angleOf(a) - angleOf(b));
    list.forEach((h, i) => (rank[h] = i));
  }
  const next = (h: number): number => {
    const twin = h ^ 1;
    const list = around[tail(twin)]!;
    return list[(rank[twin]! - 1 + list.length) % list.length]!;
  };
  const seen = new Uint8Array(halfCount);
  const faces: Polygon[] = [];
  for (let h0 = 0; h0 < halfCount; h0++) {
    if (seen[h0]) continue;
    const points: Point[] = [];
    for (let h = h0; !seen[h]; h = next(h)) {
      seen[h] = 1;
      const pts = graph.edges[h >> 1]!.points;
      const ordered = h & 1 ? [...pts].reverse() : pts;
      for (let i = 0; i + 1 < ordered.length; i++) points.push(ordered[i]!);
    }
    faces.push(points);
  }
  return faces;
}

function toFace(polygon: Polygon): PatchFace {
  const cleaned = dropCollinear(polygon);
  const area = signedArea(cleaned);
  return { polygon: cleaned, area, centroid: centroidOf(cleaned, area) };
}

/** Drops vertices where the outline runs straight on (T-junction vertices along a patch side). */
function dropCollinear(polygon: Polygon): Polygon {
  let span = 0;
  for (const [x, y] of polygon) span = Math.max(span, Math.abs(x), Math.abs(y));
  const tol = 1e-9 * Math.max(span, 1);
  const out = polygon.filter((b, i) => {
    const a = polygon[(i - 1 + polygon.length) % polygon.length]!;
    const c = polygon[(i + 1) % polygon.length]!;
    const abx = b[0] - a[0];
    const aby = b[1] - a[1];
    const bcx = c[0] - b[0];
    const bcy = c[1] - b[1];
    const cr = abx * bcy - aby * bcx;
    const len = Math.hypot(abx, aby) + Math.hypot(bcx, bcy);
    return Math.abs(cr) > tol * len || abx * bcx + aby * bcy < 0;
  });
  return out.length >= 3 ? out : polygon;
}

/** Area centroid of a simple polygon (shoelace-weighted; Bourke, "Calculating the area and centroid of a polygon", 1988). */
function centroidOf(polygon: Polygon, area: number): Point {
  let cx = 0;
  let cy = 0;
  for (let i = 0; i < polygon.length; i++) {
    const [x0, y0] = polygon[i]!;
    const [x1, y1] = polygon[(i + 1) % polygon.length]!;
    const f = x0 * y1 - x1 * y0;
    cx += (x0 + x1) * f;
    cy += (y0 + y1) * f;
  }
  return [cx / (6 * area), cy / (6 * area)];
}
