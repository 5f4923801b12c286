// The planning worker's run against the quilt core's own one-at-a-time planner (shared/quilt/quiltRoute.ts), and the
// two tricks the persisted cache rests on, each checked against the planner run directly on the placed block:
// - symmetry: a route sewn backwards is a route (pair b → a costs what a → b costs; Euler, a trail read in reverse),
//   so a design needs 10 plans, not 16;
// - relabelling: turning or mirroring a block keeps every length, so the 8 orientations come from the design's one
//   stored table by renaming corners (cornerMap.ts), never by planning again.
// Pairs are compared where the exact search proved both answers least (HiGHS; a heuristic tie may differ).
import { beforeAll, describe, expect, it } from 'vitest';
import type { Design } from '@shared/design/design.schema.ts';
import { loadHighsSolver } from '@shared/route/exact/highsSolver.ts';
import type { LpSolver } from '@shared/route/exact/lpSolver.ts';
import { CornerCostCache } from '@shared/quilt/cornerCostCache.ts';
import { placeCornerCosts, placedSize, placePoint, type Corner } from '@shared/quilt/cornerMap.ts';
import { buildCornerCosts, costTableOf, designCornerCostsSchema, planCornerPair, type DesignCornerCosts } from '@shared/quilt/cornerCosts.ts';
import type { Orientation, Quilt } from '@shared/quilt/quilt.schema.ts';
import { planQuiltRoute } from '@shared/quilt/quiltRoute.ts';
import { makeQuilt } from '@shared/quilt/testQuilts.ts';
import { archRowsDesign, patchFillDesign, squareInSquareDesign } from '@shared/testing/multiPieceDesigns.ts';
import { planFromStoredTables, runQuiltPlan, type CornerCostStore, type PairRunner, type RunDesign } from './quiltPlanRun.ts';

let solver: LpSolver;
beforeAll(async () => {
  solver = await loadHighsSolver();
});
const SETTINGS = { timeBudgetMs: 2_000, extraStops: 0, hiddenEndAllowance: 0 };
const ORIENTATIONS: Orientation[] = [0, 90, 180, 270].flatMap((rotation) => [false, true].map((mirror) => ({ rotation: rotation as Orientation['rotation'], mirror })));

/** A Map standing in for PostgreSQL, with a JSON round trip each way as the jsonb column does. */
function memoryStore(): CornerCostStore & { rows: Map<string, string>; saves: number } {
  const rows = new Map<string, string>();
  const store = {
    rows,
    saves: 0,
    load: async (ds: readonly { id: string; version: number }[]) =>
      new Map(ds.flatMap((d) => (rows.has(`${d.id}@${d.version}`) ? [[d.id, designCornerCostsSchema.parse(JSON.parse(rows.get(`${d.id}@${d.version}`)!))] as const] : []))),
    save: async (id: string, version: number, t: DesignCornerCosts) => {
      store.saves++;
      rows.set(`${id}@${version}`, JSON.stringify(t));
    },
  };
  return store;
}

/** Runs pairs in this thread, counting them (the worker process sends them to engine threads instead). */
function countingRunner(designs: Map<string, Design>): PairRunner & { calls: { exact: boolean }[] } {
  const calls: { exact: boolean }[] = [];
  const run = (async (text: string, a: Corner, b: Corner, exact: boolean) => {
    calls.push({ exact });
    return planCornerPair(designs.get(text)!, a, b, { settings: SETTINGS, ...(exact ? { solver } : {}) });
  }) as PairRunner & { calls: { exact: boolean }[] };
  run.calls = calls;
  return run;
}

/** The design turned and mirrored as a placement shows it, so the planner sees the placed block itself. */
function placeDesign(d: Design, o: Orientation): Design {
  const move = (line: readonly (readonly [number, number])[]): [number, number][] => line.map((p) => [...placePoint(p, d.width, d.height, o)] as [number, number]);
  const size = placedSize(d.width, d.height, o);
  return { ...d, width: size.width, height: size.height, lines: d.lines.map(move), seams: d.seams.map(move) };
}

