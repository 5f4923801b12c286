// The route contract (shared/contract) against every answer the server's code can build. For random designs —
// pieced layouts with motif fills, and multi-piece blocks (shared/testing/multiPieceDesigns.ts) with their route
// ends — and for both kinds of route (the planner's, and an own stitching order drawn over the design's lines and
// seams with edge-band, off-line and outside-the-block strokes), the answers are built with the same functions the
// server runs (shared/route/routeAnswers.ts in the engine worker; src/server/designs/designRecord.ts for rows;
// src/server/templates/copiedFigures.ts for template copies), sent through JSON, and parsed with the schemas the
// islands, templates and the walkthrough read them with. A failure means the server can send something its own
// clients refuse: drift between writer and reader.
//
// Checked that it can fail: with a drift planted in shared/route/ownRouteStrokes.ts (passes numbered from 0, as
// the old template snapshot schema allowed), this test failed on the first own route with a stroke; removed again.
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { checkAnswerSchema } from '@shared/contract/check.ts';
import { designAnswerSchema, savedRouteAnswerSchema, savedWithCheckAnswerSchema } from '@shared/contract/designs.ts';
import { designSummarySchema } from '@shared/contract/figures.ts';
import { planAnswerSchema } from '@shared/contract/plan.ts';
import { designSchema, type Design, type Units } from '@shared/design/design.schema.ts';
import type { Polyline } from '@shared/geometry/point.ts';
import { buildPiecedLayout, PIECED_LAYOUTS } from '@shared/layouts/piecedLayouts.ts';
import { fillDesign, patchesInReadingOrder } from '@shared/motifs/fillDesign.ts';
import { MOTIF_RANGES, rangeIn } from '@shared/motifs/motifRanges.ts';
import { MOTIFS, motifParamsSchema, type MotifKind } from '@shared/motifs/motifs.ts';
import { loadHighsSolver } from '@shared/route/exact/highsSolver.ts';
import type { LpSolver } from '@shared/route/exact/lpSolver.ts';
import { planDesign, type DesignPlanOptions } from '@shared/route/planDesign.ts';
import { buildCheckResult, buildOwnRouteResult, strokePathOf, summaryOf, summaryOfCheck, toPlanResult } from '@shared/route/routeAnswers.ts';
import { archRowsDesign, END_CHOICES, patchFillDesign, squareInSquareDesign } from '@shared/testing/multiPieceDesigns.ts';
import { parseWalkthroughInput } from '@shared/walkthrough/walkthroughInput.ts';
import { parseCheckAnswer } from '@components/route/routeCheckView.ts';
import type { DesignRecordRow } from '@server/designs/design.repository.ts';
import { designJsonText, savedWithCheckJsonText, storedSummary, toSavedRouteJson } from '@server/designs/designRecord.ts';
import { copiedDesignSummary, copiedRoute } from '@server/templates/copiedFigures.ts';
import { assertYielding } from '../helpers/yieldingProperty.ts';

/** The issue asks for at least 300 random designs, each with a planned and an own route. */
const RUNS = 300;

/** A pieced layout (12 in or 30 cm) with one motif, drawn from the panel's ranges, in one or every patch; free ends. */
const filledLayout: fc.Arbitrary<Design> = fc
  .record({
    id: fc.constantFrom(...PIECED_LAYOUTS.map((l) => l.id)),
    units: fc.constantFrom<Units>('in', 'cm'),
    kind: fc.constantFrom<MotifKind>(...MOTIFS.map((m) => m.kind)),
    values: fc.array(fc.double({ min: 0, max: 1, noNaN: true }), { minLength: 5, maxLength: 5 }),
    patch: fc.nat(),
    edgeTravel: fc.boolean(),
  })
  .map(({ id, units, kind, values, patch, edgeTravel }) => {
    const size = units === 'in' ? 12 : 30;
    const { seams } = buildPiecedLayout(id, size, size);
    const base = designSchema.parse({ version: 1, units, width: size, height: size, seams, lines: [], edgeTravel });
    const params = motifParams(kind, units, values);
    const patches = patchesInReadingOrder(base).length;
    const filled = fillDesign(base, { fills: [{ patch: patch % (patches + 1) === patches ? 'all' : patch % patches, motif: params }] });
    if (!filled.ok) throw new Error(`contract test: ${id} ${kind}: ${filled.error.message}`);
    // Free route ends only: a fill with the start or end fixed at a block corner can make the planner throw
    // (route/minTJoin: "terminals are not all connected by travel lines"; two cases pinned in
    // tests/unit/plannerEndCrash.test.ts), a defect of the planner, not of the contract. Multi-piece blocks below
    // keep every end choice.
    return filled.value;
  });

