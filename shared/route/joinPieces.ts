import type { PathSearch } from './shortestPaths.ts';

/**
 * Joins components (given as vertex → component id, −1 for vertices in none) with travel paths that form a minimum
 * spanning tree over the components under shortest-path distance: Prim's algorithm on the metric closure, run as a
 * multi-source Dijkstra from everything joined so far that stops at the first vertex of a new component.
 * Returns the paths as lists of graph edge ids and their Σ integer cost.
 */
export function joinComponents(
  search: PathSearch,
  vertices: readonly number[],
  componentOf: (v: number) => number,
): { paths: number[][]; cost: number } {
  const members = new Map<number, number[]>();
  for (const v of vertices) {
    const c = componentOf(v);
    if (c < 0) continue;
    const list = members.get(c);
    if (list) list.push(v);
    else members.set(c, [v]);
  }
  const order = [...members.keys()].sort((a, b) => a - b);
  if (order.length <= 1) return { paths: [], cost: 0 };
  const joined = new Set<number>([order[0]!]);
  const sources: number[] = [...members.get(order[0]!)!];
  const paths: number[][] = [];
  let cost = 0;
  while (joined.size < members.size) {
    let reached = -1;
    let reachedAt = 0;
    search.run(sources, (v, d) => {
      const c = componentOf(v);
      if (c < 0 || joined.has(c) || !members.has(c)) return false;
      reached = v;
      reachedAt = d;
      return true;
    });
    if (reached < 0) throw new Error('route/joinPieces: components are not connected by travel lines');
    const comp = componentOf(reached);
    const path = search.pathTo(reached);
    paths.push(path);
    cost += reachedAt;
    joined.add(comp);
    sources.push(...members.get(comp)!);
  }
  return { paths, cost };
}
