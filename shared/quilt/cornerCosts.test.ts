import { beforeAll, describe, expect, it } from 'vitest';
import { designSchema, type Design } from '../design/design.schema.ts';
import type { LpSolver } from '../route/exact/lpSolver.ts';
import { loadHighsSolver } from '../route/exact/highsSolver.ts';
import { archRowsDesign, patchFillDesign } from '../testing/multiPieceDesigns.ts';
import { placeCornerCosts, placedSize, placePoint } from './cornerMap.ts';
import { CornerCostCache, cornerCostKey } from './cornerCostCache.ts';
import { buildCornerCosts, costTableOf, designCornerCostsSchema, pairPlanOf, unitScale, type DesignCornerCosts } from './cornerCosts.ts';
import type { Orientation } from './quilt.schema.ts';
import { buildPlanarGraph } from '../graph/planarGraph.ts';
import { planRoute } from '../route/planRoute.ts';
import { err, ok } from '../result.ts';

let solver: LpSolver;
beforeAll(async () => {
  solver = await loadHighsSolver();
});

const oneLine = (edgeTravel: boolean): Design =>
  designSchema.parse({ version: 1, units: 'in', width: 12, height: 12, seams: [], lines: [[[0, 6], [12, 6]]], edgeTravel });

const table = (d: Design): DesignCornerCosts => {
  const r = buildCornerCosts(d, { solver });
  if (!r.ok) throw new Error(r.error.message);
  return r.value;
};

/** The design turned and mirrored as a placement would show it, so the planner sees the placed block itself. */
function placeDesign(d: Design, o: Orientation): Design {
  const move = (line: readonly (readonly [number, number])[]): [number, number][] => line.map((p) => [...placePoint(p, d.width, d.height, o)] as [number, number]);
  const size = placedSize(d.width, d.height, o);
  return { ...d, width: size.width, height: size.height, lines: d.lines.map(move), seams: d.seams.map(move) };
}

describe('buildCornerCosts', () => {
  it('worked by hand: one line across the middle of a 12 in block, edge travel on', () => {
    // top-left → top-right: 6 in down the left edge, stitch across, 6 in up the right edge = 12.
    // top-left → top-left: 6 down, stitch across, back by the shortest way (6 up + 12 along the top) = 24.
    // top-left → bottom-right: 6 down, stitch, 6 down the right edge = 12; top-left → bottom-left: 6 + 12 + 6 = 24.
    const t = costTableOf(table(oneLine(true)));
    expect(t[0]).toEqual([24, 12, 12, 24]);
    expect(t[1]).toEqual([12, 24, 24, 12]);
    expect(table(oneLine(true)).pairs.every((row) => row.every((p) => p.optimal && p.cornerSteps === 0 && p.stitchLength === 12 && p.passes === 1))).toBe(true);
  });

  it('with edge travel off a corner is off every travel line: the straight step to the route is added and reported', () => {
    const costs = table(oneLine(false));
    const tlToTr = costs.pairs[0]![1]!;
    // The route runs the line once; each corner is 6 in from the nearest line end.
    expect(tlToTr.cornerSteps).toBe(12);
    expect(tlToTr.cost).toBe(12);
    expect(costs.pairs[0]![0]!.cost).toBe(6 + 12 + 6); // back along the line (retrace) to the start, then the step out
  });

  it('a route may be sewn backwards: planning exit → entry directly gives the table entry for entry → exit (proven pairs)', () => {
    // The table plans only a ≤ b and reuses the plan for b → a; here the planner is asked for b → a itself.
    let compared = 0;
    for (const d of [patchFillDesign(3, 2, 2), archRowsDesign(4, 2, 3)]) {
      const costs = table(d);
      const corners = [[0, 0], [12, 0], [12, 12], [0, 12]] as const;
      for (let a = 0; a < 4; a++) {
        for (let b = a + 1; b < 4; b++) {
          const graph = buildPlanarGraph({ ...d, start: corners[a]!, end: corners[b]! });
          if (!graph.ok) throw new Error(graph.error.message);
          const back = planRoute(graph.value, { edgeTravel: d.edgeTravel, frame: { width: 12, height: 12, band: 0.125 }, start: corners[b]!, end: corners[a]!, exact: { solver, timeBudgetMs: 2000 } });
          if (!back.optimal || !costs.pairs[a]![b]!.optimal) continue;
          expect(back.travelCost).toBeCloseTo(costs.pairs[a]![b]!.cost, 9);
          expect(costs.pairs[b]![a]).toBe(costs.pairs[a]![b]);
          compared++;
        }
      }
    }
    expect(compared).toBeGreaterThanOrEqual(10);
  });

  it('planning the placed block itself gives the corner-mapped table: the corner map agrees with the planner', () => {
    const d = patchFillDesign(7, 2, 2);
    const own = table(d);
    let compared = 0;
    for (const o of [{ rotation: 90, mirror: false }, { rotation: 270, mirror: true }, { rotation: 180, mirror: true }] as const) {
      const placed = table(placeDesign(d, o));
      const mapped = placeCornerCosts(costTableOf(own), o);
      for (let e = 0; e < 4; e++) {
        for (let x = 0; x < 4; x++) {
          if (!placed.pairs[e]![x]!.optimal || !pairPlanOf(own, e as 0, x as 0, o).optimal) continue;
          expect(placed.pairs[e]![x]!.cost).toBeCloseTo(mapped[e]![x]!, 6);
          compared++;
        }
      }
    }
    expect(compared).toBeGreaterThanOrEqual(36);
  });

  it('reports progress after each of the 10 plans and refuses a design the planner refuses', () => {
    const seen: number[] = [];
    buildCornerCosts(oneLine(true), { onPlanned: (n) => seen.push(n) });
    expect(seen).toEqual(Array.from({ length: 10 }, (_, i) => i + 1));
    const empty = designSchema.parse({ version: 1, units: 'in', width: 12, height: 12, seams: [], lines: [] });
    const r = buildCornerCosts(empty);
    expect(r.ok || r.error.kind).toBe('empty-design');
  });
});

