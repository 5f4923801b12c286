import type { PointerEvent as ReactPointerEvent, ReactNode } from 'react';
import type { DesignListItem } from '@shared/contract/designs.ts';
import type { Units } from '@shared/design/design.schema.ts';
import type { Cell, Quilt } from '@shared/quilt/quilt.schema.ts';
import { blockRect, finishedSize } from '@shared/quilt/finishedSize.ts';
import { formatQuiltLength } from '@shared/quilt/formatLength.ts';
import type { BlockGesture } from './blockGesture.ts';
import { thumbnailSrc } from './DesignTray.tsx';

export interface QuiltMapProps {
  readonly quilt: Quilt;
  readonly viewerUnits: Units;
  readonly designs: ReadonlyMap<string, DesignListItem>;
  readonly picked: Cell;
  readonly gesture: BlockGesture;
  /** Each filled cell's place in the quilting order, from 1, keyed `row-column`. */
  readonly orderNumbers: ReadonlyMap<string, number>;
  readonly onCellClick: (cell: Cell) => void;
  readonly onCellPointerDown: (cell: Cell, event: ReactPointerEvent) => void;
  /** Drawn over the blocks (the chained route), in the quilt's own coordinates. */
  readonly overlay?: ReactNode;
}

const pct = (v: number, of: number) => `${(100 * v) / of}%`;
export const cellKey = (c: Cell): string => `${c.row}-${c.column}`;

/**
 * The quilt map: blocks at their finished places (blockRect), each a button with the placed design's picture turned
 * and mirrored as it sits (mirror first, then the turn, as cornerMap.ts defines), its number in the quilting order,
 * borders drawn as nested frames. A cell under a drag, or waiting for a held design, is outlined.
 */
export function QuiltMap({ quilt, viewerUnits, designs, picked, gesture, orderNumbers, onCellClick, onCellPointerDown, overlay }: QuiltMapProps) {
  const size = finishedSize(quilt);
  const over = gesture.kind === 'dragging' ? gesture.over : null;
  const holding = gesture.kind === 'holding';
  let inset = 0;
  const frames = quilt.borders.map((w, i) => {
    const at = inset;
    inset += w;
    return { i, at, width: w };
  });
  return (
    <div
      data-print-keep
      className="relative mx-auto w-full max-w-2xl border border-indigo-ink bg-muslin-200"
      style={{ aspectRatio: `${size.width} / ${size.height}` }}
      data-testid="quilt-map"
    >
      {frames.map((f) => (
        <div
          key={f.i}
          aria-hidden="true"
          data-border={f.i + 1}
          className={`absolute border-dashed border-denim-500 ${f.i % 2 === 0 ? 'bg-muslin-200' : 'bg-muslin-100'}`}
          style={{ left: pct(f.at, size.width), top: pct(f.at, size.height), right: pct(f.at, size.width), bottom: pct(f.at, size.height), borderWidth: 1 }}
        />
      ))}
      {frames.length > 0 && (
        <span className="sr-only">
          {frames.length === 1 ? 'One border' : `${frames.length} borders`}, innermost first: {quilt.borders.map((w) => formatQuiltLength(w, quilt.units, viewerUnits)).join(', ')}.
        </span>
      )}
      {quilt.placements.flatMap((cells, row) =>
        cells.map((p, column) => {
          const cell = { row, column };
          const r = blockRect(quilt, cell);
          const d = p ? designs.get(p.designId) : undefined;
          const isPicked = picked.row === row && picked.column === column;
          const isOver = over !== null && over.row === row && over.column === column;
          const n = orderNumbers.get(cellKey(cell));
          const name = `Row ${row + 1}, column ${column + 1}: ${p ? `${d?.title ?? 'a design'}${p.rotation ? `, turned ${p.rotation}°` : ''}${p.mirror ? ', mirrored' : ''}` : 'empty'}`;
          const ring = isOver ? 'z-10 outline outline-4 outline-ochre-500' : isPicked ? 'z-10 outline outline-4 outline-denim-600' : holding ? 'outline outline-2 outline-dashed outline-denim-500' : 'outline outline-1 outline-muslin-300';
          return (
            <button
              key={cellKey(cell)}
              type="button"
              aria-label={n ? `${name}; number ${n} in the quilting order` : name}
              aria-pressed={isPicked}
              data-cell={cellKey(cell)}
              onClick={() => onCellClick(cell)}
              onPointerDown={p ? (e) => onCellPointerDown(cell, e) : undefined}
              className={`absolute select-none overflow-hidden bg-white ${ring}`}
              style={{ left: pct(r.x, size.width), top: pct(r.y, size.height), width: pct(r.width, size.width), height: pct(r.height, size.height) }}
            >
              {p && d?.thumbnailSvg ? (
                <img
                  src={thumbnailSrc(d.thumbnailSvg)}
                  alt=""
                  draggable={false}
                  data-rotation={p.rotation}
                  data-mirror={p.mirror}
                  className="h-full w-full"
                  style={{ transform: `rotate(${p.rotation}deg)${p.mirror ? ' scaleX(-1)' : ''}` }}
                />
              ) : (
                <span className="text-sm text-denim-700">{p ? (d?.title ?? 'Design') : 'Empty'}</span>
              )}
              {n !== undefined && (
                <span aria-hidden="true" data-order={n} className="absolute left-1 top-1 min-w-6 rounded-full bg-indigo-ink px-1.5 text-center text-sm font-bold leading-6 text-white">
                  {n}
                </span>
              )}
            </button>
          );
        }),
      )}
      {overlay}
    </div>
  );
}
