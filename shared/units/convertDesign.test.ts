import { describe, expect, it } from 'vitest';
import { buildPiecedLayout } from '../layouts/piecedLayouts.ts';
import { designSchema } from '../design/design.schema.ts';
import { planDesign } from '../route/planDesign.ts';
import { convertDesign, convertStrokes } from './convertDesign.ts';

// Scaling a plane figure by k scales every length by k and keeps its graph (a similarity; Euclid's geometry).
// So the planner's counts must not change and its lengths must scale by exactly 2.54 (1 in = 2.54 cm by definition).
describe('convertDesign', () => {
  it('gives the same route counts and lengths × 2.54 when an inch design is redrawn in centimetres', () => {
    const layout = buildPiecedLayout('nine-patch', 12, 12);
    const design = designSchema.parse({ version: 1, units: 'in', width: 12, height: 12, seams: layout.seams, lines: [[[1, 1], [3, 3]], [[5, 1], [7, 3]]], thread: { battingSpacing: 4 } });
    const cm = convertDesign(design, 'cm');
    expect(designSchema.safeParse(cm).success).toBe(true);
    expect(cm.width).toBeCloseTo(30.48, 9);
    expect(cm.thread?.battingSpacing).toBeCloseTo(10.16, 9);
    const pa = planDesign(design);
    const pb = planDesign(cm);
    if (!pa.ok || !pb.ok) throw new Error('both designs plan');
    const a = pa.value;
    const b = pb.value;
    expect(b.passes).toBe(a.passes);
    expect(b.stops).toBe(a.stops);
    expect(b.stitchLength).toBeCloseTo(a.stitchLength * 2.54, 6);
    expect(b.travelLength).toBeCloseTo(a.travelLength * 2.54, 6);
    expect(convertDesign(cm, 'in').seams).toEqual(design.seams.map((l) => l.map(([x, y]) => [expect.closeTo(x, 9), expect.closeTo(y, 9)])));
  });

  it('redraws strokes and keeps their other fields', () => {
    const [s] = convertStrokes([{ kind: 'ditch' as const, pass: 1, points: [[0, 0], [1, 2]] as const }], 'in', 'cm');
    expect(s).toEqual({ kind: 'ditch', pass: 1, points: [[0, 0], [2.54, 5.08]] });
  });
});
