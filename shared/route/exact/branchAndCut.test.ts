// The search stopped part way: whatever it answers must still be a route with a true lower bound. The optimum each
// stop is compared with is proven by the same search given time, and that one is checked against CBC on the same
// design family in tests/reference/planRoute.cbc.test.ts and the benchmark.
import { beforeAll, describe, expect, it } from 'vitest';
import { buildPlanarGraph } from '../../graph/planarGraph.ts';
import { patchFillDesign, squareInSquareDesign } from '../../testing/multiPieceDesigns.ts';
import type { PlanarGraph } from '../../graph/planarGraph.types.ts';
import { planRoute, type PlanOptions } from '../planRoute.ts';
import { loadHighsSolver } from './highsSolver.ts';
import type { LpSolver } from './lpSolver.ts';

let highs: LpSolver;
beforeAll(async () => {
  highs = await loadHighsSolver();
});

/** HiGHS, with every solve reported as taking 10 ms: with no clock the budget counts solver time, so a budget of k × 10 ms allows exactly k solves. */
function countedSolver(): { solver: LpSolver; solves: () => number } {
  let solves = 0;
  const solver: LpSolver = {
    name: 'HiGHS, 10 ms a solve',
    open(program) {
      const session = highs.open(program);
      return {
        addRows: (rows) => session.addRows(rows),
        setBounds: (lower, upper) => session.setBounds(lower, upper),
        solve: (limit) => {
          solves++;
          return { ...session.solve(limit), seconds: 0.01 };
        },
        dispose: () => session.dispose(),
      };
    },
  };
  return { solver, solves: () => solves };
}

function graphOf(design: Parameters<typeof buildPlanarGraph>[0]): PlanarGraph {
  const built = buildPlanarGraph(design);
  if (!built.ok) throw new Error(built.error.message);
  return built.value;
}

describe('branch-and-cut stopped by its budget', () => {
  const cases: [string, PlanarGraph, PlanOptions][] = [
    ['patch fills 5×5, start fixed', graphOf({ ...patchFillDesign(1, 5, 3), start: [0, 0] }), { start: [0, 0] }],
    ['square in a square ≤8, corner to corner', graphOf({ ...squareInSquareDesign(3, 8), start: [0, 0], end: [12, 12] }), { start: [0, 0], end: [12, 12] }],
  ];
  for (const [name, graph, options] of cases) {
    it(`${name}: stopped after 1, 2, a quarter, half and all but 2 of the solves it needs, the route is never shorter than the optimum and the bound never above it`, () => {
      const full = countedSolver();
      const proven = planRoute(graph, { ...options, exact: { solver: full.solver, timeBudgetMs: 60_000 } });
      expect(proven.optimal).toBe(true);
      // The tree is needed: the root's relaxation alone does not prove these (else the test would not reach a node).
      expect(proven.exactSearch!.nodes).toBeGreaterThan(1);
      const heuristic = planRoute(graph, options);
      const needed = full.solves();
      for (const solves of [1, 2, Math.floor(needed / 4), Math.floor(needed / 2), needed - 2]) {
        const counted = countedSolver();
        const rushed = planRoute(graph, { ...options, exact: { solver: counted.solver, timeBudgetMs: solves * 10 } });
        expect(counted.solves()).toBeLessThanOrEqual(solves);
        expect(rushed.optimal).toBe(false);
        expect(rushed.travelCost).toBeGreaterThanOrEqual(proven.travelCost - 1e-9);
        expect(rushed.travelCost).toBeLessThanOrEqual(heuristic.travelCost + 1e-9);
        expect(rushed.travelLowerBound).toBeLessThanOrEqual(proven.travelCost + 1e-9);
        expect(rushed.travelLowerBound).toBeGreaterThanOrEqual(heuristic.travelLowerBound - 1e-9);
        expect(rushed.gapPercent).toBeGreaterThan(0);
      }
    });
  }
});