function quiltOf(designs: readonly string[], rows: number, columns: number, turn: (i: number) => Orientation): Quilt {
  const base = makeQuilt({ rows, columns, sashing: 1 });
  return { ...base, placements: base.placements.map((row, r) => row.map((_, c) => ({ designId: designs[(r * columns + c) % designs.length]!, ...turn(r * columns + c) }))) };
}

describe('runQuiltPlan', () => {
  const drawings = new Map<string, Design>([
    ['patch', patchFillDesign(3, 2, 2)],
    ['arches', archRowsDesign(4, 2, 3)],
    ['square', squareInSquareDesign(5, 2)],
  ]);
  // The pair runner is handed the design text; here the "text" is the design's key in `drawings`.
  const runDesigns: RunDesign[] = [...drawings.entries()].map(([id, d], i) => ({ id, version: i + 1, shape: d, designText: id }));
  const quilt = quiltOf([...drawings.keys()], 2, 3, (i) => ORIENTATIONS[(i * 3) % 8]!);

  it('gives the total, bound and corners of planQuiltRoute; plans 10 pairs per design; a second run plans nothing', async () => {
    const expected = planQuiltRoute(quilt, new Map(runDesigns.map((d) => [d.id, { design: drawings.get(d.id)!, revision: `${d.id}@${d.version}` }])), new CornerCostCache(), { solver, settings: SETTINGS });
    if (!expected.ok) throw new Error(expected.error.message);
    const store = memoryStore();
    const runPair = countingRunner(drawings);
    const progress: [number, number][] = [];
    const first = await runQuiltPlan(quilt, runDesigns, { store, runPair, prove: true, onProgress: (d, t) => progress.push([d, t]) });
    if (!first.ok) throw new Error(first.error.message);
    expect(first.value.route.chain.total).toBeCloseTo(expected.value.chain.total, 9);
    expect(first.value.route.lowerBound).toBeCloseTo(expected.value.lowerBound, 9);
    expect(first.value.route.chain.steps.map((s) => [s.entry, s.exit])).toEqual(expected.value.chain.steps.map((s) => [s.entry, s.exit]));
    // 3 designs × 10 heuristic plans, then only the pairs the chain needed proved.
    expect(runPair.calls.filter((c) => !c.exact)).toHaveLength(30);
    expect(first.value.stats).toMatchObject({ heuristicPlans: 30, cachedDesigns: 0 });
    expect(runPair.calls.filter((c) => c.exact)).toHaveLength(first.value.stats.provedPlans);
    // Progress only grows and ends at done = total.
    const last = progress.at(-1)!;
    expect(last[0]).toBe(last[1]);
    expect(last[1]).toBe(30 + first.value.stats.provedPlans);
    expect(progress.every(([d, t], i) => d <= t && (i === 0 || d >= progress[i - 1]![0]))).toBe(true);

    const again = countingRunner(drawings);
    const second = await runQuiltPlan(quilt, runDesigns, { store, runPair: again, prove: true });
    expect(again.calls).toHaveLength(0);
    expect(second.ok && second.value.route.chain.total).toBeCloseTo(first.value.route.chain.total, 12);
    expect(second.ok && second.value.stats.cachedDesigns).toBe(3);

    // The request thread's cached path gives the same plan from the stored tables.
    const tables = await store.load(runDesigns);
    const cached = planFromStoredTables(quilt, runDesigns, tables, true);
    expect(cached.ok && cached.value?.chain.total).toBeCloseTo(first.value.route.chain.total, 12);
    // A design version not stored yet: no cached plan.
    const bumped = runDesigns.map((d, i) => (i === 0 ? { ...d, version: d.version + 1 } : d));
    const newer = planFromStoredTables(quilt, bumped, await store.load(bumped), true);
    expect(newer.ok && newer.value).toBeNull();
  }, 180_000);

  it('with no time left to prove, answers the heuristic chain with its lower bound and proves nothing', async () => {
    const runPair = countingRunner(drawings);
    const cut = await runQuiltPlan(quilt, runDesigns, { store: memoryStore(), runPair, prove: true, proveWithinMs: 0 });
    if (!cut.ok) throw new Error(cut.error.message);
    expect(runPair.calls.filter((c) => c.exact)).toHaveLength(0);
    expect(cut.value.stats.provedPlans).toBe(0);
    // The bound is a bound: no choice of corners beats it, so the heuristic chain's total is at least it.
    expect(cut.value.route.lowerBound).toBeLessThanOrEqual(cut.value.route.chain.total + 1e-9);
    const full = await runQuiltPlan(quilt, runDesigns, { store: memoryStore(), runPair: countingRunner(drawings), prove: true });
    if (!full.ok) throw new Error(full.error.message);
    expect(cut.value.route.lowerBound).toBeLessThanOrEqual(full.value.route.chain.total + 1e-9);
    expect(cut.value.stats.proofCut).toBe(full.value.stats.provedPlans > 0);
  });

  it('names the cell of a design the planner refuses, and stores nothing for it', async () => {
    const empty: Design = { version: 1, units: 'in', width: 12, height: 12, seams: [], lines: [], edgeTravel: true };
    const store = memoryStore();
    const ds = new Map([...drawings, ['empty', empty]]);
    const q = quiltOf(['patch', 'empty'], 1, 2, () => ({ rotation: 0, mirror: false }));
    const r = await runQuiltPlan(q, [runDesigns[0]!, { id: 'empty', version: 1, shape: empty, designText: 'empty' }], { store, runPair: countingRunner(ds), prove: false });
    expect(r.ok || [r.error.kind, 'cell' in r.error && r.error.cell]).toEqual(['design', { row: 0, column: 1 }]);
    expect([...store.rows.keys()]).toEqual(['patch@1']);
  });
});

