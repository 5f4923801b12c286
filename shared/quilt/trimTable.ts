import { formatLength } from './formatLength.ts';
import { SIDES, type BlockPosition, type Side, type TrimPlan } from './trim.ts';

/** One printed row of the trim plan, in quilting words and the quilt's units. */
export interface TrimTableRow {
  /** "Row 1, column 2". */
  readonly block: string;
  readonly position: BlockPosition;
  /** Size to make the piece before quilting, e.g. "17 1/2 × 17 1/2 in". */
  readonly makeAt: string;
  /** Size once trimmed. */
  readonly cutTo: string;
  /** Per side: where to cut, from the block's centre, and about how much comes off. */
  readonly sides: Readonly<Record<Side, string>>;
}

/** The trim plan as table rows, reading order (row by row from the top left). */
export function buildTrimTable(plan: TrimPlan): TrimTableRow[] {
  const f = (v: number): string => formatLength(v, plan.units);
  const size = (w: number, h: number): string => `${f(w).replace(/ (in|cm)$/, '')} × ${f(h)}`;
  return plan.blocks.map((b) => {
    const sides = {} as Record<Side, string>;
    for (const side of SIDES) {
      const s = b.sides.find((t) => t.side === side)!;
      sides[side] = `cut ${f(s.cutFromCentre)} from the centre (${s.faces === 'outer' ? 'border and binding' : 'joining seam'}), about ${f(s.trim)} off`;
    }
    return {
      block: `Row ${b.cell.row + 1}, column ${b.cell.column + 1}`,
      position: b.position,
      makeAt: size(b.before.width, b.before.height),
      cutTo: size(b.cut.width, b.cut.height),
      sides,
    };
  });
}
