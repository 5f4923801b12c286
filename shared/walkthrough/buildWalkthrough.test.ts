import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { designSchema, type Design, type Units } from '../design/design.schema.ts';
import type { Point, Polyline } from '../geometry/point.ts';
import { polylineLength } from '../geometry/polyline.ts';
import { flattenArc } from '../design/flatten.ts';
import { buildPiecedLayout, PIECED_LAYOUTS } from '../layouts/piecedLayouts.ts';
import { planDesign } from '../route/planDesign.ts';
import type { StrokeKind } from '../contract/strokes.ts';
import { buildWalkthrough } from './buildWalkthrough.ts';
import type { RouteStrokeInput, Walkthrough } from './walkthrough.types.ts';

const design = (seams: readonly Polyline[], lines: readonly Polyline[], units: Units = 'in', size = 12): Design =>
  designSchema.parse({ version: 1, units, width: size, height: size, seams, lines });

const ninePatch = buildPiecedLayout('nine-patch', 12, 12).seams;

/** The invariants every walkthrough keeps, whatever the route. */
function expectCoversRoute(w: Walkthrough, route: readonly RouteStrokeInput[]): void {
  const seen = w.steps.flatMap((s) => s.strokes);
  expect(seen).toEqual(route.map((_, i) => i)); // every stroke once, in order
  w.steps.forEach((s, i) => {
    expect(s.index).toBe(i);
    expect(s.counter).toBe(`Step ${i + 1} of ${w.steps.length}`);
    for (const k of s.strokes) expect(route[k]!.pass).toBe(route[s.strokes[0]!]!.pass);
    if (s.kind === 'stitch') for (const k of s.strokes) expect(route[k]!.kind).toBe('stitch');
    if (s.kind === 'travel') for (const k of s.strokes) expect(route[k]!.kind).not.toBe('stitch');
    if (s.kind === 'start' || s.kind === 'tie-off') expect(s.strokes).toEqual([]);
    else expect(s.strokes.length).toBeGreaterThan(0);
    expect(s.instruction.length).toBeGreaterThan(10);
  });
  const passRuns = route.filter((r, i) => i === 0 || route[i - 1]!.pass !== r.pass).length;
  expect(w.passes).toBe(passRuns);
  expect(w.steps.filter((s) => s.kind === 'start')).toHaveLength(passRuns);
  expect(w.steps.filter((s) => s.kind === 'tie-off')).toHaveLength(passRuns);
  if (route.length > 0) {
    expect(w.steps[0]!.kind).toBe('start');
    expect(w.steps[w.steps.length - 1]!.kind).toBe('tie-off');
  }
  const stepLength = w.steps.reduce((sum, s) => sum + s.length, 0);
  const routeLength = route.reduce((sum, r) => sum + polylineLength(r.points), 0);
  expect(stepLength).toBeCloseTo(routeLength, 9);
}

/** Random routes: passes of continuous strokes (each starts where the last ended) of random kinds. */
const routeArb = fc
  .array(
    fc.record({
      start: fc.tuple(fc.double({ min: 0, max: 12, noNaN: true }), fc.double({ min: 0, max: 12, noNaN: true })),
      strokes: fc.array(
        fc.record({
          kind: fc.constantFrom<StrokeKind>('stitch', 'stitch', 'retrace', 'ditch', 'edge'),
          steps: fc.array(fc.tuple(fc.double({ min: 0, max: 12, noNaN: true }), fc.double({ min: 0, max: 12, noNaN: true })), { minLength: 1, maxLength: 4 }),
        }),
        { minLength: 1, maxLength: 8 },
      ),
    }),
    { minLength: 0, maxLength: 4 },
  )
  .map((passes) => {
    const route: RouteStrokeInput[] = [];
    passes.forEach((p, passIndex) => {
      let at: Point = p.start;
      for (const s of p.strokes) {
        const points: Point[] = [at, ...s.steps];
        route.push({ pass: passIndex + 1, kind: s.kind, points });
        at = points[points.length - 1]!;
      }
    });
    return route;
  });

describe('buildWalkthrough: steps cover the route', () => {
  it('puts every stroke of a random route in exactly one step, in order (property)', () => {
    const layouts = PIECED_LAYOUTS.map((l) => buildPiecedLayout(l.id, 12, 12).seams);
    fc.assert(
      fc.property(routeArb, fc.integer({ min: 0, max: layouts.length - 1 }), (route, li) => {
        const d = design(layouts[li]!, [[[1, 1], [2, 2]]]);
        expectCoversRoute(buildWalkthrough(d, route), route);
      }),
      { numRuns: 150 },
    );
  });

  it('covers planned routes of designs with motif-like lines in a nine-patch (property)', () => {
    const lineArb = fc.array(fc.tuple(fc.integer({ min: 0, max: 48 }), fc.integer({ min: 0, max: 48 })), { minLength: 2, maxLength: 5 })
      .filter((pts) => new Set(pts.map(([x, y]) => `${x},${y}`)).size >= 2)
      .map((pts) => pts.map(([x, y]) => [x / 4, y / 4] as Point));
    fc.assert(
      fc.property(fc.array(lineArb, { minLength: 1, maxLength: 6 }), (lines) => {
        const d = design(ninePatch, lines);
        const plan = planDesign(d);
        if (!plan.ok) return;
        const w = buildWalkthrough(d, plan.value.route);
        expectCoversRoute(w, plan.value.route);
        expect(w.passes).toBe(plan.value.passes);
      }),
      { numRuns: 60 },
    );
  });

  it('gives no steps for an empty route', () => {
    expect(buildWalkthrough(design(ninePatch, [[[1, 1], [2, 2]]]), []).steps).toEqual([]);
  });

  it('refuses a stroke with one point (a caller bug)', () => {
    expect(() => buildWalkthrough(design([], [[[1, 1], [2, 2]]]), [{ pass: 1, kind: 'stitch', points: [[1, 1]] }])).toThrow(/walkthrough\/buildWalkthrough/);
  });
});

