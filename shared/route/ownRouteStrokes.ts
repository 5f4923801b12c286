// Drawing strokes for a quilter's own route (design.route), in the same shape as the planner's strokes, so a
// saved own route draws like a planned one (pass numbers, arrows, travel styled apart). Pass numbers come from
// the route check; kinds from the traced pieces: a quilting edge is `stitch` the first time and `retrace` after,
// seams are `ditch`, the outline is `edge`. A run on no design line is drawn as `stitch` (the route check's
// warnings and figures say whether it counts as edge travel in the binding band or as off-line stitching).
import type { StrokeKind, StrokePath } from '../contract/strokes.ts';
import type { Design } from '../design/design.schema.ts';
import type { Point } from '../geometry/point.ts';
import type { DesignProblem } from '../graph/designProblem.ts';
import { traceRoute } from '../graph/traceRoute.ts';
import { ok, type Result } from '../result.ts';
import type { RouteCheck } from './checkRoute.ts';
import { strokeKindOf } from './routeStrokes.ts';

export function buildOwnRouteStrokes(design: Design, check: RouteCheck): Result<StrokePath[], DesignProblem> {
  const traced = traceRoute(design);
  if (!traced.ok) return traced;
  const { graph, strokes } = traced.value;
  const passOf = new Map(check.strokes.map((s) => [s.index, s.pass]));
  const covered = new Uint8Array(graph.edges.length);
  const out: StrokePath[] = [];
  let current: { pass: number; kind: StrokeKind; points: Point[]; length: number } | null = null;
  const add = (pass: number, kind: StrokeKind, points: readonly Point[], length: number): void => {
    if (current && current.pass === pass && current.kind === kind && samePoint(current.points[current.points.length - 1]!, points[0]!)) {
      current.points.push(...points.slice(1));
      current.length += length;
      return;
    }
    if (current) out.push(current);
    current = { pass, kind, points: [...points], length };
  };
  for (const stroke of strokes) {
    const pass = passOf.get(stroke.index);
    if (pass === undefined) continue; // a stroke that snapped to a single point
    for (const piece of stroke.pieces) {
      if (piece.offLine) {
        add(pass, 'stitch', piece.points, piece.length);
        continue;
      }
      const e = graph.edges[piece.edge]!;
      add(pass, strokeKindOf(e.kind, covered, e.id), piece.forward ? e.points : [...e.points].reverse(), e.length);
    }
  }
  if (current) out.push(current);
  return ok(out);
}

const samePoint = (a: Point, b: Point): boolean => a[0] === b[0] && a[1] === b[1];
