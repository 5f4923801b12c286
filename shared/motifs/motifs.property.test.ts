import fc from 'fast-check';
import { assertYielding } from '../../tests/helpers/yieldingProperty.ts';
import { describe, expect, it } from 'vitest';
import type { Units } from '../design/design.schema.ts';
import { properCrossing } from '../geometry/intersect.ts';
import type { Point, Polyline } from '../geometry/point.ts';
import { buildPiecedLayout, PIECED_LAYOUTS } from '../layouts/piecedLayouts.ts';
import { countPieces } from './connectivity.ts';
import { ECHO_LEG_FACTOR, planEcho } from './echo.ts';
import { MOTIF_RANGES, rangeIn } from './motifRanges.ts';
import { generateMotif, MOTIFS, motifParamsSchema, type MotifKind, type MotifParams } from './motifs.ts';
import { PebbleGrid } from './pebblePack.ts';
import { placePebbles } from './pebbles.ts';
import { isInsideOrOn, toleranceFor } from './polygon.ts';

/** Runs per motif: the issue asks for at least 2,000 (fast-check, seeded so a failure can be replayed). */
const RUNS = 2000;
/** Generous: a run takes 1–30 s alone, several times that on a loaded 2-core machine. */
const SLOW = 300_000;

/** A patch from a pieced layout at 12 in or 30 cm, with the layout options drawn too. */
interface LayoutPatch {
  readonly layout: string;
  readonly units: Units;
  readonly name: string;
  readonly polygon: readonly Point[];
}
const layoutPatch: fc.Arbitrary<LayoutPatch> = fc
  .record({
    id: fc.constantFrom(...PIECED_LAYOUTS.map((l) => l.id)),
    units: fc.constantFrom<Units>('in', 'cm'),
    rounds: fc.integer({ min: 1, max: 8 }),
    geese: fc.integer({ min: 1, max: 12 }),
    pick: fc.nat(),
  })
  .map(({ id, units, rounds, geese, pick }) => {
    const size = units === 'in' ? 12 : 30;
    const { patches } = buildPiecedLayout(id, size, size, { rounds, geese });
    const patch = patches[pick % patches.length]!;
    return { layout: id, units, name: patch.name, polygon: patch.polygon };
  });

/** Parameters of one motif drawn from the panel's ranges in the patch's units. */
function paramsFor(kind: MotifKind, units: Units): fc.Arbitrary<MotifParams> {
  const ranges = MOTIF_RANGES[kind];
  const fields = Object.fromEntries(
    Object.entries(ranges).map(([key, r]) => {
      const { min, max } = rangeIn(r, units);
      return [key, r.unit === 'count' ? fc.integer({ min, max }) : fc.double({ min, max, noNaN: true, noDefaultInfinity: true })];
    }),
  );
  return fc.record(fields).map((raw) => {
    const p: Record<string, unknown> = { kind, ...raw };
    if (kind === 'pebbles') {
      // maxRadius in [minRadius, 2.5·minRadius] and overlap ≤ minRadius/4, as the ranges say.
      const min = raw['minRadius'] as number;
      p['maxRadius'] = Math.min(2.5 * min, Math.max(min, raw['maxRadius'] as number));
      p['overlap'] = Math.min(min / 4, raw['overlap'] as number);
    }
    return motifParamsSchema.parse(p);
  });
}

const caseFor = (kind: MotifKind) => layoutPatch.chain((patch) => paramsFor(kind, patch.units).map((params) => ({ patch, params })));

/**
 * Whether the polyline stays in the closed polygon within tol: each segment is cut where it properly
 * crosses the outline, and the vertices and every sub-piece's midpoint must lie inside or within tol.
 */
function isInside(line: Polyline, polygon: readonly Point[], tol: number): boolean {
  if (!line.every((p) => isInsideOrOn(p, polygon, tol))) return false;
  for (let i = 1; i < line.length; i++) {
    const [a, b] = [line[i - 1]!, line[i]!];
    const ts = [0, 1];
    for (let j = 0; j < polygon.length; j++) {
      const c = properCrossing(a, b, polygon[j]!, polygon[(j + 1) % polygon.length]!);
      if (c) ts.push(c.t);
    }
    ts.sort((x, y) => x - y);
    for (let k = 1; k < ts.length; k++) {
      const t = (ts[k - 1]! + ts[k]!) / 2;
      if (!isInsideOrOn([a[0] + (b[0] - a[0]) * t, a[1] + (b[1] - a[1]) * t], polygon, tol)) return false;
    }
  }
  return true;
}

/** The checks every motif must pass: lines inside the patch, and one piece with its outline. */
function checkFill(patch: LayoutPatch, params: MotifParams): readonly Polyline[] {
  const result = generateMotif(patch.polygon, params);
  if (!result.ok) throw new Error(`motif refused: ${JSON.stringify(result.error)}`);
  const { lines } = result.value;
  // 1e-9 of the block (12 in or 30 cm); the planner snaps far more loosely (1e-4 in).
  const tol = toleranceFor(patch.polygon) * 1e3;
  for (const line of lines) {
    expect(line.length).toBeGreaterThanOrEqual(2);
    expect(isInside(line, patch.polygon, tol)).toBe(true);
  }
  expect(countPieces(lines, patch.polygon, tol)).toBe(1);
  return lines;
}

