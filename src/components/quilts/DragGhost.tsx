import type { DesignListItem } from '@shared/contract/designs.ts';
import type { Quilt } from '@shared/quilt/quilt.schema.ts';
import type { CarriedBlock, ScreenPoint } from './blockGesture.ts';
import { thumbnailSrc } from './DesignTray.tsx';

/** The picture that follows the pointer while a design or block is dragged (it takes no pointer events). */
export function DragGhost({ carried, at, quilt, designs }: { carried: CarriedBlock; at: ScreenPoint; quilt: Quilt; designs: ReadonlyMap<string, DesignListItem> }) {
  const designId = carried.kind === 'design' ? carried.designId : quilt.placements[carried.cell.row]?.[carried.cell.column]?.designId;
  const d = designId ? designs.get(designId) : undefined;
  return (
    <div aria-hidden="true" data-testid="drag-ghost" className="pointer-events-none fixed z-50 h-16 w-16 rounded border-2 border-denim-600 bg-white opacity-80 shadow" style={{ left: at.x - 32, top: at.y - 32 }}>
      {d?.thumbnailSvg ? <img src={thumbnailSrc(d.thumbnailSvg)} alt="" className="h-full w-full" /> : null}
    </div>
  );
}
