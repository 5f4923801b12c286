import { z } from 'zod';
import type { Point, Polyline } from '../geometry/point.ts';
import type { Polygon } from '../layouts/patch.ts';
import { halfTurnAt, halfTurnSteps } from './axisFrame.ts';
import { clipPolyline } from './clip.ts';
import { buildLoopBand, type LoopBand } from './loopBand.ts';
import { chordErrorSchema, positiveNumber, separateSchema, type MotifLines } from './motif.types.ts';
import { foldedRibbon } from './ribbonFolds.ts';
import { directionOf, longAxisAngle } from './polygon.ts';

export const ribbonCandyParamsSchema = z
  .object({
    kind: z.literal('ribbon-candy'),
    /**
     * Length of one loop along the axis, design units (rounded so the loops fill the axis exactly). Joined
     * ribbon candy folds once on each side per pitch, so strokes running the same way are one pitch apart.
     */
    pitch: positiveNumber,
    /** Separate ribbon candy only: clear distance kept from the outline, design units (joined candy turns on the sides). */
    margin: z.number().finite().min(0).default(0),
    /**
     * Axis direction in degrees. By default a triangle runs square from the side facing its point to the
     * point (see `baseToPointAngle`), and any other patch along its long axis, turned to end in a point
     * when only one of its ends is one.
     */
    angle: z.number().finite().optional(),
    chordError: chordErrorSchema,
    separate: separateSchema,
  })
  .strict();
export type RibbonCandyParams = z.output<typeof ribbonCandyParamsSchema>;

/**
 * How the axis is shared out: `slots` loop slots of `pitch` each fill it exactly; the first `regular`
 * hold one loop each and, when the patch ends in a point, the last `finalSlots` hold the final loop.
 * Rule for the final loop: it takes the last third of the axis, rounded to whole slots, and never fewer
 * than two slots (over one slot it would be no bigger than the loop before it), nor more than all. So
 * at most one regular loop reaches into the last third, and the final loop swings wider than it.
 */
interface LoopPlan {
  readonly pitch: number;
  readonly regular: number;
  readonly finalSlots: number;
}

function planLoops(length: number, pitch: number, pointed: boolean): LoopPlan {
  const slots = Math.max(1, Math.round(length / pitch));
  const finalSlots = pointed ? Math.min(slots, Math.max(2, Math.round(slots / 3))) : 0;
  return { pitch: length / slots, regular: slots - finalSlots, finalSlots };
}

/**
 * Ribbon candy. Joined (the default): strokes from side to side whose turns touch the patch's sides and fold
 * back on themselves (see `foldedRibbon`), so the line meets the seams or the edge at every turn. Separate
 * (the older look): loops swinging left and right of the centre line, kept `margin` clear of the outline
 * (see `separateLoops`).
 */
export function generateRibbonCandy(polygon: Polygon, params: RibbonCandyParams): MotifLines {
  if (!params.separate) {
    const band = chooseBand(polygon, { ...params, margin: 0 });
    return { lines: band ? foldedRibbon(polygon, band, params.pitch, params.chordError) : [] };
  }
  return separateLoops(polygon, params);
}

/**
 * Separate ribbon candy: one continuous line of loops swinging alternately to the left and right of the patch's
 * centre line while it moves along the axis. Loop k spans one slot [u_k, u_k+1] (pitch rounded to fill
 * the axis) and is half an ellipse standing on the centre line, as tall as the room allows (`LoopBand` keeps
 * the margin). So the loops grow where the patch widens and shrink where it
 * narrows. When the patch ends in a point, the line finishes with one big loop that fills the point: from
 * the centre line it runs out along one side into the point, turns there and comes back along the other
 * side to where it began (see `LoopPlan` for its length). The line is finally clipped to the patch, which
 * leaves it whole in a convex patch.
 */
function separateLoops(polygon: Polygon, params: RibbonCandyParams): MotifLines {
  const band = chooseBand(polygon, params);
  if (!band) return { lines: [] };
  const plan = planLoops(band.end - band.start, params.pitch, band.pointedEnd);
  const points: Point[] = [];
  const loopSteps = halfTurnSteps(Math.hypot(plan.pitch, band.span) * 2, params.chordError);
  for (let k = 0; k < plan.regular; k++) {
    const u0 = band.start + k * plan.pitch;
    appendLoop(points, band, u0, u0 + plan.pitch, k % 2 === 0 ? 1 : -1, loopSteps);
  }
  if (plan.finalSlots > 0) {
    const finalSteps = halfTurnSteps(Math.hypot(plan.pitch * plan.finalSlots, band.span) * 2, params.chordError);
    appendFinalLoop(points, band, band.start + plan.regular * plan.pitch, plan.regular % 2 === 0 ? 1 : -1, finalSteps);
  }
  const line: Polyline = points;
  return { lines: clipPolyline(line, polygon) };
}

