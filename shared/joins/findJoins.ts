import type { Design } from '../design/design.schema.ts';
import type { Point, Polyline } from '../geometry/point.ts';
import type { DesignProblem } from '../graph/designProblem.ts';
import type { LineKind } from '../graph/planarGraph.types.ts';
import { ok, type Result } from '../result.ts';
import { closestPair, indexPart, meetsAnotherPart } from './closestPoints.ts';
import { edgeRuns } from './edgeRuns.ts';
import { countLineGroups, findTravelParts } from './lineGroups.ts';

/** What a join's end meets: another quilting line, a seam (the route goes on in the ditch) or the block edge. */
export type JoinEnd = 'line' | 'seam' | 'edge';

/** One new line of a join, from one travel part to another. */
export interface JoinLeg {
  /** The line to stitch: two points for a straight line, or a run along the edge (corners included). */
  readonly points: readonly Point[];
  readonly length: number;
  /** False when it runs along the block edge, inside the binding band, where the binding hides it. */
  readonly visible: boolean;
  readonly fromEnd: JoinEnd;
  readonly toEnd: JoinEnd;
}

/** The shortest connection found between two neighbouring passes (line groups not yet joined by travel). */
export interface JoinProposal {
  /** Indices into `JoinSuggestions.groups`. */
  readonly groups: readonly [number, number];
  /** Total length of new line, design units. */
  readonly length: number;
  /** New lines in order from the first group to the second; between legs the route travels a travel-only part. */
  readonly legs: readonly JoinLeg[];
  /** True when some leg is a new line the quilt will show (inside a patch); false when all hide in the binding band. */
  readonly visible: boolean;
  /** Stops the join saves: passes before less passes after (a leg may touch a third pass too). */
  readonly stopsSaved: number;
}

export interface JoinSuggestions {
  /**
   * The route's passes, each with its quilting lines (indices into design.lines): line groups that ditch,
   * edge or retrace travel already connect make one pass and need no join.
   */
  readonly groups: readonly { readonly lines: readonly number[] }[];
  /** Joins between neighbouring groups, shortest first. */
  readonly joins: readonly JoinProposal[];
}

const endOf = (kind: LineKind): JoinEnd => (kind === 'quilting' ? 'line' : kind);

/**
 * Where to join the design's line groups so the route needs fewer stops (the engine half of the join
 * helper; the glossary's *join*). The needle may travel free along a
 * travel part (seams in the ditch, the edge in the binding band when edge travel is on, lines already
 * stitched), so a connection is a chain of new lines between travel parts, and its length is the new
 * stitching it adds. For two groups A and B the shortest connection is exact over that model: each new line
 * is the shortest segment between two parts that meets no third part (closestPoints.ts; a shortest path in
 * the plane between two parts is straight until it meets a third, where it may as well stop), or, while edge travel is off, a
 * run along the edge between neighbouring points where parts meet it (edgeRuns.ts; preferred on a tie, as
 * the binding hides it); Dijkstra's algorithm over the parts then finds the cheapest chain, passing only
 * through travel-only parts. Groups are neighbours unless a third group lies nearer to both (the relative
 * neighbourhood graph of the connection lengths; Toussaint 1980), so the list stays short yet always
 * contains a join for every group that can be joined (the graph holds a minimum spanning tree).
 */
