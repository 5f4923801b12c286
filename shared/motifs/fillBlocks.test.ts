import { describe, expect, it } from 'vitest';
import { designSchema, type Design, type Units } from '../design/design.schema.ts';
import { checkGap } from '../gap/gapCheck.ts';
import { buildPiecedLayout, PIECED_LAYOUTS } from '../layouts/piecedLayouts.ts';
import { planDesign } from '../route/planDesign.ts';
import { fillDesign, patchesInReadingOrder } from './fillDesign.ts';
import { fillGapBound } from './gapBound.ts';
import { MOTIFS, motifParamsSchema, type MotifKind, type MotifParamsInput } from './motifs.ts';

/** The motif panel's starting values (src/components/editor/motifForm.ts), in inches; cm blocks × 2.54. */
const PANEL_IN: Record<MotifKind, MotifParamsInput> = {
  'straight-lines': { kind: 'straight-lines', spacing: 0.5, angle: 45 },
  crosshatch: { kind: 'crosshatch', spacing: 1, angle: 45, crossAngle: 90 },
  echo: { kind: 'echo', spacing: 0.5, maxCount: 20 },
  pebbles: { kind: 'pebbles', minRadius: 0.25, maxRadius: 0.6, gap: 0.05, seed: 1 },
  'ribbon-candy': { kind: 'ribbon-candy', pitch: 0.75, margin: 0.125 },
  arches: { kind: 'arches', archWidth: 1.5, rowSpacing: 1, angle: 0 },
};
const LENGTHS = new Set(['spacing', 'minRadius', 'maxRadius', 'gap', 'pitch', 'margin', 'archWidth', 'rowSpacing']);

function panelParams(kind: MotifKind, units: Units) {
  const k = units === 'cm' ? 2.54 : 1;
  const raw = Object.fromEntries(Object.entries(PANEL_IN[kind]).map(([key, v]) => [key, LENGTHS.has(key) ? (v as number) * k : v]));
  return motifParamsSchema.parse(raw);
}

function pieced(id: (typeof PIECED_LAYOUTS)[number]['id'], units: Units): Design {
  const size = units === 'in' ? 12 : 30;
  const { seams } = buildPiecedLayout(id, size, size);
  // Seams are travelled in the ditch (design.seams), edge travel on, no start or end: both are free.
  return designSchema.parse({ version: 1, units, width: size, height: size, seams, lines: [], edgeTravel: true });
}

describe('whole blocks: every pieced layout, every motif in every patch, plans to one pass', () => {
  for (const units of ['in', 'cm'] as const) {
    for (const kind of MOTIFS.map((m) => m.kind)) {
      it(`${kind}, ${units === 'in' ? '12 in' : '30 cm'} blocks`, () => {
        for (const { id } of PIECED_LAYOUTS) {
          const design = pieced(id, units);
          const params = panelParams(kind, units);
          const filled = fillDesign(design, { fills: [{ patch: 'all', motif: params }] });
          if (!filled.ok) throw new Error(`${id}: ${filled.error.message}`);
          const plan = planDesign(filled.value);
          if (!plan.ok) throw new Error(`${id}: ${plan.error.message}`);
          expect({ id, passes: plan.value.passes }).toEqual({ id, passes: 1 });
          // Gap check against the widest gap the motif promises for these sizes (gapBound.ts): never over.
          const bound = Math.max(...patchesInReadingOrder(design).map((p) => fillGapBound(p.polygon, params)));
          // (1 + 1e-9): lines exactly a spacing apart may land a rounding error further apart.
          const gap = checkGap({ ...filled.value, thread: { battingSpacing: bound * (1 + 1e-9) } });
          if (!gap.ok) throw new Error(gap.error.message);
          expect({ id, status: gap.value.status, ratio: gap.value.widestGap / bound }).not.toMatchObject({ status: 'over' });
        }
      }, 120_000);
    }
  }
});
