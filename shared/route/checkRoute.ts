import { bindingBandOf, type Design } from '../design/design.schema.ts';
import type { Point } from '../geometry/point.ts';
import type { DesignProblem } from '../graph/designProblem.ts';
import { findOddPoints } from '../graph/oddPoints.ts';
import { findPieces } from '../graph/pieces.ts';
import { snapToleranceOf } from '../graph/tolerance.ts';
import { traceRoute } from '../graph/traceRoute.ts';
import { ok, type Result } from '../result.ts';
import { addLength, strokeKindOf, type RouteLengths } from './routeStrokes.ts';
import { findStrokeDirection, type StrokeDirection } from './strokeDirection.ts';
import { computeThreadBudget, type ThreadBudget } from './threadBudget.ts';

/** Something in a quilter's route worth a look; the route is still measured. */
export type RouteWarning =
  | { readonly kind: 'outside-block'; readonly stroke: number; readonly point: Point; readonly message: string }
  | { readonly kind: 'edge-travel-outside-band'; readonly stroke: number; readonly length: number; readonly message: string }
  | { readonly kind: 'edge-travel-off'; readonly stroke: number; readonly length: number; readonly message: string }
  | { readonly kind: 'off-line'; readonly stroke: number; readonly length: number; readonly message: string };

/** Route check of a quilter's own route (`design.route`). Lengths in the design's units. */
export interface RouteCheck extends RouteLengths {
  readonly units: Design['units'];
  readonly pieces: number;
  readonly oddPoints: number;
  readonly passes: number;
  /** Stops = passes − 1: each new pass means a tie-off and a restart. */
  readonly stops: number;
  /** retrace + ditch + edge (edge includes off-line runs inside the binding band). */
  readonly travelLength: number;
  /** Stitching that follows no design line and is not edge travel. */
  readonly offLineLength: number;
  readonly unstitched: { readonly count: number; readonly length: number; readonly lines: readonly { readonly edge: number; readonly source: number; readonly length: number; readonly points: readonly Point[] }[] };
  readonly strokes: readonly { readonly index: number; readonly pass: number; readonly length: number; readonly direction: StrokeDirection }[];
  readonly warnings: readonly RouteWarning[];
  readonly threadBudget: ThreadBudget;
}

/**
 * Measures a quilter's route. Strokes are traced onto the planar graph (graph/traceRoute). A new pass starts wherever
 * a stroke does not begin where the previous one ended (within the snapping tolerance). A quilting edge is stitched
 * the first time it is covered and retraced after; seams are ditch travel and the outline edge travel. Off-line runs
 * that stay inside the binding band (every segment within the band of one block side) count as edge travel; runs
 * that start in the band but leave it are `edge-travel-outside-band`; others are `off-line`.
 */
export function checkRoute(design: Design): Result<RouteCheck, DesignProblem> {
  const traced = traceRoute(design);
  if (!traced.ok) return traced;
  const { graph, strokes } = traced.value;
  const tol = snapToleranceOf(design.units);
  const band = bindingBandOf(design) + tol;
  const totals: RouteLengths = { stitchLength: 0, retraceLength: 0, ditchLength: 0, edgeLength: 0 };
  const covered = new Uint8Array(graph.edges.length);
  const warnings: RouteWarning[] = [];
  const strokeReports: RouteCheck['strokes'][number][] = [];
  let offLineLength = 0;
  let passes = 0;
  let needle: Point | null = null;
  let sewn = 0;
  for (const stroke of strokes) {
    const raw = design.route![stroke.index]!;
    if (stroke.pieces.length === 0) continue;
    if (needle === null || Math.hypot(stroke.start[0] - needle[0], stroke.start[1] - needle[1]) > tol) passes++;
    needle = stroke.end;
    sewn += stroke.length;
    strokeReports.push({ index: stroke.index, pass: passes, length: stroke.length, direction: findStrokeDirection(raw) });
    const outside = raw.find(([x, y]) => x < -tol || y < -tol || x > design.width + tol || y > design.height + tol);
    if (outside) warnings.push({ kind: 'outside-block', stroke: stroke.index, point: outside, message: `stroke ${stroke.index + 1} stitches outside the block at (${outside[0]}, ${outside[1]})` });
    for (const piece of stroke.pieces) {
      if (!piece.offLine) {
        const e = graph.edges[piece.edge]!;
        addLength(totals, strokeKindOf(e.kind, covered, e.id), e.length);
        continue;
      }
      const where = `stroke ${stroke.index + 1}`;
      if (isInsideBand(piece.points, design, band)) {
        addLength(totals, 'edge', piece.length);
        if (!design.edgeTravel) warnings.push({ kind: 'edge-travel-off', stroke: stroke.index, length: piece.length, message: `${where} travels along the edge, but edge travel is off for this design` });
      } else {
        offLineLength += piece.length;
        const touchesBand = piece.points.some((p) => distanceToOutline(p, design) <= band);
        warnings.push(
          touchesBand
            ? { kind: 'edge-travel-outside-band', stroke: stroke.index, length: piece.length, message: `${where} runs along the edge but leaves the ${bindingBandOf(design)} ${design.units} binding band` }
            : { kind: 'off-line', stroke: stroke.index, length: piece.length, message: `${where} stitches ${piece.length.toFixed(2)} ${design.units} where the design has no line` },
        );
      }
    }
  }
  const missed = graph.edges.filter((e) => e.kind === 'quilting' && !covered[e.id]);
  return ok({
    ...totals,
    units: design.units,
    pieces: findPieces(graph).length,
    oddPoints: findOddPoints(graph).length,
    passes,
    stops: Math.max(0, passes - 1),
    travelLength: totals.retraceLength + totals.ditchLength + totals.edgeLength,
    offLineLength,
    unstitched: {
      count: missed.length,
      length: missed.reduce((s, e) => s + e.length, 0),
      lines: missed.map((e) => ({ edge: e.id, source: e.source, length: e.length, points: e.points })),
    },
    strokes: strokeReports,
    warnings,
    threadBudget: computeThreadBudget(sewn, passes, design.units, design.thread),
  });
}

/** Distance from p to the nearest block side (negative outside the block). */
function distanceToOutline([x, y]: Point, design: Design): number {
  return Math.min(x, y, design.width - x, design.height - y);
}

/** True when every segment keeps both ends within `band` of one and the same block side (so all of it does). */
function isInsideBand(points: readonly Point[], design: Design, band: number): boolean {
  const sides = ([x, y]: Point): number[] => [x, y, design.width - x, design.height - y].map((d) => (d <= band && d >= -band ? 1 : 0));
  for (let i = 1; i < points.length; i++) {
    const a = sides(points[i - 1]!);
    const b = sides(points[i]!);
    if (!a.some((f, s) => f === 1 && b[s] === 1)) return false;
  }
  return true;
}
