import { describe, expect, it } from 'vitest';
import type { Design } from '@shared/design/design.schema.ts';
import { buildCheckResult } from '@shared/route/routeAnswers.ts';
import { parseCheckAnswer } from './routeCheckView.ts';

// The check answer as the server builds it (the engine worker calls the same buildCheckResult), round-tripped
// through JSON as the browser receives it.
function answerFor(design: Design): unknown {
  const checked = buildCheckResult(design);
  if (!checked.ok) throw new Error('fixture design must check');
  return JSON.parse(JSON.stringify({ designVersion: 1, draft: true, ...checked.value }));
}

const twoSquares: Design = {
  version: 1, units: 'in', width: 12, height: 12, seams: [], edgeTravel: true,
  // Two separate squares: each closed loop has no odd point (Euler: every degree is 2), two pieces.
  lines: [[[1, 1], [3, 1], [3, 3], [1, 3], [1, 1]], [[6, 6], [9, 6], [9, 9], [6, 9], [6, 6]]],
};

describe('route check card model', () => {
  it('reads the engine’s answer: two closed loops have no odd points and two pieces', () => {
    const view = parseCheckAnswer(answerFor(twoSquares))!;
    expect(view).not.toBeNull();
    expect(view.planned.oddPoints).toBe(0);
    expect(view.planned.pieces).toBe(2);
    expect(view.planned.stitchLength).toBeCloseTo(8 + 12, 9);
    expect(view.passesWithoutTravel).toBe(2);
    expect(view.own).toBeNull();
    expect(view.gap).not.toBeNull();
  });

  it('reads an own route and warns about the lines it leaves out', () => {
    const withRoute: Design = { ...twoSquares, route: [twoSquares.lines[0]!] };
    const view = parseCheckAnswer(answerFor(withRoute))!;
    expect(view.own?.figures.passes).toBe(1);
    expect(view.own?.unstitchedCount).toBeGreaterThan(0);
    expect(view.warnings.some((w) => w.includes('not in your stitching order'))).toBe(true);
  });

  it('refuses an answer of another shape', () => {
    expect(parseCheckAnswer({ check: {} })).toBeNull();
  });
});