describe('buildWalkthrough: step text for known strokes (analytic)', () => {
  const one = (points: Polyline, units: Units = 'in') => {
    const d = design(ninePatch, [points], units);
    return buildWalkthrough(d, [{ pass: 1, kind: 'stitch', points }]).steps;
  };

  // y grows toward the quilter (design schema), so a line from y = 7.5 up to y = 4.5 runs toward the top edge. The
  // text names the block's edges, so it stays true once the tip has the block turned.
  it.each([
    [[[5, 7.5], [5, 4.5]], 'toward the top edge of the block', '3 in', 'give the block a half turn so its top edge is nearest you'],
    [[[5, 4.5], [5, 7.5]], 'toward the bottom edge of the block', '3 in', null],
    [[[4.5, 5], [7.25, 5]], 'toward the right edge of the block', '2 3/4 in', 'give the block a quarter turn so its right edge is nearest you'],
    [[[7.5, 6], [4.75, 6]], 'toward the left edge of the block', '2 3/4 in', 'give the block a quarter turn so its left edge is nearest you'],
  ] as const)('%j reads "%s", %s', (points, words, length, hint) => {
    const steps = one(points);
    expect(steps.map((s) => s.kind)).toEqual(['start', 'stitch', 'tie-off']);
    const stitch = steps[1]!;
    expect(stitch.instruction).toContain(words);
    expect(stitch.instruction).toContain(`a straight line ${length} long`);
    expect(stitch.instruction).toContain('in the centre square');
    expect(stitch.patch).toBe('centre square');
    const turn = stitch.hints.find((h) => h.kind === 'turn-block');
    if (hint === null) expect(turn).toBeUndefined();
    else expect(turn?.text).toContain(hint);
  });

  it('calls an arc a curve, measures it as π r and suggests keeping the block still', () => {
    // Half circle of radius 1.5 in: length π·1.5 ≈ 4.71 in, read as 4 3/4 in on a ruler (analytic).
    const arc = flattenArc([6, 6], 1.5, Math.PI, 2 * Math.PI, 0.001);
    const stitch = one(arc)[1]!;
    expect(stitch.direction).toBe('curved');
    expect(stitch.instruction).toContain('4 3/4 in of curving line in the centre square');
    expect(stitch.hints.map((h) => h.kind)).toContain('keep-block-still');
  });

  it('reads centimetres to the nearest 0.5 cm', () => {
    const d = design(buildPiecedLayout('nine-patch', 30, 30).seams, [[[12, 18], [12, 11.2]]], 'cm', 30);
    const stitch = buildWalkthrough(d, [{ pass: 1, kind: 'stitch', points: [[12, 18], [12, 11.2]] }]).steps[1]!;
    expect(stitch.instruction).toContain('a straight line 7 cm long in the centre square, toward the top edge of the block');
  });

  it('groups travel strokes into one move and names each leg', () => {
    const route: RouteStrokeInput[] = [
      { pass: 1, kind: 'stitch', points: [[1, 1], [3, 3]] },
      { pass: 1, kind: 'retrace', points: [[3, 3], [2.5, 2.5]] },
      { pass: 1, kind: 'ditch', points: [[2.5, 2.5], [4, 4]] },
      { pass: 1, kind: 'edge', points: [[4, 4], [4, 0]] },
      { pass: 1, kind: 'stitch', points: [[4, 0], [4, 2]] },
      { pass: 2, kind: 'stitch', points: [[8, 8], [10, 8]] },
    ];
    const w = buildWalkthrough(design(ninePatch, [[[1, 1], [3, 3]]]), route);
    expect(w.steps.map((s) => s.kind)).toEqual(['start', 'stitch', 'travel', 'stitch', 'tie-off', 'start', 'stitch', 'tie-off']);
    expect(w.steps[2]!.strokes).toEqual([1, 2, 3]);
    expect(w.steps[2]!.title).toBe('Travel');
    // 0.707 + 2.121 + 4 = 6.828 in → 6 7/8 in; legs 3/4, 2 1/8 and 4 in (Pythagoras, ruler to 1/8 in).
    expect(w.steps[2]!.instruction).toMatch(/^Travel 6 7\/8 in to the top edge of the block, by the top-left square: 3\/4 in over your stitching toward the top edge, then 2 1\/8 in along the seam toward the bottom edge, then 4 in along the edge toward the top edge\.$/);
    expect(w.steps[4]!.instruction).toMatch(/^Tie off: pass 1 ends at /);
    expect(w.steps[5]!.passCounter).toBe('Pass 2 of 2');
    expect(w.steps[7]!.instruction).toContain('That was the last pass');
  });

  it('names block corners, edges and seams where the needle stops', () => {
    const route: RouteStrokeInput[] = [
      { pass: 1, kind: 'stitch', points: [[0, 0], [2, 2]] },
      { pass: 1, kind: 'ditch', points: [[2, 2], [4, 2]] },
      { pass: 1, kind: 'edge', points: [[4, 2], [4, 0]] },
    ];
    const w = buildWalkthrough(design(ninePatch, [[[0, 0], [2, 2]]]), route);
    expect(w.steps[0]!.instruction).toContain('starts at the top-left corner of the block');
    expect(w.steps[0]!.hints.map((h) => h.kind)).toEqual(['stop-at-edge']);
    expect(w.steps[1]!.instruction).toContain('End at a point inside the top-left square');
  });
});