describe(`motifs: every fill of a layout patch is inside it and one piece with its outline (fast-check, ${RUNS} runs each)`, () => {
  it('covers every motif the panel offers', () => {
    // A motif added later gets ranges here and so joins these properties.
    expect(Object.keys(MOTIF_RANGES).sort()).toEqual(MOTIFS.map((m) => m.kind).sort());
  });

  for (const kind of ['straight-lines', 'crosshatch', 'ribbon-candy', 'arches'] as const) {
    it(kind, async () => {
      await assertYielding(caseFor(kind), ({ patch, params }) => void checkFill(patch, params), { seed: 20260, numRuns: RUNS });
    }, SLOW);
  }

  it(`echo: legs no longer than ${ECHO_LEG_FACTOR} × spacing`, async () => {
    let longest = 0;
    await assertYielding(
      caseFor('echo'),
      ({ patch, params }) => {
        checkFill(patch, params);
        if (params.kind !== 'echo') return;
        for (const leg of planEcho(patch.polygon, params).legs) {
          const length = Math.hypot(leg.on.point[0] - leg.from.point[0], leg.on.point[1] - leg.from.point[1]);
          longest = Math.max(longest, length / params.spacing);
          expect(length).toBeLessThanOrEqual(ECHO_LEG_FACTOR * params.spacing * (1 + 1e-9));
        }
      },
      { seed: 20261, numRuns: RUNS },
    );
    // Every pieced patch is convex, where each leg is exactly one spacing (half to a half-step echo).
    expect(longest).toBeLessThanOrEqual(1 + 1e-6);
  }, SLOW);

  it('pebbles: each pebble touches its nearest neighbour, within the set overlap', async () => {
    await assertYielding(
      caseFor('pebbles'),
      ({ patch, params }) => {
        checkFill(patch, params);
        if (params.kind !== 'pebbles') return;
        const pebbles = placePebbles(patch.polygon, params);
        const tol = toleranceFor(patch.polygon) * 1e4;
        // Only pebbles within r + maxRadius of a centre can touch or overlap it: a grid finds them.
        const grid = new PebbleGrid(2 * params.maxRadius);
        pebbles.forEach((p) => grid.add(p));
        pebbles.forEach((p) => {
          let nearest = Infinity;
          for (const q of grid.near(p.center, p.radius + params.maxRadius)) {
            if (q !== p) nearest = Math.min(nearest, Math.hypot(p.center[0] - q.center[0], p.center[1] - q.center[1]) - p.radius - q.radius);
          }
          // Nearest neighbour: overlapping by exactly `overlap` (0: tangent), never by more.
          if (pebbles.length > 1) expect(Math.abs(nearest + params.overlap)).toBeLessThanOrEqual(tol);
        });
      },
      { seed: 20262, numRuns: RUNS },
    );
  }, SLOW);
});

describe('motifs: non-convex patches', () => {
  const shapes: Point[][] = [
    [[0, 0], [6, 0], [6, 2], [2, 2], [2, 7], [0, 7]],
    [[0, 0], [8, 0], [8, 5], [5, 5], [5, 2], [3, 2], [3, 5], [0, 5]],
  ];
  it('every motif stays inside and, echoes included, makes one piece with the outline', () => {
    fc.assert(
      fc.property(fc.constantFrom(...shapes), fc.constantFrom(...MOTIFS.map((m) => m.kind)).chain((k) => paramsFor(k, 'in')), (polygon, params) => {
        checkFill({ layout: 'drawn', units: 'in', name: 'non-convex', polygon }, params);
        if (params.kind === 'echo') {
          for (const leg of planEcho(polygon, params).legs) {
            expect(Math.hypot(leg.on.point[0] - leg.from.point[0], leg.on.point[1] - leg.from.point[1])).toBeLessThanOrEqual(ECHO_LEG_FACTOR * params.spacing);
          }
        }
      }),
      { seed: 7, numRuns: 300 },
    );
  }, SLOW);

  it('refuses a patch with no area and reports invalid parameters with their paths', () => {
    expect(generateMotif([[0, 0], [1, 1], [2, 2]], { kind: 'straight-lines', spacing: 1 })).toEqual({ ok: false, error: { kind: 'degenerate-patch' } });
    const result = generateMotif([[0, 0], [1, 0], [0, 1]], { kind: 'straight-lines', spacing: -1 });
    expect(result.ok).toBe(false);
    if (!result.ok && result.error.kind === 'invalid-params') expect(result.error.issues[0]!.path).toBe('spacing');
  });

  it('keeps the older look with separate: pebbles and echo rings apart from the outline', () => {
    const square: Point[] = [[0, 0], [4, 0], [4, 4], [0, 4]];
    const pebbles = generateMotif(square, { kind: 'pebbles', minRadius: 0.3, maxRadius: 0.6, gap: 0.05, separate: true });
    const echo = generateMotif(square, { kind: 'echo', spacing: 0.5, separate: true });
    if (!pebbles.ok || !echo.ok) throw new Error('refused');
    expect(countPieces(pebbles.value.lines, square, 1e-9)).toBe(pebbles.value.lines.length + 1);
    expect(countPieces(echo.value.lines, square, 1e-9)).toBe(echo.value.lines.length + 1);
  });
});