/** Motif parameters from the panel's ranges (motifRanges.ts), `values` in [0, 1] picking within each range. */
function motifParams(kind: MotifKind, units: Units, values: readonly number[]) {
  const raw: Record<string, unknown> = { kind };
  Object.entries(MOTIF_RANGES[kind]).forEach(([key, r], i) => {
    const { min, max } = rangeIn(r, units);
    const v = min + (max - min) * values[i % values.length]!;
    raw[key] = r.unit === 'count' ? Math.round(v) : v;
  });
  if (kind === 'pebbles') {
    // maxRadius in [minRadius, 2.5·minRadius] and overlap ≤ minRadius/4, as the ranges say.
    const min = raw['minRadius'] as number;
    raw['maxRadius'] = Math.min(2.5 * min, Math.max(min, raw['maxRadius'] as number));
    raw['overlap'] = Math.min(min / 4, raw['overlap'] as number);
  }
  return motifParamsSchema.parse(raw);
}

/** A multi-piece 12 in block (only travel joins its pieces) with one of the route-end choices. */
const multiPiece: fc.Arbitrary<Design> = fc
  .record({ kind: fc.integer({ min: 0, max: 2 }), seed: fc.integer({ min: 1, max: 100_000 }), size: fc.integer({ min: 2, max: 4 }), ends: fc.nat() })
  .map(({ kind, seed, size, ends }) => {
    const base = kind === 0 ? patchFillDesign(seed, size, 3) : kind === 1 ? archRowsDesign(seed, size, 3 + size) : squareInSquareDesign(seed, size);
    const e = END_CHOICES[ends % END_CHOICES.length]!;
    return { ...base, ...(e.start ? { start: e.start } : {}), ...(e.end ? { end: e.end } : {}) };
  });

/**
 * An own stitching order over the design: some of its quilting lines and seams in a random order, some reversed,
 * plus strokes that make each kind of route warning (edge band, off the lines, outside the block).
 */
function withOwnRoute(design: Design): fc.Arbitrary<Design> {
  const pool: Polyline[] = [...design.lines, ...design.seams];
  const s = design.width;
  const extras: Polyline[] = [
    [[0.1 * s, 0.004 * s], [0.4 * s, 0.004 * s]], // along the top edge, inside the binding band
    [[0.2 * s, 0.3 * s], [0.35 * s, 0.55 * s]], // across a patch, on no line
    [[-0.05 * s, 0.5 * s], [0.05 * s, 0.5 * s]], // starts outside the block (within the schema's slack)
  ];
  return fc
    .record({
      order: fc.shuffledSubarray([...pool.keys()], { minLength: Math.min(1, pool.length), maxLength: Math.min(pool.length, 60) }),
      reverse: fc.array(fc.boolean(), { minLength: 60, maxLength: 60 }),
      extras: fc.subarray(extras),
    })
    .map(({ order, reverse, extras: more }) => {
      const route = [...order.map((i, j) => (reverse[j] ? [...pool[i]!].reverse() : pool[i]!)), ...more];
      return designSchema.parse({ ...design, route: route.length > 0 ? route : [extras[1]!] });
    });
}

/** As the browser receives it. */
const overTheWire = (value: unknown): unknown => JSON.parse(JSON.stringify(value));

function designRow(design: Design, summary: unknown): DesignRecordRow {
  const at = new Date('2026-12-05T06:00:00Z');
  return {
    id: '00000000-0000-4000-8000-000000000001', owner_id: '00000000-0000-4000-8000-000000000002', title: 'Random block', notes: '',
    thumbnail_svg: '<svg/>', version: 3, summary, summary_version: 3, created_at: at, updated_at: at, deleted_at: null,
    copied_from_template_version_id: null, data_json: JSON.stringify(design),
  };
}

function routeRow(kind: 'planned' | 'own', strokes: unknown, summary: unknown) {
  const at = new Date('2026-12-05T06:00:00Z');
  return { design_id: '00000000-0000-4000-8000-000000000001', kind, strokes: overTheWire(strokes), summary: overTheWire(summary), design_version: 3, created_at: at, updated_at: at };
}

