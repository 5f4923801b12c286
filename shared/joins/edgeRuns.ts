import type { Design } from '../design/design.schema.ts';
import type { Point } from '../geometry/point.ts';
import type { PlanarGraph } from '../graph/planarGraph.types.ts';
import type { JoinEnd, JoinLeg } from './findJoins.ts';

/** A run along the block edge from one travel part to the next one met along the edge. */
export interface EdgeRun {
  readonly fromPart: number;
  readonly toPart: number;
  readonly leg: JoinLeg;
}

/**
 * Runs along the block edge (stitched inside the binding band, where the binding hides them) between
 * neighbouring points where travel parts meet the edge, for a design whose edge travel is off. Contacts are
 * graph vertices on the outline (the graph is noded with the outline, see lineGroups.ts) in order round the
 * block, clockwise on screen from the top-left corner; a run joins each contact to the next when their parts
 * differ. Any run along the edge from one part to another passes such a neighbouring pair, so these are the
 * shortest edge connections.
 */
export function edgeRuns(design: Design, graph: PlanarGraph, partOfVertex: Int32Array): EdgeRun[] {
  const { width: w, height: h } = design;
  const perimeter = 2 * (w + h);
  const tol = 1e-9 * Math.max(w, h);
  const kindAt = new Map<number, JoinEnd>();
  for (const e of graph.edges) {
    if (e.kind === 'edge') continue;
    for (const v of [e.u, e.v]) if (kindAt.get(v) !== 'line') kindAt.set(v, e.kind === 'quilting' ? 'line' : 'seam');
  }
  const contacts = graph.vertices
    .map((p, v) => ({ v, p, at: positionOnOutline(p, w, h, tol) }))
    .filter((c): c is { v: number; p: Point; at: number } => c.at !== null && partOfVertex[c.v]! >= 0 && kindAt.has(c.v))
    .sort((a, b) => a.at - b.at);
  const runs: EdgeRun[] = [];
  contacts.forEach((c, i) => {
    const next = contacts[(i + 1) % contacts.length]!;
    if (contacts.length < 2 || partOfVertex[c.v] === partOfVertex[next.v]) return;
    const length = (((next.at - c.at) % perimeter) + perimeter) % perimeter;
    const points = [c.p, ...cornersBetween(c.at, c.at + length, w, h), next.p];
    runs.push({ fromPart: partOfVertex[c.v]!, toPart: partOfVertex[next.v]!, leg: { points, length, visible: false, fromEnd: kindAt.get(c.v)!, toEnd: kindAt.get(next.v)! } });
  });
  return runs;
}

/** Distance along the outline from the top-left corner, clockwise on screen (right along the top first). */
function positionOnOutline([x, y]: Point, w: number, h: number, tol: number): number | null {
  if (Math.abs(y) <= tol && x >= -tol && x <= w + tol) return Math.max(0, x);
  if (Math.abs(x - w) <= tol && y >= -tol && y <= h + tol) return w + Math.max(0, y);
  if (Math.abs(y - h) <= tol && x >= -tol && x <= w + tol) return w + h + (w - Math.min(w, x));
  if (Math.abs(x) <= tol && y >= -tol && y <= h + tol) return 2 * w + h + (h - Math.min(h, y));
  return null;
}

/** Block corners passed going clockwise from outline position `from` to `to` (to may exceed the perimeter). */
function cornersBetween(from: number, to: number, w: number, h: number): Point[] {
  const perimeter = 2 * (w + h);
  const corners: [number, Point][] = [[w, [w, 0]], [w + h, [w, h]], [2 * w + h, [0, h]], [perimeter, [0, 0]]];
  const out: Point[] = [];
  for (let lap = 0; lap <= 1; lap++) {
    for (const [at, p] of corners) {
      const pos = at + lap * perimeter;
      if (pos > from && pos < to) out.push(p);
    }
  }
  return out;
}