/** The band along the given axis, or along the default axis turned to end in a point. */
function chooseBand(polygon: Polygon, params: Pick<RibbonCandyParams, 'angle' | 'margin'>): LoopBand | null {
  if (params.angle !== undefined) return buildLoopBand(polygon, directionOf(params.angle), params.margin);
  const angle = polygon.length === 3 ? baseToPointAngle(polygon) : longAxisAngle(polygon);
  const band = buildLoopBand(polygon, directionOf(angle), params.margin);
  if (band && band.pointedStart && !band.pointedEnd) return buildLoopBand(polygon, directionOf(angle + 180), params.margin);
  return band;
}

/** Appends loop on [u0, u1] at `side` (+1: toward larger v), sharing its first point with the line so far. */
function appendLoop(points: Point[], band: LoopBand, u0: number, u1: number, side: 1 | -1, steps: number): void {
  const c0 = centre(band, u0);
  const c1 = centre(band, u1);
  const samples = Array.from({ length: steps + 1 }, (_, i) => {
    const [cos, lift] = halfTurnAt(i, steps);
    const t = (1 + cos) / 2;
    return { u: u0 + (u1 - u0) * t, base: c0 + (c1 - c0) * t, lift };
  });
  let height = Infinity;
  for (const s of samples) {
    if (s.lift <= 1e-12) continue;
    const [lo, hi] = band.at(s.u);
    const room = side > 0 ? hi - s.base : s.base - lo;
    height = Math.min(height, Math.max(0, room) / s.lift);
  }
  if (!Number.isFinite(height)) height = 0;
  samples.forEach((s, i) => {
    if (points.length > 0 && i === 0) return;
    points.push(band.frame.toPoint(s.u, s.base + side * height * s.lift));
  });
}

/**
 * Appends the final loop over [uF, end]: in band coordinates (s along the stretch from 0 to 1, w across
 * from −1 at lo to 1 at hi) it is the circle s = (1 − cos φ)/2, w = side·sin φ, φ from 0 to 2π, so it
 * leaves the centre line square to the axis (as the loop before it arrived), reaches the band's edges
 * halfway to the point, turns in the point itself and closes on its first point, where the line ends.
 * The band map is not affine, so the step count (set as for an ellipse of the loop's size) bounds the
 * chord error only roughly.
 */
function appendFinalLoop(points: Point[], band: LoopBand, uF: number, side: 1 | -1, halfSteps: number): void {
  const first = points[points.length - 1] ?? band.frame.toPoint(uF, centre(band, uF));
  if (points.length === 0) points.push(first);
  const length = band.end - uF;
  const steps = 2 * halfSteps;
  for (let i = 1; i < steps; i++) {
    const phi = (2 * Math.PI * i) / steps;
    const u = uF + (length * (1 - Math.cos(phi))) / 2;
    const [lo, hi] = band.at(u);
    const half = Math.max(0, (hi - lo) / 2);
    points.push(band.frame.toPoint(u, (lo + hi) / 2 + side * Math.sin(phi) * half));
  }
  points.push(first);
}

function centre(band: LoopBand, u: number): number {
  const [lo, hi] = band.at(u);
  return (lo + hi) / 2;
}

/**
 * Direction from a triangle's longest edge to its point, square to that edge. The point is the corner
 * between two equal sides when there is one (half-square triangles, flying geese, star points), else the
 * corner facing the longest edge (common practice, no source).
 */
function baseToPointAngle(triangle: Polygon): number {
  const corner = (i: number): Point => triangle[((i % 3) + 3) % 3]!;
  const side = (i: number): number => Math.hypot(corner(i + 1)[0] - corner(i)[0], corner(i + 1)[1] - corner(i)[1]);
  const longest = Math.max(side(0), side(1), side(2));
  // Corner i lies between sides i − 1 and i; the side facing it is side i + 1.
  const equal = [0, 1, 2].find((i) => Math.abs(side(i - 1) - side(i)) <= longest * 1e-9);
  const apex = equal ?? [0, 1, 2].reduce((best, i) => (side(i + 1) > side(best + 1) ? i : best), 0);
  const a = corner(apex + 1);
  const b = corner(apex + 2);
  const p = corner(apex);
  const along: Point = [b[0] - a[0], b[1] - a[1]];
  const t = ((p[0] - a[0]) * along[0] + (p[1] - a[1]) * along[1]) / (along[0] * along[0] + along[1] * along[1]);
  const foot: Point = [a[0] + along[0] * t, a[1] + along[1] * t];
  return (Math.atan2(p[1] - foot[1], p[0] - foot[0]) * 180) / Math.PI;
}
