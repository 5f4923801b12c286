// The walkthrough says why each start and tie-off of a planned route is where it is (route/threadEnds.ts).
// Hiding knots on a seam or under the binding is common practice, no source.
import { describe, expect, it } from 'vitest';
import { designSchema } from '../design/design.schema.ts';
import { planDesign } from '../route/planDesign.ts';
import { buildWalkthrough } from './buildWalkthrough.ts';

describe('walkthrough: why a pass starts or stops where it does', () => {
  it('names the seam, the quilter’s own end, and says when no hidden place was possible', () => {
    // Two lines no travel joins (edge travel off): one from the open point (2,3) to the seam x = 6, one in the open.
    const design = designSchema.parse({
      version: 1,
      units: 'in',
      width: 12,
      height: 12,
      seams: [[[6, 0], [6, 12]]],
      lines: [[[2, 3], [6, 3]], [[8, 9], [10, 9]]],
      edgeTravel: false,
      end: [10, 9],
    });
    const planned = planDesign(design);
    if (!planned.ok) throw new Error(planned.error.message);
    const plan = planned.value;
    expect(plan.passes).toBe(2);
    const walk = buildWalkthrough(design, plan.route, plan.threadEnds);
    const ends = walk.steps.filter((s) => s.kind === 'start' || s.kind === 'tie-off');
    const why = (x: number, y: number) => ends.find((s) => s.from[0] === x && s.from[1] === y)?.hints.find((h) => h.kind === 'why-here')?.text;
    expect(why(6, 3)).toMatch(/on a seam/);
    expect(why(2, 3)).toMatch(/No route with as little travel/);
    expect(why(10, 9)).toMatch(/where you set the route to end/);
  });
});
