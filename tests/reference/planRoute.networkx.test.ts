import { execFileSync } from 'node:child_process';
import { fileURLToPath } from 'node:url';
import { describe, expect, it } from 'vitest';
import type { DesignInput } from '@shared/design/design.schema.ts';
import { designSchema } from '@shared/design/design.schema.ts';
import { buildPlanarGraph } from '@shared/graph/planarGraph.ts';
import type { Point } from '@shared/geometry/point.ts';
import { planRoute } from '@shared/route/planRoute.ts';
import { seededRandom as makeRandom } from '@shared/seededRandom.ts';

// Independent reference: Debian's python3-networkx 2.8 (exact Dijkstra + Van Rantwijk max_weight_matching turned
// into a min-cost perfect matching), run by tests/reference/networkx_route_oracle.py on the same planar graphs.
const ORACLE = fileURLToPath(new URL('./networkx_route_oracle.py', import.meta.url));

function randomDesign(seed: number): DesignInput {
  const rnd = makeRandom(seed);
  const pt = (): Point => [Math.round(rnd() * 1200) / 100, Math.round(rnd() * 1200) / 100];
  const polyline = (): Point[] => Array.from({ length: 2 + Math.floor(rnd() * 3) }, pt);
  const lines = Array.from({ length: 2 + Math.floor(rnd() * 7) }, polyline);
  const seams = Array.from({ length: Math.floor(rnd() * 4) }, () => {
    const vertical = rnd() < 0.5;
    const c = Math.round(rnd() * 12 * 4) / 4;
    return (vertical ? [[c, 0], [c, 12]] : [[0, c], [12, c]]) as Point[];
  });
  const ends = Math.floor(rnd() * 4);
  return {
    version: 1,
    units: 'in',
    width: 12,
    height: 12,
    seams,
    lines,
    edgeTravel: rnd() < 0.8,
    ...(ends === 1 || ends === 3 ? { start: [0, 0] as Point } : {}),
    ...(ends === 2 || ends === 3 ? { end: ends === 3 ? ([12, 12] as Point) : pt() } : {}),
  };
}

interface OracleGroup {
  pieces: number;
  exact: boolean;
  lowerBound: number;
}

const SEEDS = 300;

describe(`planRoute against networkx on ${SEEDS} seeded random designs`, () => {
  it('has the same passes and lower bound, and travel equal to the networkx optimum wherever the bound is exact', () => {
    const instances: unknown[] = [];
    const plans: ReturnType<typeof planRoute>[] = [];
    for (let seed = 1; seed <= SEEDS; seed++) {
      const design = designSchema.parse(randomDesign(seed));
      const built = buildPlanarGraph(design);
      if (!built.ok) throw new Error(`seed ${seed}: ${built.error.message}`);
      const graph = built.value;
      const plan = planRoute(graph, {
        edgeTravel: design.edgeTravel,
        ...(design.start ? { start: design.start } : {}),
        ...(design.end ? { end: design.end } : {}),
      });
      plans.push(plan);
      instances.push({
        n: graph.vertices.length,
        edges: graph.edges.map((e) => [e.u, e.v, e.length, e.kind, e.kind !== 'edge' || design.edgeTravel]),
        start: plan.startVertex ?? -1,
        end: plan.endVertex ?? -1,
      });
    }
    const out = execFileSync('/usr/bin/python3', [ORACLE], { input: JSON.stringify(instances), maxBuffer: 1 << 28 });
    const oracle = JSON.parse(out.toString()) as { passes: number; groups: OracleGroup[] }[];
    let exactCases = 0;
    oracle.forEach((ref, i) => {
      const plan = plans[i]!;
      expect(plan.passes, `seed ${i + 1}`).toBe(ref.passes);
      const bound = ref.groups.reduce((s, g) => s + g.lowerBound, 0);
      expect(Math.abs(plan.travelLowerBound - bound), `seed ${i + 1}`).toBeLessThanOrEqual(1e-9 * Math.max(1, bound));
      expect(plan.travelLength).toBeGreaterThanOrEqual(bound - 1e-9 * Math.max(1, bound));
      if (ref.groups.every((g) => g.exact)) {
        exactCases++;
        expect(Math.abs(plan.travelLength - bound), `seed ${i + 1}`).toBeLessThanOrEqual(1e-9 * Math.max(1, bound));
        expect(plan.optimal).toBe(true);
      }
    });
    expect(exactCases).toBeGreaterThanOrEqual(200);
    expect(plans.filter((p) => !p.optimal).length).toBeGreaterThan(0);
  });
});
