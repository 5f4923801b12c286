import { execFileSync } from 'node:child_process';
import path from 'node:path';
import { describe, expect, it } from 'vitest';
import { applyCommand } from '@shared/design/commands.ts';
import { designSchema, type Design } from '@shared/design/design.schema.ts';
import type { Polyline } from '@shared/geometry/point.ts';
import { findJoins } from '@shared/joins/findJoins.ts';
import { commandForJoin } from '@shared/joins/joinCommand.ts';
import { findTravelParts } from '@shared/joins/lineGroups.ts';
import { buildPiecedLayout, type PiecedLayoutId } from '@shared/layouts/piecedLayouts.ts';
import { generateMotif } from '@shared/motifs/motifs.ts';
import { planDesign } from '@shared/route/planDesign.ts';

/**
 * Reference check against independent implementations: Shapely's exact distances between travel parts and
 * networkx's Dijkstra over them (tests/reference/joins.networkx.py). The join helper's connection length for
 * every neighbouring pair of passes must equal the reference's shortest connection, and adding the join must
 * lower the planner's passes (route/planDesign) by the stops it promises. Designs keep their lines off the
 * block edge, so runs along the edge (used only with edge travel off) never enter.
 */
const ORACLE = path.join(import.meta.dirname, 'joins.networkx.py');

function separatePebbles(layout: PiecedLayoutId, patches: number[], edgeTravel: boolean, seed: number): Design {
  const { seams, patches: all } = buildPiecedLayout(layout, 12, 12);
  const lines: Polyline[] = [];
  for (const i of patches) {
    const made = generateMotif(all[i]!.polygon, { kind: 'pebbles', minRadius: 0.45, maxRadius: 0.8, gap: 0.15, seed, separate: true, chordError: 0.02 });
    if (!made.ok) throw new Error('pebbles refused');
    lines.push(...made.value.lines);
  }
  return designSchema.parse({ version: 1, units: 'in', width: 12, height: 12, seams, lines, edgeTravel });
}

const passes = (d: Design): number => {
  const plan = planDesign(d);
  if (!plan.ok) throw new Error(plan.error.message);
  return plan.value.passes;
};

describe('reference: join helper against Shapely distances and networkx shortest paths', () => {
  it.each([
    ['nine-patch', [0, 1, 2, 4], false, 3],
    ['nine-patch', [4], true, 5],
    ['square-in-a-square', [0], false, 7],
    ['four-patch', [0, 3], false, 11],
  ] as const)('%s, separate pebbles in patches %j, edge travel %s', (layout, patches, edgeTravel, seed) => {
    const d = separatePebbles(layout, [...patches], edgeTravel, seed);
    const parts = findTravelParts(d);
    const found = findJoins(d);
    if (!parts.ok || !found.ok) throw new Error('refused');
    const { groups, joins } = found.value;
    expect(groups.length).toBe(passes(d));
    expect(groups.length).toBeGreaterThan(1);
    expect(joins.length).toBeGreaterThanOrEqual(groups.length - 1);
    const input = JSON.stringify({ groups: parts.value.groups, parts: parts.value.parts.map((p) => ({ segments: p.segments.map((s) => [s.a, s.b]) })) });
    const reference = JSON.parse(execFileSync('/usr/bin/python3', [ORACLE], { input, maxBuffer: 1 << 26 }).toString()) as Record<string, number>;
    for (const j of joins) {
      expect(j.length).toBeCloseTo(reference[`${j.groups[0]},${j.groups[1]}`]!, 9);
      expect(j.stopsSaved).toBeGreaterThanOrEqual(1);
      expect(passes(applyCommand(d, commandForJoin(j)).design)).toBe(groups.length - j.stopsSaved);
    }
  }, 120_000);
});
