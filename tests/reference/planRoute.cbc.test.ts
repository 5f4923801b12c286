import { spawn } from 'node:child_process';
import { fileURLToPath } from 'node:url';
import { beforeAll, describe, expect, it } from 'vitest';
import { multiPieceDesigns } from '@shared/testing/multiPieceDesigns.ts';
import type { Design } from '@shared/design/design.schema.ts';
import { buildPlanarGraph } from '@shared/graph/planarGraph.ts';
import type { PlanarGraph } from '@shared/graph/planarGraph.types.ts';
import { loadHighsSolver } from '@shared/route/exact/highsSolver.ts';
import type { LpSolver } from '@shared/route/exact/lpSolver.ts';
import { planRoute, type RoutePlan } from '@shared/route/planRoute.ts';

// Independent reference: an exact rural postman model written straight on the planar graph (no reduction) and
// solved by Debian's coinor-cbc through python3-pulp (tests/reference/rpp_cbc_oracle.py). The engine's model is the
// reduction of Christofides, Campos, Corberán & Mota (1981) and the branch-and-cut of Ghiani & Laporte (2000) on
// HiGHS; the two must agree on the least travel.
const ORACLE = fileURLToPath(new URL('./rpp_cbc_oracle.py', import.meta.url));
const DESIGNS = 36;
const REL = 1e-6;

let solver: LpSolver;
beforeAll(async () => {
  solver = await loadHighsSolver();
});

interface Case {
  readonly name: string;
  readonly graph: PlanarGraph;
  readonly design: Design;
  readonly extraStops: number;
}

function planOf(c: Case, exact: boolean): RoutePlan {
  return planRoute(c.graph, {
    edgeTravel: c.design.edgeTravel,
    extraStops: c.extraStops,
    ...(c.design.start ? { start: c.design.start } : {}),
    ...(c.design.end ? { end: c.design.end } : {}),
    ...(exact ? { exact: { solver, timeBudgetMs: 60_000 } } : {}),
  });
}

function instanceOf(c: Case, plan: RoutePlan): unknown {
  return {
    n: c.graph.vertices.length,
    edges: c.graph.edges.map((e) => [e.u, e.v, e.length, e.kind, e.kind !== 'edge' || c.design.edgeTravel]),
    start: plan.startVertex ?? -1,
    end: plan.endVertex ?? -1,
    extraStops: c.extraStops,
  };
}

/** Runs the oracle without blocking the test worker (a blocked worker misses vitest's heartbeats on a busy machine). */
function runOracle(instances: unknown[]): Promise<{ travel: number; groups: { pieces: number }[] }[]> {
  return new Promise((resolve, reject) => {
    const child = spawn('/usr/bin/python3', [ORACLE]);
    let out = '';
    let err = '';
    child.stdout.on('data', (d: Buffer) => (out += d.toString()));
    child.stderr.on('data', (d: Buffer) => (err += d.toString()));
    child.on('error', reject);
    child.on('close', (status) => (status === 0 ? resolve(JSON.parse(out)) : reject(new Error(`oracle exited ${status}: ${err}`))));
    child.stdin.end(JSON.stringify(instances));
  });
}

/** Plans every case, letting the event loop breathe between designs. */
async function planAll(cases: readonly Case[], exact: boolean): Promise<RoutePlan[]> {
  const out: RoutePlan[] = [];
  for (const c of cases) {
    out.push(planOf(c, exact));
    await new Promise((resolve) => setImmediate(resolve));
  }
  return out;
}
const TIMEOUT = 900_000;

function casesOf(extraStops: number, count: number): Case[] {
  return multiPieceDesigns(count).map(({ name, design }) => {
    const built = buildPlanarGraph(design);
    if (!built.ok) throw new Error(`${name}: ${built.error.message}`);
    return { name, graph: built.value, design, extraStops };
  });
}

describe(`exact planner against CBC on ${DESIGNS} multi-piece designs (patch fills, arch rows, square in a square)`, () => {
  it('proves the least travel, equal to CBC within 1e-6 relative, never above the heuristic, never below its bound', async () => {
    const cases = casesOf(0, DESIGNS);
    const plans = await planAll(cases, true);
    const heuristic = await planAll(cases, false);
    const oracle = await runOracle(cases.map((c, i) => instanceOf(c, plans[i]!)));
    let multiPiece = 0;
    cases.forEach((c, i) => {
      const plan = plans[i]!;
      const ref = oracle[i]!;
      if (ref.groups.some((g) => g.pieces > 1)) multiPiece++;
      expect(plan.optimal, c.name).toBe(true);
      expect(Math.abs(plan.travelCost - ref.travel), `${c.name}: engine ${plan.travelCost}, CBC ${ref.travel}`).toBeLessThanOrEqual(REL * Math.max(1, ref.travel));
      expect(plan.travelCost, c.name).toBeLessThanOrEqual(heuristic[i]!.travelCost + 1e-9);
      expect(plan.travelLowerBound, c.name).toBeLessThanOrEqual(plan.travelCost + 1e-9);
    });
    expect(multiPiece).toBeGreaterThanOrEqual(30);
  }, TIMEOUT);

  it('with 1 and 2 extra stops: the same least travel as CBC with the dummy vertex two degrees higher per stop', async () => {
    const cases = [...casesOf(1, 10), ...casesOf(2, 10)];
    const plans = await planAll(cases, true);
    const oracle = await runOracle(cases.map((c, i) => instanceOf(c, plans[i]!)));
    cases.forEach((c, i) => {
      const plan = plans[i]!;
      expect(plan.optimal, c.name).toBe(true);
      expect(plan.stops, c.name).toBeLessThanOrEqual(c.extraStops);
      expect(Math.abs(plan.travelCost - oracle[i]!.travel), `${c.name} +${c.extraStops}: engine ${plan.travelCost}, CBC ${oracle[i]!.travel}`).toBeLessThanOrEqual(
        REL * Math.max(1, oracle[i]!.travel),
      );
    });
  }, TIMEOUT);
});
