import type { Design } from '../design/design.schema.ts';
import { ok, type Result } from '../result.ts';
import { assembleGraph } from './assemble.ts';
import { checkDesign, type DesignProblem } from './designProblem.ts';
import type { PlanarGraph } from './planarGraph.types.ts';
import { prepareGraph } from './prepareGraph.ts';
import { snapToleranceOf } from './tolerance.ts';

export interface PlanarGraphOptions {
  /** Snapping tolerance in design units; default `snapToleranceOf(design.units)` (1e-4 in). */
  readonly tolerance?: number;
}

/**
 * Nodes a design into a planar multigraph (design units throughout):
 * - quilting lines (`design.lines`, kind `quilting`), seams (`design.seams`, kind `seam`) and, when
 *   `design.edgeTravel`, the block outline (kind `edge`, source -1) are split at every crossing,
 *   T-junction and touching point; a line ending within the tolerance of another line or the outline joins it;
 * - points closer than the tolerance are one vertex; zero-length pieces are dropped;
 * - collinear overlaps are merged into one edge of the highest kind (quilting > seam > edge);
 * - vertices sit only at line ends, junctions (degree ≠ 2), changes of kind or source line, and the
 *   design's `start`/`end` points where they lie on a line; other polyline bends stay inside edges.
 *   No self-loops: a closed line becomes two parallel edges.
 * Bad input gives a `DesignProblem` (see `checkDesign`), never a throw.
 */
export function buildPlanarGraph(design: Design, options: PlanarGraphOptions = {}): Result<PlanarGraph, DesignProblem> {
  const checked = checkDesign(design, false);
  if (!checked.ok) return checked;
  const prepared = prepareGraph(design, [], options.tolerance ?? snapToleranceOf(design.units));
  if (!prepared.ok) return prepared;
  const { noded, atoms, keep } = prepared.value;
  return ok(assembleGraph(noded.xs, noded.ys, atoms, keep).graph);
}