/** Every answer about the planner's route and the design's check parses on the client side. */
function checkPlannedAnswers(design: Design, options: DesignPlanOptions): void {
  const checked = buildCheckResult(design, options);
  if (!checked.ok) throw new Error(`contract test: the engine refused a generated design: ${checked.error.message}`);
  const check = checked.value;
  const checkAnswer = overTheWire({ designVersion: 3, draft: false, ...check });
  expect(checkAnswerSchema.safeParse(checkAnswer).error).toBeUndefined();
  expect(parseCheckAnswer(checkAnswer)).not.toBeNull();
  expect(check.ownRoute !== null).toBe((design.route?.length ?? 0) > 0);

  const planned = planDesign(design, { ...options, stopsTable: true });
  if (!planned.ok) throw new Error(`contract test: the planner refused a generated design: ${planned.error.message}`);
  const plan = toPlanResult(planned.value);
  expect(planAnswerSchema.safeParse(overTheWire({ designVersion: 3, draft: true, plan })).error).toBeUndefined();

  // design.summary: written from the check by a save with ?check=1, from a plan by the background lane.
  const fromCheck = summaryOfCheck(check);
  expect(designSummarySchema.safeParse(overTheWire(summaryOf(planned.value))).error).toBeUndefined();
  const row = designRow(design, overTheWire(fromCheck));
  expect(storedSummary(row)).toEqual(fromCheck);
  const record = JSON.parse(`{"design":${designJsonText(row, row.data_json)}}`);
  expect(designAnswerSchema.safeParse(record).error).toBeUndefined();
  const saved = JSON.parse(savedWithCheckJsonText(row, row.data_json, check, null));
  expect(savedWithCheckAnswerSchema.safeParse(saved).error).toBeUndefined();

  // The kept planned route (design_route), and what a template copy and the walkthrough make of it.
  const strokes = planned.value.route.map(strokePathOf);
  const route = toSavedRouteJson(routeRow('planned', strokes, summaryOf(planned.value)), 3);
  expect(route).not.toBeNull();
  expect(savedRouteAnswerSchema.safeParse(overTheWire({ route })).error).toBeUndefined();
  expect(copiedRoute(overTheWire(strokes), overTheWire(summaryOf(planned.value)))?.kind).toBe('planned');
  expect(copiedDesignSummary(overTheWire(summaryOf(planned.value)))).not.toBeNull();
  expect(parseWalkthroughInput(overTheWire(design), overTheWire(strokes)).ok).toBe(true);
}

/** Every answer about the quilter's own route parses on the client side, and copies keep it as an own route. */
function checkOwnAnswers(design: Design): void {
  const own = buildOwnRouteResult(design);
  if (!own.ok) throw new Error(`contract test: the engine refused an own route drawn over the design: ${own.error.message}`);
  const route = toSavedRouteJson(routeRow('own', own.value.strokes, own.value.summary), 3);
  expect(route).not.toBeNull();
  expect(route?.summary.optimal).toBeNull();
  expect(savedRouteAnswerSchema.safeParse(overTheWire({ route })).error).toBeUndefined();
  // The template-copy defect of issue 10: own figures are not the planner's, so they never become design.summary.
  expect(copiedRoute(overTheWire(own.value.strokes), overTheWire(own.value.summary))?.kind).toBe('own');
  expect(copiedDesignSummary(overTheWire(own.value.summary))).toBeNull();
  expect(parseWalkthroughInput(overTheWire(design), overTheWire(own.value.strokes)).ok).toBe(true);
}

describe('route contract: what the server builds, its clients read', () => {
  let solver: LpSolver;
  it('loads the exact search’s solver (the engine workers plan with it)', async () => {
    solver = await loadHighsSolver();
  });

  it(`holds for ${RUNS} random designs, each with the planner's route and an own stitching order`, async () => {
    // The exact search gets 100 ms (the smallest budget a request may ask for), so runs stay short and designs it
    // cannot prove in time give the unproven answer (bound and gap) too.
    const options: DesignPlanOptions = { solver, clock: () => performance.now(), settings: { timeBudgetMs: 100, extraStops: 0, hiddenEndAllowance: 0 } };
    const cases = fc.oneof(filledLayout, multiPiece).chain((design) => withOwnRoute(design).map((withRoute) => ({ design, withRoute })));
    await assertYielding(
      cases,
      ({ design, withRoute }) => {
        if (design.lines.length === 0) {
          // A motif too large for its patch draws nothing: the engine refuses the design as a value (the server
          // answers 400 naming design.lines), so there is no answer to parse.
          expect(buildCheckResult(design, options)).toMatchObject({ ok: false, error: { kind: 'empty-design' } });
          return;
        }
        checkPlannedAnswers(design, options);
        checkPlannedAnswers(withRoute, options);
        checkOwnAnswers(withRoute);
      },
      { numRuns: RUNS, seed: 20261205 },
    );
  }, 600_000);
});
