import type { Design } from '../design/design.schema.ts';
import type { Polyline } from '../geometry/point.ts';
import { err, ok, type Result } from '../result.ts';
import { addChain, createAtoms, type Atoms } from './assemble.ts';
import { MAX_CONTACTS, type DesignProblem } from './designProblem.ts';
import { nodePolylines, type NodedLines } from './noding.ts';
import type { LineKind } from './planarGraph.types.ts';

/** A design line handed to the noder: quilting lines, seams and (with edge travel) the block outline. */
interface DesignLine {
  readonly points: Polyline;
  readonly kind: LineKind;
  /** Index into design.lines / design.seams; -1 for the outline. */
  readonly source: number;
}

/** Everything the graph needs before bends are joined: noded lines, atoms and vertices that must stay. */
export interface PreparedGraph {
  readonly noded: NodedLines;
  readonly atoms: Atoms;
  readonly keep: Uint8Array;
  /** Vertex chains of the extra strokes (e.g. a quilter's route), in the order given. */
  readonly strokeChains: readonly (readonly number[])[];
}

/** The block outline as one closed polyline, clockwise on screen from the top-left corner. */
export function blockOutline(design: Pick<Design, 'width' | 'height'>): Polyline {
  const { width: w, height: h } = design;
  return [[0, 0], [w, 0], [w, h], [0, h], [0, 0]];
}

/**
 * Nodes the design's lines together with `strokes` (which split design lines where they meet them but
 * add no pieces of their own). The optional `start`/`end` points split any line they lie on (within the
 * tolerance) and stay vertices, so the planner can begin or end there. Design lines are snapped before
 * strokes, so strokes never move a design vertex. Assumes `checkDesign` passed.
 */
export function prepareGraph(design: Design, strokes: readonly Polyline[], tolerance: number): Result<PreparedGraph, DesignProblem> {
  const lines: DesignLine[] = [
    ...design.lines.map((points, source) => ({ points, kind: 'quilting' as const, source })),
    ...design.seams.map((points, source) => ({ points, kind: 'seam' as const, source })),
  ];
  if (design.edgeTravel) lines.push({ points: blockOutline(design), kind: 'edge', source: -1 });
  const markers: Polyline[] = [design.start, design.end].flatMap((p) => (p === undefined ? [] : [[p]]));
  const all = [...lines.map((l) => l.points), ...markers, ...strokes];
  const noded = nodePolylines(all, tolerance, MAX_CONTACTS);
  if (!noded.ok) {
    return err({ kind: 'too-many-crossings', message: `the lines meet in more than ${noded.error.cap} places`, cap: noded.error.cap });
  }
  const { chains, xs } = noded.value;
  const atoms = createAtoms(xs.length + chains.length);
  const keep = new Uint8Array(xs.length);
  lines.forEach((line, i) => {
    const chain = chains[i]!;
    addChain(atoms, chain, line.kind, line.source);
    keep[chain[0]!] = 1;
    keep[chain[chain.length - 1]!] = 1;
  });
  for (let m = 0; m < markers.length; m++) keep[chains[lines.length + m]![0]!] = 1;
  return ok({ noded: noded.value, atoms, keep, strokeChains: chains.slice(lines.length + markers.length) });
}
