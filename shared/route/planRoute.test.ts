import { describe, expect, it } from 'vitest';
import type { PlanarGraph } from '../graph/planarGraph.types.ts';
import { planRoute, type RoutePlan } from './planRoute.ts';
import { crosshatchGraph, graphFromEdgeList, graphFromSegments } from './testGraphs.ts';

type Edge = readonly [string, string, number];
const parse = (s: string): Edge[] =>
  s.split(',').map((t) => {
    const [ab, w] = t.trim().split(' ');
    const [a, b] = ab!.split('-');
    return [a!, b!, Number(w)] as const;
  });

const total = (g: PlanarGraph): number => g.edges.reduce((s, e) => s + e.length, 0);
const routeLength = (p: RoutePlan): number => p.stitchLength + p.travelLength;

/** Invariants every plan must keep: each quilting edge stitched once, passes continuous, strokes' lengths add up. */
function expectValidRoute(graph: PlanarGraph, plan: RoutePlan): void {
  const stitchTotal = graph.edges.filter((e) => e.kind === 'quilting').reduce((s, e) => s + e.length, 0);
  expect(plan.stitchLength).toBeCloseTo(stitchTotal, 9);
  for (let i = 1; i < plan.route.length; i++) {
    const a = plan.route[i - 1]!;
    const b = plan.route[i]!;
    if (a.pass === b.pass) expect(b.points[0]).toEqual(a.points[a.points.length - 1]);
    else expect(b.pass).toBe(a.pass + 1);
  }
}

// Source: Pearson Education A-level decision maths text, "Chapter 3 Chinese postman problem" (13 streets, odd A and H,
// AB+BF+FH = 160); edge assignment from jgrapht ChinesePostmanTest.testUndirectedGraph1 (expects 1000).
// Values as listed in docs/engine.md §7.1, E1.
const E1 = parse('A-B 50, A-C 50, A-D 50, B-D 50, B-E 70, B-F 50, C-D 70, C-G 70, C-H 120, D-F 60, E-F 70, F-H 60, G-H 70');

describe('planRoute on worked route-inspection examples', () => {
  it('E1 (Pearson / jgrapht graph 1): total 840, closed 1000, open A→H 840, A→G 910, E→G 1030', () => {
    const { graph, at } = graphFromEdgeList(E1);
    expect(total(graph)).toBe(840);
    const closed = planRoute(graph, { start: at('A'), end: at('A') });
    expect(routeLength(closed)).toBe(1000);
    expect(closed.oddPoints).toBe(2);
    expect(closed.optimal).toBe(true);
    expectValidRoute(graph, closed);
    expect(routeLength(planRoute(graph, { start: at('A'), end: at('H') }))).toBe(840);
    expect(routeLength(planRoute(graph, { start: at('A'), end: at('G') }))).toBe(910);
    expect(routeLength(planRoute(graph, { start: at('E'), end: at('G') }))).toBe(1030);
  });

  // jgrapht ChinesePostmanTest testUndirectedGraph2..5 and testGraphWithMultipleEdges (closed tours; values from
  // docs/engine.md §7.1, re-computed with networkx 2.8).
  const closedCases: [string, Edge[], number][] = [
    ['E2 (jgrapht graph 2)', parse('A-B 8, A-C 5, A-D 6, B-C 5, B-E 6, C-D 5, C-E 5, D-E 8'), 60],
    ['E3 (jgrapht graph 3)', parse('1-2 5, 1-4 4, 1-5 1, 2-3 3, 2-5 1, 2-7 1, 3-4 2, 3-5 3, 3-6 1, 3-7 2, 4-5 1, 6-7 3'), 31],
    [
      'E4 (jgrapht graph 4)',
      parse('1-2 100, 1-3 150, 1-4 200, 2-3 120, 2-5 250, 3-6 200, 4-5 100, 4-7 80, 4-8 160, 5-6 100, 5-7 100, 6-7 150, 6-10 160, 7-9 100, 8-9 40, 9-10 80'),
      2590,
    ],
    ['E5 (jgrapht graph 5, a tree)', parse('1-2 1, 2-3 1, 3-4 1, 2-5 1, 3-6 1'), 10],
    ['E6 (jgrapht multigraph)', parse('1-2 1, 1-4 3, 2-3 20, 2-3 10, 3-4 2'), 42],
    // README of dilsonpereira/chinese-postman-problem (note the 0-weight edge).
    ['E7 (dilsonpereira README)', parse('0-1 1, 0-4 3, 1-2 0, 1-4 10, 2-3 9, 2-5 2, 2-6 7, 3-6 3, 4-5 4, 4-7 2, 5-7 6, 6-8 4, 6-9 2, 7-8 1, 8-9 5'), 62],
  ];
  for (const [name, edges, expected] of closedCases) {
    it(`${name}: closed tour ${expected}`, () => {
      const { graph, at } = graphFromEdgeList(edges);
      const v0 = at(edges[0]![0]);
      const plan = planRoute(graph, { start: v0, end: v0 });
      expect(routeLength(plan)).toBe(expected);
      expect(plan.optimal).toBe(true);
      expectValidRoute(graph, plan);
    });
  }

  it('E8 analytic: unit K4, K6, Petersen, cube Q3 closed tours are 8, 18, 20, 16 (a perfect matching inside the graph)', () => {
    const complete = (n: number): Edge[] => {
      const out: Edge[] = [];
      for (let i = 0; i < n; i++) for (let j = i + 1; j < n; j++) out.push([`v${i}`, `v${j}`, 1]);
      return out;
    };
    const petersen: Edge[] = [];
    for (let i = 0; i < 5; i++) {
      petersen.push([`o${i}`, `o${(i + 1) % 5}`, 1], [`o${i}`, `i${i}`, 1], [`i${i}`, `i${(i + 2) % 5}`, 1]);
    }
    const cube: Edge[] = [];
    for (let a = 0; a < 8; a++) for (let b = 0; b < 3; b++) if (!(a & (1 << b))) cube.push([`c${a}`, `c${a | (1 << b)}`, 1]);
    for (const [edges, expected] of [[complete(4), 8], [complete(6), 18], [petersen, 20], [cube, 16]] as const) {
      const { graph, at } = graphFromEdgeList(edges);
      const v0 = at(edges[0]![0]);
      expect(routeLength(planRoute(graph, { start: v0, end: v0 }))).toBe(expected);
    }
  });

  it('Königsberg (Euler 1736): four odd points, so one pass needs travel', () => {
    // Island A, banks B and C, east land D; seven bridges (Euler, Commentarii Acad. Sci. Petropolitanae 8, 1736).
    const { graph } = graphFromEdgeList(parse('A-B 1, A-B 1, A-C 1, A-C 1, A-D 1, B-D 1, C-D 1'));
    const plan = planRoute(graph);
    expect(plan.oddPoints).toBe(4);
    expect(plan.passes).toBe(1);
    expect(plan.pieces).toBe(1);
    // Free ends take two odd points; the other two need one retraced bridge.
    expect(plan.retraceLength).toBe(1);
    expect(plan.optimal).toBe(true);
  });
});

