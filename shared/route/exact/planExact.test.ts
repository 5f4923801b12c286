// The exact planner (reduction after Christofides, Campos, Corberán & Mota 1981; branch-and-cut after Ghiani &
// Laporte, Math. Programming 87 (2000) 467–481) on worked examples with known answers.
import { beforeAll, describe, expect, it } from 'vitest';
import type { PlanarGraph } from '../../graph/planarGraph.types.ts';
import { planRoute, type PlanOptions, type RoutePlan } from '../planRoute.ts';
import { graphFromSegments } from '../testGraphs.ts';
import { loadHighsSolver } from './highsSolver.ts';
import type { MipSolver } from './mipSolver.ts';

let solver: MipSolver;
beforeAll(async () => {
  solver = await loadHighsSolver();
});
const exact = (o: PlanOptions = {}): PlanOptions => ({ ...o, exact: { solver, timeBudgetMs: 20_000 } });
const routeLength = (p: RoutePlan): number => p.stitchLength + p.travelLength;

// E10 (shared/notes/engine-references.md §2, checked there by an exhaustive oracle over traversal counts 0–2):
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
