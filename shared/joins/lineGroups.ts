import type { Design } from '../design/design.schema.ts';
import type { Point } from '../geometry/point.ts';
import type { DesignProblem } from '../graph/designProblem.ts';
import { buildPlanarGraph } from '../graph/planarGraph.ts';
import type { LineKind, PlanarGraph } from '../graph/planarGraph.types.ts';
import { ok, type Result } from '../result.ts';

/**
 * A connected part of what the needle may run on: quilting lines, seams (ditch travel) and, with edge travel
 * on, the block edge. One holding quilting lines is one pass of the route — its line groups are already
 * joined by travel, as the planner counts passes (route/planRoute: one per group of pieces that travel lines
 * connect); one without is travel only (e.g. the seams and edge when no motif touches them).
 */
export interface TravelPart {
  /** Quilting lines in it (indices into design.lines); empty for a travel-only part. */
  readonly lines: readonly number[];
  /** Its pieces of line, each with the kind of line it runs on. */
  readonly segments: readonly { readonly a: Point; readonly b: Point; readonly kind: LineKind }[];
}

export interface TravelParts {
  readonly graph: PlanarGraph;
  readonly parts: readonly TravelPart[];
  /** Indices into `parts` of the parts holding quilting lines (one pass each), in the order of their lowest vertex. */
  readonly groups: readonly number[];
  /** Part of each graph vertex, −1 for a vertex only the edge reaches while edge travel is off. */
  readonly partOfVertex: Int32Array;
}

/**
 * Splits the design into travel parts. The graph is noded with the block outline always present (so points
 * where lines meet the edge are vertices), but the outline joins parts only when `design.edgeTravel` is on.
 */
export function findTravelParts(design: Design): Result<TravelParts, DesignProblem> {
  const built = buildPlanarGraph({ ...design, edgeTravel: true });
  if (!built.ok) return built;
  const graph = built.value;
  const n = graph.vertices.length;
  const parent = Int32Array.from({ length: n }, (_, i) => i);
  const find = (v: number): number => {
    while (parent[v] !== v) v = parent[v] = parent[parent[v]!]!;
    return v;
  };
  const travels = (kind: LineKind): boolean => kind !== 'edge' || design.edgeTravel;
  const reached = new Uint8Array(n);
  for (const e of graph.edges) {
    if (!travels(e.kind)) continue;
    parent[find(e.u)] = find(e.v);
    reached[e.u] = reached[e.v] = 1;
  }
  const partOfRoot = new Map<number, number>();
  const partOfVertex = new Int32Array(n).fill(-1);
  const lines: Set<number>[] = [];
  const segments: TravelPart['segments'][number][][] = [];
  for (let v = 0; v < n; v++) {
    if (!reached[v]) continue;
    const root = find(v);
    let p = partOfRoot.get(root);
    if (p === undefined) {
      p = lines.length;
      partOfRoot.set(root, p);
      lines.push(new Set());
      segments.push([]);
    }
    partOfVertex[v] = p;
  }
  for (const e of graph.edges) {
    if (!travels(e.kind)) continue;
    const p = partOfVertex[e.u]!;
    if (e.kind === 'quilting') lines[p]!.add(e.source);
    for (let k = 1; k < e.points.length; k++) segments[p]!.push({ a: e.points[k - 1]!, b: e.points[k]!, kind: e.kind });
  }
  const parts = lines.map((l, i) => ({ lines: [...l].sort((a, b) => a - b), segments: segments[i]! }));
  const groups = parts.map((p, i) => (p.lines.length > 0 ? i : -1)).filter((i) => i >= 0);
  return ok({ graph, parts, groups, partOfVertex });
}

/** Number of passes the planner needs for a design (parts holding quilting lines); 0 when it has no quilting lines. */
export function countLineGroups(design: Design): number {
  if (design.lines.length === 0) return 0;
  const found = findTravelParts(design);
  return found.ok ? found.value.groups.length : 0;
}
