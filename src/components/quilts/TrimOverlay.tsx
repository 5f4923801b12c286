import type { Units } from '@shared/design/design.schema.ts';
import type { Quilt } from '@shared/quilt/quilt.schema.ts';
import { blockRect, finishedSize } from '@shared/quilt/finishedSize.ts';
import { formatQuiltLength } from '@shared/quilt/formatLength.ts';
import { trimBlocksOf } from '@shared/quilt/quiltFigures.ts';
import type { Side } from '@shared/quilt/trim.ts';

const pct = (v: number, of: number) => `${(100 * v) / of}%`;
const POSITION_WORDS = { corner: 'corner block', edge: 'edge block', inner: 'inner block' } as const;
/** Where each side's figure sits inside the block, as CSS. */
const SIDE_PLACE: Record<Side, string> = {
  top: 'left-1/2 top-0.5 -translate-x-1/2',
  right: 'right-0.5 top-1/2 -translate-y-1/2',
  bottom: 'bottom-0.5 left-1/2 -translate-x-1/2',
  left: 'left-0.5 top-1/2 -translate-y-1/2',
};

/**
 * The quilt-as-you-go trim plan drawn on the quilt map: each block's position (corner, edge, inner) and, at each
 * side, about how much comes off; sides that face the border and binding are drawn with a solid rule, sides that
 * face a joining seam with a dashed one. The same figures as the trim table (trim.ts), for the eye; the table
 * stays the full account (cut lines from the centre), so this layer is hidden from screen readers.
 */
export function TrimOverlay({ quilt, viewerUnits }: { readonly quilt: Quilt; readonly viewerUnits: Units }) {
  const size = finishedSize(quilt);
  const blocks = trimBlocksOf(quilt);
  return (
    <div aria-hidden="true" data-testid="trim-overlay" className="pointer-events-none absolute inset-0 z-20">
      {blocks.map((b) => {
        const r = blockRect(quilt, b.cell);
        return (
          <div
            key={`${b.cell.row}-${b.cell.column}`}
            data-trim-cell={`${b.cell.row}-${b.cell.column}`}
            data-position={b.position}
            className="absolute bg-muslin-100/70 text-[0.7rem] font-semibold leading-tight text-indigo-ink"
            style={{ left: pct(r.x, size.width), top: pct(r.y, size.height), width: pct(r.width, size.width), height: pct(r.height, size.height) }}
          >
            {b.sides.map((s) => (
              <span key={s.side} className={`absolute ${SIDE_PLACE[s.side]} rounded bg-white/90 px-0.5`}>
                {formatQuiltLength(s.trim, quilt.units, viewerUnits)}
              </span>
            ))}
            <span className="absolute left-1/2 top-1/2 -translate-x-1/2 -translate-y-1/2 whitespace-nowrap rounded bg-white/90 px-1">{POSITION_WORDS[b.position]}</span>
            {b.sides.map((s) => (
              <span
                key={`rule-${s.side}`}
                data-faces={s.faces}
                className={`absolute border-madder-600 ${s.faces === 'outer' ? 'border-solid' : 'border-dashed'} ${
                  s.side === 'top' ? 'inset-x-0 top-0 border-t-2' : s.side === 'bottom' ? 'inset-x-0 bottom-0 border-b-2' : s.side === 'left' ? 'inset-y-0 left-0 border-l-2' : 'inset-y-0 right-0 border-r-2'
                }`}
              />
            ))}
          </div>
        );
      })}
    </div>
  );
}