describe('CornerCostCache', () => {
  it('plans a design once for all orientations and scales centimetre designs into an inch quilt', () => {
    const cache = new CornerCostCache();
    let planned = 0;
    const compute = () => {
      planned++;
      return ok({ ...table(oneLine(true)), units: 'cm' as const });
    };
    const placed = (id: string, rev: string, o: Orientation) => {
      const r = cache.placedCosts(id, rev, o, 'in', compute);
      if (!r.ok) throw new Error('unexpected');
      return r.value;
    };
    const a = placed('d1', '3', { rotation: 0, mirror: false });
    const b = placed('d1', '3', { rotation: 90, mirror: true });
    expect(placed('d1', '3', { rotation: 90, mirror: true })).toBe(b);
    expect(planned).toBe(1);
    expect(a[0]![1]).toBeCloseTo(12 / 2.54, 12);
    expect(unitScale('in', 'cm')).toBe(2.54);
    placed('d1', '4', { rotation: 0, mirror: false });
    expect(planned).toBe(2);
    expect(cache.plannedDesigns).toBe(2);
  });

  it('takes a proven pair into a known table both ways round and rebuilds the placed tables', () => {
    const cache = new CornerCostCache();
    const heuristic = buildCornerCosts(oneLine(true));
    if (!heuristic.ok) throw new Error('unexpected');
    cache.design('d3', '1', () => heuristic);
    const before = cache.placedCosts('d3', '1', { rotation: 90, mirror: false }, 'in', () => heuristic);
    const better = { ...heuristic.value.pairs[0]![1]!, cost: 5, searched: true };
    cache.refinePair('d3', '1', 1, 0, better);
    const t = cache.design('d3', '1', () => heuristic);
    expect(t.ok && [t.value.pairs[0]![1], t.value.pairs[1]![0]]).toEqual([better, better]);
    const after = cache.placedCosts('d3', '1', { rotation: 90, mirror: false }, 'in', () => heuristic);
    expect(after).not.toBe(before);
    expect(after.ok && after.value[1]![2]).toBe(5); // design corners 0, 1 are placed corners 1, 2 after a quarter turn
    expect(() => cache.refinePair('nope', '1', 0, 1, better)).toThrow(/quilt\/cornerCostCache/);
  });

  it('does not remember a design the planner refused', () => {
    const cache = new CornerCostCache();
    const refused = cache.design('d2', '1', () => err({ kind: 'empty-design' as const }));
    expect(refused.ok).toBe(false);
    expect(cache.has('d2', '1')).toBe(false);
    expect(cornerCostKey('d1', '3', { rotation: 90, mirror: true })).toBe('d1@3/r90m');
  });
});

describe('designCornerCostsSchema', () => {
  it('accepts a built table after a JSON round trip and refuses a broken one', () => {
    const built = table(oneLine(true));
    const back = designCornerCostsSchema.safeParse(JSON.parse(JSON.stringify(built)));
    expect(back.success && back.data).toEqual(built);
    const lopsided = JSON.parse(JSON.stringify(built));
    lopsided.pairs[0][1].cost = 99;
    expect(designCornerCostsSchema.safeParse(lopsided).success).toBe(false);
    expect(designCornerCostsSchema.safeParse({ ...built, pairs: built.pairs.slice(0, 3) }).success).toBe(false);
  });
});
