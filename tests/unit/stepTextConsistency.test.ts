// Every step of the walkthroughs of the demo guild's drawings, the walkthrough browser fixture, the shared
// multi-piece fixtures and random straight lines in every pieced layout: a step's text never contradicts its own
// tip or its own line (shared/walkthrough/stepConsistency.ts). The direction each text claims is checked against
// the line's points (route/strokeDirection), not against other text.
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { designSchema, type Design } from '@shared/design/design.schema.ts';
import type { Point } from '@shared/geometry/point.ts';
import { buildPiecedLayout, PIECED_LAYOUTS } from '@shared/layouts/piecedLayouts.ts';
import { planDesign } from '@shared/route/planDesign.ts';
import { multiPieceDesigns } from '@shared/testing/multiPieceDesigns.ts';
import { buildWalkthrough } from '@shared/walkthrough/buildWalkthrough.ts';
import { findStepContradictions, findWalkthroughContradictions } from '@shared/walkthrough/stepConsistency.ts';
import { marigoldDrawings, saoirseDrawings, tobiasDrawings } from '../../scripts/seed/guildDrawings.ts';
import { ribbonCandyBlock } from '../browser/walkthroughFixtures.ts';

function contradictionsOf(design: Design): string[] {
  const plan = planDesign(design);
  if (!plan.ok) throw new Error(`tests/unit/stepTextConsistency: the planner refused a fixture (${plan.error.kind})`);
  return findWalkthroughContradictions(buildWalkthrough(design, plan.value.route).steps);
}

describe('step text agrees with its tip and its line', () => {
  const fixtures: { name: string; design: Design }[] = [
    ...[...tobiasDrawings(), ...saoirseDrawings(), marigoldDrawings().ditch, marigoldDrawings().echoes].map((d) => ({ name: d.title, design: d.design })),
    { name: 'walkthrough browser fixture', design: designSchema.parse(ribbonCandyBlock()) },
    ...multiPieceDesigns(6),
  ];
  it.each(fixtures.map((f) => [f.name, f.design] as const))('%s', (_name, design) => {
    expect(contradictionsOf(design)).toEqual([]);
  });

  it('holds for random straight lines in every pieced layout (property)', () => {
    const lineArb = fc.tuple(fc.integer({ min: 0, max: 48 }), fc.integer({ min: 0, max: 48 }), fc.integer({ min: 0, max: 48 }), fc.integer({ min: 0, max: 48 }))
      .filter(([a, b, c, d]) => a !== c || b !== d)
      .map(([a, b, c, d]): Point[] => [[a / 4, b / 4], [c / 4, d / 4]]);
    fc.assert(
      fc.property(fc.constantFrom(...PIECED_LAYOUTS.map((l) => l.id)), fc.array(lineArb, { minLength: 1, maxLength: 5 }), (layout, lines) => {
        const design = designSchema.parse({ version: 1, units: 'in', width: 12, height: 12, seams: buildPiecedLayout(layout, 12, 12).seams, lines });
        const plan = planDesign(design);
        if (!plan.ok) return;
        expect(findWalkthroughContradictions(buildWalkthrough(design, plan.value.route).steps)).toEqual([]);
      }),
      { numRuns: 80 },
    );
  });

  it('catches the contradiction the issue found: "away from you" with a tip to turn the line toward you', () => {
    const design = designSchema.parse({ version: 1, units: 'in', width: 12, height: 12, seams: [], lines: [[[6, 9], [6, 3]]] });
    const step = buildWalkthrough(design, [{ pass: 1, kind: 'stitch', points: [[6, 9], [6, 3]] }]).steps[1]!;
    expect(findStepContradictions(step)).toEqual([]);
    const seatWords = { ...step, instruction: step.instruction.replace('toward the top edge', 'away from you') };
    expect(findStepContradictions(seatWords).length).toBeGreaterThan(0);
    const wrongTip = { ...step, hints: step.hints.map((h) => ({ ...h, text: h.text.replace('half turn so its top', 'quarter turn so its left') })) };
    expect(findStepContradictions(wrongTip).length).toBeGreaterThan(0);
  });
});
