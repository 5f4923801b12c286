// The exact planner (reduction after Christofides, Campos, Corberán & Mota 1981; branch-and-cut after Ghiani &
// Laporte, Math. Programming 87 (2000) 467–481) on worked examples with known answers.
import { beforeAll, describe, expect, it } from 'vitest';
import type { PlanarGraph } from '../../graph/planarGraph.types.ts';
import { planRoute, type PlanOptions, type RoutePlan } from '../planRoute.ts';
import { archRowsDesign } from '../../testing/multiPieceDesigns.ts';
import { buildPlanarGraph } from '../../graph/planarGraph.ts';
import { graphFromEdgeList, graphFromSegments } from '../testGraphs.ts';
import { loadHighsSolver } from './highsSolver.ts';
import type { LpSolver } from './lpSolver.ts';

let solver: LpSolver;
beforeAll(async () => {
  solver = await loadHighsSolver();
});
const exact = (o: PlanOptions = {}): PlanOptions => ({ ...o, exact: { solver, timeBudgetMs: 20_000 } });
const routeLength = (p: RoutePlan): number => p.stitchLength + p.travelLength;

// E10 (docs/engine.md §7.3, first found by an exhaustive search over traversal counts 0–2):
// the block border as edge travel (sides cut at y = 4, 8) and two required lines y = 4 and y = 8, edge to edge.
const e10 = (): PlanarGraph =>
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

type Edge = readonly [string, string, number];
const parse = (s: string): Edge[] =>
  s.split(',').map((t) => {
    const [ab, w] = t.trim().split(' ');
    const [a, b] = ab!.split('-');
    return [a!, b!, Number(w)] as const;
  });

describe('the branch-and-cut on the route-inspection worked examples (one piece: must equal the known optimum)', () => {
  // Values from docs/engine.md §7.1 (E1: Pearson A-level text "Chapter 3 Chinese postman problem" with
  // jgrapht's edge assignment; E2–E6: jgrapht ChinesePostmanTest; E7: README of dilsonpereira/chinese-postman-problem).
  const E1 = parse('A-B 50, A-C 50, A-D 50, B-D 50, B-E 70, B-F 50, C-D 70, C-G 70, C-H 120, D-F 60, E-F 70, F-H 60, G-H 70');
  const cases: [string, Edge[], string, string, number][] = [
    ['E1 closed at A', E1, 'A', 'A', 1000],
    ['E1 open A→H', E1, 'A', 'H', 840],
    ['E1 open A→G', E1, 'A', 'G', 910],
    ['E1 open E→G', E1, 'E', 'G', 1030],
    ['E2', parse('A-B 8, A-C 5, A-D 6, B-C 5, B-E 6, C-D 5, C-E 5, D-E 8'), 'A', 'A', 60],
    ['E3', parse('1-2 5, 1-4 4, 1-5 1, 2-3 3, 2-5 1, 2-7 1, 3-4 2, 3-5 3, 3-6 1, 3-7 2, 4-5 1, 6-7 3'), '1', '1', 31],
    [
      'E4',
      parse('1-2 100, 1-3 150, 1-4 200, 2-3 120, 2-5 250, 3-6 200, 4-5 100, 4-7 80, 4-8 160, 5-6 100, 5-7 100, 6-7 150, 6-10 160, 7-9 100, 8-9 40, 9-10 80'),
      '1',
      '1',
      2590,
    ],
    ['E5 (a tree)', parse('1-2 1, 2-3 1, 3-4 1, 2-5 1, 3-6 1'), '1', '1', 10],
    ['E6 (parallel edges)', parse('1-2 1, 1-4 3, 2-3 20, 2-3 10, 3-4 2'), '1', '1', 42],
    ['E7 (a 0-length edge)', parse('0-1 1, 0-4 3, 1-2 0, 1-4 10, 2-3 9, 2-5 2, 2-6 7, 3-6 3, 4-5 4, 4-7 2, 5-7 6, 6-8 4, 6-9 2, 7-8 1, 8-9 5'), '0', '0', 62],
  ];
  for (const [name, edges, from, to, expected] of cases) {
    it(`${name}: ${expected}`, () => {
      const { graph, at } = graphFromEdgeList(edges);
      const plan = planRoute(graph, { start: at(from), end: at(to), exact: { solver, timeBudgetMs: 20_000, always: true } });
      expect(plan.exactSearch?.proven).toBe(true);
      expect(routeLength(plan)).toBe(expected);
    });
  }
});

