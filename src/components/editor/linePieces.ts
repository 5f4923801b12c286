import type { Design } from '@shared/design/design.schema.ts';
import { buildPlanarGraph } from '@shared/graph/planarGraph.ts';
import { findPieces } from '@shared/graph/pieces.ts';

/** Above this many quilting lines the canvas draws lines in one colour: colouring pieces is a view nicety, not worth a stall. */
export const MAX_LINES_FOR_PIECE_COLOURS = 3000;

/**
 * The piece number of each quilting line (index into `design.lines`), from the engine's planar graph,
 * so the canvas can colour pieces apart. Null when the graph cannot be built or the design is too large.
 * A line whose pieces merge elsewhere takes the piece of its first edge (all its edges share one piece:
 * a line is connected).
 */
export function findLinePieces(design: Design): number[] | null {
  if (design.lines.length === 0 || design.lines.length > MAX_LINES_FOR_PIECE_COLOURS) return null;
  const graph = buildPlanarGraph(design);
  if (!graph.ok) return null;
  const pieceOfEdge = new Map<number, number>();
  findPieces(graph.value).forEach((piece, i) => piece.edges.forEach((e) => pieceOfEdge.set(e, i)));
  const out = new Array<number>(design.lines.length).fill(-1);
  for (const e of graph.value.edges) {
    if (e.kind !== 'quilting' || e.source < 0) continue;
    const p = pieceOfEdge.get(e.id);
    if (p !== undefined && out[e.source] === -1) out[e.source] = p;
  }
  return out;
}