describe('the stored table serves every orientation and both directions (against planning the placed block)', () => {
  it.each([
    ['patch fills', patchFillDesign(7, 2, 2)],
    ['arch rows', archRowsDesign(11, 2, 3)],
  ])('%s: 8 orientations × 16 pairs from one table of 10 plans', async (_, design) => {
    const planned: number[] = [];
    const own = buildCornerCosts(design, { solver, settings: SETTINGS, onPlanned: (n) => planned.push(n) });
    if (!own.ok) throw new Error(own.error.message);
    expect(planned.at(-1)).toBe(10);
    // Through JSON and the schema, as the table comes back from PostgreSQL.
    const stored = designCornerCostsSchema.parse(JSON.parse(JSON.stringify(own.value)));
    let compared = 0;
    for (const o of ORIENTATIONS) {
      const placed = placeDesign(design, o);
      const mapped = placeCornerCosts(costTableOf(stored), o);
      for (let e = 0 as Corner; e < 4; e++) {
        for (let x = 0 as Corner; x < 4; x++) {
          // Each of the 16 placed pairs, both directions, planned on the turned or mirrored block itself.
          const direct = planCornerPair(placed, e, x, { solver, settings: SETTINGS });
          if (!direct.ok) throw new Error(direct.error.message);
          const pair = stored.pairs[designCornerOf(e, o)]![designCornerOf(x, o)]!;
          if (!direct.value.optimal || !pair.optimal) continue;
          expect(direct.value.cost).toBeCloseTo(mapped[e]![x]!, 6);
          compared++;
        }
      }
    }
    // Most pairs of these small blocks prove within the budget; the check must have compared nearly all 128.
    expect(compared).toBeGreaterThanOrEqual(100);
  });
});

/** The design corner that lands on a placed corner, written out independently of cornerMap.ts: undo the turn, then the mirror. */
function designCornerOf(placed: Corner, o: Orientation): Corner {
  const unturned = (((placed - o.rotation / 90) % 4) + 4) % 4;
  return (o.mirror ? (((1 - unturned) % 4) + 4) % 4 : unturned) as Corner;
}
