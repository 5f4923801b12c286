import type { Design } from '../design/design.schema.ts';
import type { Point } from '../geometry/point.ts';
import { ok, type Result } from '../result.ts';
import { assembleGraph, type Assembled, type Atoms } from './assemble.ts';
import { checkDesign, type DesignProblem } from './designProblem.ts';
import type { PlanarGraphOptions } from './planarGraph.ts';
import type { PlanarGraph } from './planarGraph.types.ts';
import { prepareGraph } from './prepareGraph.ts';
import { snapToleranceOf } from './tolerance.ts';

/**
 * One piece of a traced stroke: either a whole graph edge, walked `forward` (from edge.u to edge.v) or
 * backward, or a run of stitching that follows no design line (`offLine`), with its polyline and length.
 */
export type TracedPiece =
  | { readonly offLine: false; readonly edge: number; readonly forward: boolean }
  | { readonly offLine: true; readonly points: readonly Point[]; readonly length: number };

/** A stroke of the quilter's route (`design.route[index]`) as a sequence of pieces in stitching order. */
export interface TracedStroke {
  readonly index: number;
  readonly pieces: readonly TracedPiece[];
  /** Where the stroke starts and ends after snapping (design units). */
  readonly start: Point;
  readonly end: Point;
  /** Stroke length after snapping: the sum of its pieces' lengths. */
  readonly length: number;
}

export interface TracedRoute {
  /** The design's planar graph, also split where route strokes start, end, turn back, cross or leave a line. */
  readonly graph: PlanarGraph;
  readonly strokes: readonly TracedStroke[];
}

/**
 * Traces `design.route` onto the design's planar graph. The design lines are noded exactly as by
 * `buildPlanarGraph` (same tolerance), then the route strokes are laid onto them (graph/nodeStrokes), so a
 * stroke meets design lines only at vertices and every on-line piece covers whole edges. Strokes add no
 * edges; where they cut a design line the cut is a new degree-2 vertex, so vertices, odd points, pieces and
 * lengths equal those of `buildPlanarGraph(design)`, and a planned route replays onto the very same edges.
 * A stroke part that lies on no design line (within the tolerance) becomes an `offLine` piece.
 * A stroke that snaps to a single point yields no pieces. Validates the route like the other lines.
 */
export function traceRoute(design: Design, options: PlanarGraphOptions = {}): Result<TracedRoute, DesignProblem> {
  const checked = checkDesign(design, true);
  if (!checked.ok) return checked;
  const prepared = prepareGraph(design, design.route ?? [], options.tolerance ?? snapToleranceOf(design.units));
  if (!prepared.ok) return prepared;
  const { noded, atoms, keep, strokeChains } = prepared.value;
  for (const chain of strokeChains) markStrokeVertices(chain, atoms, keep);
  const assembled = assembleGraph(noded.xs, noded.ys, atoms, keep);
  const strokes = strokeChains.map((chain, index) => traceStroke(index, chain, noded.xs, noded.ys, atoms, assembled));
  return ok({ graph: assembled.graph, strokes });
}

/** Vertices a stroke needs: its ends, and wherever it leaves or joins a line or turns back on one. */
function markStrokeVertices(chain: readonly number[], atoms: Atoms, keep: Uint8Array): void {
  const last = chain.length - 1;
  if (last < 1) return;
  keep[chain[0]!] = 1;
  keep[chain[last]!] = 1;
  for (let i = 1; i < last; i++) {
    const before = atoms.byPair.get(chain[i - 1]!, chain[i]!);
    const after = atoms.byPair.get(chain[i]!, chain[i + 1]!);
    if (before < 0 || after < 0 || before === after) keep[chain[i]!] = 1;
  }
}

function traceStroke(index: number, chain: readonly number[], xs: readonly number[], ys: readonly number[], atoms: Atoms, assembled: Assembled): TracedStroke {
  const { graph, atomEdge, atomPos, atomForward } = assembled;
  const pieces: TracedPiece[] = [];
  let length = 0;
  let offPoints: Point[] = [];
  let offLength = 0;
  let run: { edge: number; forward: boolean; first: number; next: number } | null = null;

  const closeRun = (): void => {
    if (run === null) return;
    const last = graph.edges[run.edge]!.points.length - 2;
    const whole = run.forward ? run.first === 0 && run.next === last + 1 : run.first === last && run.next === -1;
    if (!whole) throw new Error('graph/traceRoute: a stroke covers part of an edge; noding should have split it');
    pieces.push({ offLine: false, edge: run.edge, forward: run.forward });
    length += graph.edges[run.edge]!.length;
    run = null;
  };
  const closeOff = (): void => {
    if (offPoints.length === 0) return;
    pieces.push({ offLine: true, points: offPoints, length: offLength });
    length += offLength;
    offPoints = [];
    offLength = 0;
  };

  for (let i = 1; i < chain.length; i++) {
    const p = chain[i - 1]!;
    const q = chain[i]!;
    const a = atoms.byPair.get(p, q);
    if (a < 0) {
      closeRun();
      if (offPoints.length === 0) offPoints.push([xs[p]!, ys[p]!]);
      offPoints.push([xs[q]!, ys[q]!]);
      offLength += Math.hypot(xs[q]! - xs[p]!, ys[q]! - ys[p]!);
      continue;
    }
    closeOff();
    const edge = atomEdge[a]!;
    const pos = atomPos[a]!;
    const forward = (atoms.u[a] === p) === (atomForward[a] === 1);
    if (run !== null && run.edge === edge && run.forward === forward && run.next === pos) {
      run.next += forward ? 1 : -1;
    } else {
      closeRun();
      run = { edge, forward, first: pos, next: pos + (forward ? 1 : -1) };
    }
  }
  closeRun();
  closeOff();
  const s = chain[0]!;
  const e = chain[chain.length - 1]!;
  return { index, pieces, start: [xs[s]!, ys[s]!], end: [xs[e]!, ys[e]!], length };
}