export function findJoins(design: Design): Result<JoinSuggestions, DesignProblem> {
  if (design.lines.length === 0) return ok({ groups: [], joins: [] });
  const found = findTravelParts(design);
  if (!found.ok) return found;
  const { parts, groups, graph, partOfVertex } = found.value;
  const summary = groups.map((g) => ({ lines: parts[g]!.lines }));
  if (groups.length < 2) return ok({ groups: summary, joins: [] });

  const count = parts.length;
  const best: (JoinLeg | null)[][] = parts.map(() => parts.map(() => null));
  const indexed = parts.map(indexPart);
  const meets = meetsAnotherPart(parts, 1e-9 * Math.max(design.width, design.height));
  for (let i = 0; i < count; i++) {
    for (let j = i + 1; j < count; j++) {
      const c = closestPair(indexed[i]!, indexed[j]!);
      // A line meeting a third part on its way is never needed: the chain through that part is as short, and
      // its legs each stay inside one patch.
      if (!c || meets(c.from, c.to, i, j)) continue;
      const leg: JoinLeg = { points: [c.from, c.to], length: c.length, visible: !alongOneSide(c.from, c.to, design), fromEnd: endOf(c.fromKind), toEnd: endOf(c.toKind) };
      best[i]![j] = leg;
      best[j]![i] = reversed(leg);
    }
  }
  if (!design.edgeTravel) {
    for (const run of edgeRuns(design, graph, partOfVertex)) {
      const [i, j] = [run.fromPart, run.toPart];
      const current = best[i]![j];
      if (current && current.length < run.leg.length * (1 - 1e-9)) continue;
      best[i]![j] = run.leg;
      best[j]![i] = reversed(run.leg);
    }
  }

  const isGroup = new Set(groups);
  const chains = groups.map((source) => shortestChains(source, best, isGroup));
  const distance = (a: number, b: number): number => chains[a]!.dist[groups[b]!]!;
  const before = groups.length;
  const joins: JoinProposal[] = [];
  for (let a = 0; a < groups.length; a++) {
    for (let b = a + 1; b < groups.length; b++) {
      const d = distance(a, b);
      if (!Number.isFinite(d)) continue;
      const nearer = groups.some((_, c) => c !== a && c !== b && distance(a, c) < d * (1 - 1e-12) && distance(c, b) < d * (1 - 1e-12));
      if (nearer) continue;
      const legs = chains[a]!.legsTo(groups[b]!);
      const lines: Polyline[] = legs.map((l) => l.points);
      const after = countLineGroups({ ...design, lines: [...design.lines, ...lines] });
      joins.push({ groups: [a, b], length: d, legs, visible: legs.some((l) => l.visible), stopsSaved: before - after });
    }
  }
  joins.sort((x, y) => x.length - y.length || x.groups[0] - y.groups[0] || x.groups[1] - y.groups[1]);
  return ok({ groups: summary, joins });
}

/** The lines a join adds to `design.lines` (its legs), in order. */
export function joinLines(join: JoinProposal): Polyline[] {
  return join.legs.map((l) => l.points);
}

/**
 * Dijkstra from one group over the parts (dense: the number of parts is small), where a leg between parts i
 * and j costs its length; other groups are reached but never passed through.
 */
function shortestChains(source: number, best: readonly (readonly (JoinLeg | null)[])[], isGroup: ReadonlySet<number>) {
  const n = best.length;
  const dist = new Array<number>(n).fill(Infinity);
  const previous = new Int32Array(n).fill(-1);
  const done = new Uint8Array(n);
  dist[source] = 0;
  for (;;) {
    let u = -1;
    for (let v = 0; v < n; v++) if (!done[v] && Number.isFinite(dist[v]!) && (u < 0 || dist[v]! < dist[u]!)) u = v;
    if (u < 0) break;
    done[u] = 1;
    if (u !== source && isGroup.has(u)) continue;
    for (let v = 0; v < n; v++) {
      const leg = best[u]![v];
      if (leg && !done[v] && dist[u]! + leg.length < dist[v]!) {
        dist[v] = dist[u]! + leg.length;
        previous[v] = u;
      }
    }
  }
  const legsTo = (target: number): JoinLeg[] => {
    const legs: JoinLeg[] = [];
    for (let v = target; previous[v]! >= 0; v = previous[v]!) legs.unshift(best[previous[v]!]![v]!);
    return legs;
  };
  return { dist, legsTo };
}

function reversed(leg: JoinLeg): JoinLeg {
  return { ...leg, points: [...leg.points].reverse(), fromEnd: leg.toEnd, toEnd: leg.fromEnd };
}

/** Whether the straight line from a to b runs along one block side (both ends on it, within rounding). */
function alongOneSide(a: Point, b: Point, design: Design): boolean {
  const tol = 1e-9 * Math.max(design.width, design.height);
  const sides = (p: Point): boolean[] => [Math.abs(p[0]) <= tol, Math.abs(p[1]) <= tol, Math.abs(design.width - p[0]) <= tol, Math.abs(design.height - p[1]) <= tol];
  const [sa, sb] = [sides(a), sides(b)];
  return sa.some((on, i) => on && sb[i]);
}
