import type { Point, Polyline } from '../geometry/point.ts';
import type { Polygon } from '../layouts/patch.ts';
import { clipPolyline } from './clip.ts';
import type { LoopBand } from './loopBand.ts';
import { distanceToOutline } from './polygon.ts';
import { arcPoints, tangentBetween, type Turn } from './turnLoops.ts';

/**
 * Radius of a fold loop as a share of the stroke advance P (half the pitch): loops on one side stand 2P
 * apart, so loops of diameter P leave a loop's width between them (chosen by eye; common practice, no source). A loop is also
 * kept within a quarter of the patch's width there, and shrinks to fit where the side meets another.
 */
export const FOLD_RADIUS = 0.5;

/**
 * Ribbon candy whose turns reach the sides, worked in the band's (u, v) frame (u along the axis):
 * turn k touches the side at T_k = (u_k, hi) for even k and (u_k, lo) for odd k, with u_k = start + k·P,
 * where P is half the pitch, shortened so a whole number of strokes fills the axis (one pitch: a fold on
 * each side). At every turn but the first and the last the line folds
 * back on itself: it runs round a loop — a circle tangent to the side at T_k, inside the patch — turning
 * backward, touches the side at T_k and crosses its own stroke before it leaves for the next turn, as a
 * ribbon folded back and forth does. Strokes are the straight common tangents of consecutive loops; the
 * line starts at T_0 and ends at T_n (in a patch ending in a point, the point). Every point lies inside a
 * convex patch (loops are fitted, strokes join inside points); a non-convex patch is clipped, and every
 * clipped piece ends on the outline.
 */
export function foldedRibbon(polygon: Polygon, band: LoopBand, pitch: number, chordError: number): Polyline[] {
  const length = band.end - band.start;
  // One pitch holds two strokes (a fold on each side); the count is rounded up, so strokes running the same
  // way stand at most one pitch apart.
  const strokes = Math.max(1, Math.ceil((2 * length) / pitch - 1e-9));
  const p = length / strokes;
  const turns: Turn[] = [];
  for (let k = 0; k <= strokes; k++) {
    const u = band.start + k * p;
    const [lo, hi] = band.at(u);
    const onHigh = k % 2 === 0;
    const touch = band.frame.toPoint(u, onHigh ? hi : lo);
    // Backward folding turns counter-clockwise in (u, v) on the high side and clockwise on the low side; the
    // frame is a rotation, so the same holds in design coordinates.
    const spin = onHigh ? 1 : -1;
    const inner = k === 0 || k === strokes ? 0 : Math.min(FOLD_RADIUS * p, Math.max(0, hi - lo) / 4);
    turns.push(fitTurn(polygon, band, u, onHigh, touch, spin, inner));
  }
  const points: Point[] = [turns[0]!.touch];
  for (let k = 0; k < strokes; k++) {
    const a = turns[k]!;
    const b = turns[k + 1]!;
    let link = tangentBetween(a, b);
    if (!link) {
      // Loops too close for a common tangent (a narrow spot): this pair turns without loops.
      turns[k] = { ...a, radius: 0, center: a.touch };
      turns[k + 1] = { ...b, radius: 0, center: b.touch };
      link = tangentBetween(turns[k]!, turns[k + 1]!)!;
    }
    if (k > 0 && turns[k]!.radius > 0) points.push(...arcPoints(turns[k]!, lastOf(points), link[0], chordError));
    points.push(link[0], link[1]);
  }
  return clipPolyline(dropRepeats(points), polygon);
}

/**
 * The turn's loop: the largest radius up to `wanted` whose circle, tangent to the side at `touch`, stays
 * inside the patch (bisection on the radius, 30 halvings); radius 0 when none fits.
 */
function fitTurn(polygon: Polygon, band: LoopBand, u: number, onHigh: boolean, touch: Point, spin: 1 | -1, wanted: number): Turn {
  const inward = inwardNormal(band, u, onHigh);
  const centerAt = (r: number): Point => [touch[0] + inward[0] * r, touch[1] + inward[1] * r];
  const fits = (r: number): boolean => distanceToOutline(centerAt(r), polygon) >= r * (1 - 1e-9);
  let radius = 0;
  if (wanted > 0 && fits(wanted)) radius = wanted;
  else if (wanted > 0) {
    let [lo, hi] = [0, wanted];
    for (let i = 0; i < 30; i++) {
      const mid = (lo + hi) / 2;
      if (fits(mid)) lo = mid;
      else hi = mid;
    }
    radius = lo > wanted * 0.05 ? lo : 0;
  }
  return { touch, center: centerAt(radius), radius, spin };
}

/** Unit normal pointing into the band from its high (or low) side at u, from the side's slope there. */
function inwardNormal(band: LoopBand, u: number, onHigh: boolean): Point {
  const h = (band.end - band.start) * 1e-6;
  const side = (x: number): number => band.at(x)[onHigh ? 1 : 0];
  const a = Math.max(band.start, u - h);
  const b = Math.min(band.end, u + h);
  const slope = b > a ? (side(b) - side(a)) / (b - a) : 0;
  // Side tangent (1, slope) in (u, v); the normal toward the inside is (slope, −1) on the high side.
  const [nu, nv] = onHigh ? [slope, -1] : [-slope, 1];
  const len = Math.hypot(nu, nv);
  const o = band.frame.toPoint(0, 0);
  const q = band.frame.toPoint(nu / len, nv / len);
  return [q[0] - o[0], q[1] - o[1]];
}

function lastOf(points: readonly Point[]): Point {
  return points[points.length - 1]!;
}

function dropRepeats(points: readonly Point[]): Point[] {
  return points.filter((q, i) => i === 0 || q[0] !== points[i - 1]![0] || q[1] !== points[i - 1]![1]);
}