describe('planRoute on quilting grids', () => {
  // E9 (derived in docs/engine.md §7.2 and checked with exact rationals and networkx): retrace is 24 for
  // every N, closed and open (0,0)→(12,12) or (0,0)→(12,0).
  for (const n of [4, 5, 6, 12, 48]) {
    it(`E9 crosshatch N=${n}: 4N odd points, retrace 24 closed and open`, () => {
      const graph = crosshatchGraph(n);
      const closed = planRoute(graph, { start: [0, 0], end: [0, 0] });
      expect(closed.oddPoints).toBe(4 * n);
      expect(closed.stitchLength).toBeCloseTo(48 + 24 * n, 9);
      expect(closed.retraceLength).toBeCloseTo(24, 9);
      expect(closed.optimal).toBe(true);
      expectValidRoute(graph, closed);
      expect(planRoute(graph, { start: [0, 0], end: [12, 12] }).retraceLength).toBeCloseTo(24, 9);
      expect(planRoute(graph, { start: [0, 0], end: [12, 0] }).retraceLength).toBeCloseTo(24, 9);
    });
  }

  // E10 (docs/engine.md §7.3, exhaustive oracle): border as edge travel (sides cut at y = 4, 8), two required
  // lines y = 4 and y = 8. Two pieces that travel must join.
  const e10 = () =>
    graphFromSegments([
      [[0, 4], [12, 4], 'quilting'],
      [[0, 8], [12, 8], 'quilting'],
      [[0, 0], [12, 0], 'edge'],
      [[0, 12], [12, 12], 'edge'],
      [[0, 0], [0, 4], 'edge'],
      [[0, 4], [0, 8], 'edge'],
      [[0, 8], [0, 12], 'edge'],
      [[12, 0], [12, 4], 'edge'],
      [[12, 4], [12, 8], 'edge'],
      [[12, 8], [12, 12], 'edge'],
    ]);
  it('E10: closed 32, open (0,0)→(12,12) 48, open (0,4)→(0,8) 28', () => {
    const graph = e10();
    const closed = planRoute(graph, { start: [0, 4], end: [0, 4] });
    expect(closed.pieces).toBe(2);
    expect(closed.passes).toBe(1);
    expect(routeLength(closed)).toBe(32);
    expect(closed.optimal).toBe(true);
    expectValidRoute(graph, closed);
    expect(routeLength(planRoute(graph, { start: [0, 0], end: [12, 12] }))).toBe(48);
    expect(routeLength(planRoute(graph, { start: [0, 4], end: [0, 8] }))).toBe(28);
  });

  it('E10 without edge travel: the two lines become two passes', () => {
    const plan = planRoute(e10(), { edgeTravel: false });
    expect(plan.passes).toBe(2);
    expect(plan.stops).toBe(1);
    expect(plan.travelLength).toBe(0);
    expect(plan.route.map((s) => s.pass)).toEqual([1, 2]);
  });
});
