// Hidden thread ends: where a route must start or stop, prefer a seam or the block edge (the binding covers it) to
// the open middle of a patch. The preference is common practice, no source; the lengths below are worked by hand.
import { beforeAll, describe, expect, it } from 'vitest';
import type { LpSolver } from './exact/lpSolver.ts';
import { loadHighsSolver } from './exact/highsSolver.ts';
import { planRoute, type PlanOptions } from './planRoute.ts';
import { graphFromSegments } from './testGraphs.ts';
import { findEndPlaces } from './threadEnds.ts';

let solver: LpSolver;
beforeAll(async () => {
  solver = await loadHighsSolver();
});

const frame = { width: 12, height: 12, band: 0.125 };

/**
 * A "T" in a 12 in block: a line from the left edge (0,6) to (x,6) in the open, and a line from (4,6) up to the top
 * edge (4,12). Four odd points: (0,6) and (4,12) at the edge, (x,6) in the open, and the junction (4,6). Free ends
 * take two of them; the other two are paired by retracing. Either retrace (4,6)–(x,6), x − 4 in, and both ends sit
 * at the edge; or retrace (4,6)–(0,6), 4 in, and one end sits in the open at (x,6).
 */
const tee = (x: number) =>
  graphFromSegments([
    [[0, 6], [4, 6], 'quilting'],
    [[4, 6], [x, 6], 'quilting'],
    [[4, 6], [4, 12], 'quilting'],
  ]);

describe('hidden thread ends', () => {
  it('places vertices: edge within the binding band, seam on a seam line, open otherwise', () => {
    const graph = graphFromSegments([
      [[0, 6], [6, 6], 'quilting'],
      [[6, 0], [6, 6], 'seam'],
      [[6, 6], [6, 12], 'seam'],
      [[6, 6], [9, 9], 'quilting'],
    ]);
    const places = findEndPlaces(graph, frame);
    const at = (x: number, y: number) => places[graph.vertices.findIndex((p) => p[0] === x && p[1] === y)];
    expect([at(0, 6), at(6, 6), at(9, 9), at(6, 0)]).toEqual(['edge', 'seam', 'open', 'edge']);
  });

  for (const [label, exact] of [
    ['matching planner', false],
    ['branch-and-cut', true],
  ] as const) {
    const withSolver = (o: PlanOptions): PlanOptions => (exact ? { ...o, exact: { solver, timeBudgetMs: 20_000, always: true } } : o);
    it(`${label}: at equal travel (x = 8: 4 in either way) both ends go to the edge`, () => {
      const plan = planRoute(tee(8), withSolver({ frame }));
      expect(plan.travelLength).toBeCloseTo(4, 9);
      expect(plan.threadEnds.map((e) => e.place)).toEqual(['edge', 'edge']);
      expect(plan.threadEnds.every((e) => e.reason === 'hidden')).toBe(true);
    });

    it(`${label}: at x = 9 hiding both ends costs 1 in more; the allowance decides`, () => {
      const least = planRoute(tee(9), withSolver({ frame }));
      expect(least.travelLength).toBeCloseTo(4, 9);
      expect(least.threadEnds.map((e) => e.place).sort()).toEqual(['edge', 'open']);
      expect(least.threadEnds.find((e) => e.place === 'open')).toMatchObject({ point: [9, 6], reason: 'no-hidden-place' });
      const small = planRoute(tee(9), withSolver({ frame, hiddenEndAllowance: 0.5 }));
      expect(small.travelLength).toBeCloseTo(4, 9);
      const generous = planRoute(tee(9), withSolver({ frame, hiddenEndAllowance: 1.5 }));
      expect(generous.travelLength).toBeCloseTo(5, 9);
      expect(generous.threadEnds.map((e) => e.place)).toEqual(['edge', 'edge']);
    });
  }
});