describe('exact planner on E10 (rural postman, two pieces joined by edge travel)', () => {
  it('closed 32, open (0,0)→(12,12) 48, open (0,4)→(0,8) 28, all proven', () => {
    const graph = e10();
    const closed = planRoute(graph, exact({ start: [0, 4], end: [0, 4] }));
    expect(routeLength(closed)).toBeCloseTo(32, 9);
    expect(closed.optimal).toBe(true);
    expect(closed.gapPercent).toBe(0);
    const corner = planRoute(graph, exact({ start: [0, 0], end: [12, 12] }));
    expect(routeLength(corner)).toBeCloseTo(48, 9);
    expect(corner.optimal).toBe(true);
    const side = planRoute(graph, exact({ start: [0, 4], end: [0, 8] }));
    expect(routeLength(side)).toBeCloseTo(28, 9);
    expect(side.optimal).toBe(true);
  });

  it('free ends: 4 in of travel joins the lines at one side (derived: 24 stitched + one 4 in edge run)', () => {
    const plan = planRoute(e10(), exact());
    expect(plan.travelLength).toBeCloseTo(4, 9);
    expect(plan.passes).toBe(1);
    expect(plan.optimal).toBe(true);
  });

  it('one extra stop: no travel at all, two passes, each tie-off at the edge (hidden under the binding)', () => {
    const plan = planRoute(e10(), exact({ extraStops: 1 }));
    expect(plan.travelLength).toBe(0);
    expect(plan.passes).toBe(2);
    expect(plan.optimal).toBe(true);
    expect(plan.threadEnds).toHaveLength(4);
    for (const end of plan.threadEnds) expect(end.place).toBe('edge');
  });

  it('gives the stops-vs-travel table: 4, 0, 0, 0 in of travel for 0–3 extra stops; unused stops are not made', () => {
    const plan = planRoute(e10(), exact({ stopsTable: true }));
    const rows = plan.stopsTable!;
    expect(rows.map((r) => r.extraStops)).toEqual([0, 1, 2, 3]);
    expect(rows.map((r) => Number(r.travelLength.toFixed(9)))).toEqual([4, 0, 0, 0]);
    expect(rows.map((r) => r.passes)).toEqual([1, 2, 2, 2]);
    expect(rows.every((r) => r.optimal)).toBe(true);
  });
});

describe('time budget', () => {
  it('a design too large for the budget still gets the best route found, with a true bound and its gap', () => {
    // 38 arches on 6 ditch lines; 5 ms is far too little to prove it (it takes the exact search well over that).
    const built = buildPlanarGraph({ ...archRowsDesign(2, 6, 8), start: [0, 0], end: [0, 0] });
    if (!built.ok) throw new Error(built.error.message);
    const rushed = planRoute(built.value, { start: [0, 0], end: [0, 0], exact: { solver, timeBudgetMs: 5 } });
    const heuristic = planRoute(built.value, { start: [0, 0], end: [0, 0] });
    expect(rushed.travelCost).toBeLessThanOrEqual(heuristic.travelCost + 1e-9);
    expect(rushed.travelLowerBound).toBeLessThanOrEqual(rushed.travelCost + 1e-9);
    expect(rushed.travelLowerBound).toBeGreaterThanOrEqual(heuristic.travelLowerBound - 1e-6);
    if (!rushed.optimal) expect(rushed.gapPercent).toBeGreaterThan(0);
    const patient = planRoute(built.value, { start: [0, 0], end: [0, 0], exact: { solver, timeBudgetMs: 60_000 } });
    expect(patient.optimal).toBe(true);
    // The rushed bound is a true bound: never above the proven optimum.
    expect(rushed.travelLowerBound).toBeLessThanOrEqual(patient.travelCost + 1e-9);
  });
});
