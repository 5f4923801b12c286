import type { PointerEvent as ReactPointerEvent } from 'react';
import type { DesignListItem } from '@shared/contract/designs.ts';
import type { CarriedBlock } from './blockGesture.ts';

export interface DesignTrayProps {
  readonly designs: readonly DesignListItem[];
  /** The design picked to be placed (the keyboard way), if any. */
  readonly heldDesignId: string | null;
  readonly onPick: (carried: CarriedBlock) => void;
  readonly onPointerDown: (carried: CarriedBlock, event: ReactPointerEvent) => void;
}

/** Thumbnails are list SVGs from the server; shown as images so they never run scripts. */
export const thumbnailSrc = (svg: string): string => `data:image/svg+xml;charset=utf-8,${encodeURIComponent(svg)}`;

/**
 * The tray of my designs: drag one onto a cell of the map, or pick it (click, Enter or Space) and then pick a cell.
 * Each entry is a toggle button, pressed while its design is held.
 */
export function DesignTray({ designs, heldDesignId, onPick, onPointerDown }: DesignTrayProps) {
  return (
    <section aria-labelledby="tray-heading" className="rounded border border-muslin-300 bg-muslin-50 p-3">
      <h2 id="tray-heading" className="font-bold">My designs</h2>
      <p className="text-sm">Drag a design onto the map, or pick it and then pick a block on the map.</p>
      {designs.length === 0 ? (
        <p className="mt-2 text-sm">You have no designs yet. Draw a block first, then place it here.</p>
      ) : (
        <ul className="mt-2 flex flex-wrap gap-2" data-testid="design-tray">
          {designs.map((d) => {
            const carried: CarriedBlock = { kind: 'design', designId: d.id };
            const held = heldDesignId === d.id;
            return (
              <li key={d.id}>
                <button
                  type="button"
                  aria-pressed={held}
                  data-design={d.id}
                  onClick={() => onPick(carried)}
                  onPointerDown={(e) => onPointerDown(carried, e)}
                  className={`flex w-28 touch-none select-none flex-col items-center gap-1 rounded border bg-white p-1 text-center text-xs ${held ? 'border-denim-600 outline outline-3 outline-denim-600' : 'border-muslin-300'}`}
                >
                  {d.thumbnailSvg ? <img src={thumbnailSrc(d.thumbnailSvg)} alt="" draggable={false} className="h-16 w-16" /> : <span className="flex h-16 w-16 items-center justify-center bg-muslin-100">No picture</span>}
                  <span className="line-clamp-2 break-words">{d.title}</span>
                </button>
              </li>
            );
          })}
        </ul>
      )}
    </section>
  );
}
