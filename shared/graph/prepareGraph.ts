import type { Design } from '../design/design.schema.ts';
import type { Polyline } from '../geometry/point.ts';
import { err, ok, type Result } from '../result.ts';
import { addChain, createAtoms, type Atoms } from './assemble.ts';
import { MAX_CONTACTS, type DesignProblem } from './designProblem.ts';
import { nodePolylines, type NodedLines } from './noding.ts';
import { nodeStrokes } from './nodeStrokes.ts';
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
 * Nodes the design's lines, then lays `strokes` onto them (`nodeStrokes`: strokes cut design lines at new
 * vertices only and add no pieces of their own). The optional `start`/`end` points split any line they lie on
 * (within the tolerance) and stay vertices, so the planner can begin or end there. The design part is noded
 * exactly as without strokes, so strokes never move or add a design vertex. Assumes `checkDesign` passed.
 */
export function prepareGraph(design: Design, strokes: readonly Polyline[], tolerance: number): Result<PreparedGraph, DesignProblem> {
  const lines: DesignLine[] = [
    ...design.lines.map((points, source) => ({ points, kind: 'quilting' as const, source })),
    ...design.seams.map((points, source) => ({ points, kind: 'seam' as const, source })),
  ];
  if (design.edgeTravel) lines.push({ points: blockOutline(design), kind: 'edge', source: -1 });
  const markers: Polyline[] = [design.start, design.end].flatMap((p) => (p === undefined ? [] : [[p]]));
  const noded = nodePolylines([...lines.map((l) => l.points), ...markers], tolerance, MAX_CONTACTS);
  if (!noded.ok) return err(tooMany(noded.error.cap));
  let chains = noded.value.chains;
  let atoms = atomsOf(lines, chains, noded.value.xs.length);
  let strokeChains: readonly (readonly number[])[] = [];
  if (strokes.length > 0) {
    // Strokes never re-node the design: its vertices and atoms stay those of buildPlanarGraph (see nodeStrokes).
    const laid = nodeStrokes(noded.value, atoms, strokes, tolerance, MAX_CONTACTS, (cut) => atomsOf(lines, cut, noded.value.xs.length));
    if (!laid.ok) return err(tooMany(laid.error.cap));
    ({ lineChains: chains, atoms, strokeChains } = laid.value);
  }
  const keep = new Uint8Array(noded.value.xs.length);
  lines.forEach((_, i) => {
    const chain = chains[i]!;
    keep[chain[0]!] = 1;
    keep[chain[chain.length - 1]!] = 1;
  });
  for (let m = 0; m < markers.length; m++) keep[chains[lines.length + m]![0]!] = 1;
  return ok({ noded: noded.value, atoms, keep, strokeChains });
}

function atomsOf(lines: readonly DesignLine[], chains: readonly (readonly number[])[], vertices: number): Atoms {
  const atoms = createAtoms(vertices + chains.length);
  lines.forEach((line, i) => addChain(atoms, chains[i]!, line.kind, line.source));
  return atoms;
}

function tooMany(cap: number): DesignProblem {
  return { kind: 'too-many-crossings', message: `the lines meet in more than ${cap} places`, cap };
}
