import { PlanDownload } from '../print/PlanDownload.tsx';
import { SaveIndicator } from './SaveIndicator.tsx';
import type { SaveStatus } from './saveStatus.ts';

export interface WorkbenchHeaderProps {
  readonly designId: string;
  readonly title: string;
  readonly onTitle: (title: string) => void;
  /** The block's finished size in the viewer's units, e.g. "12 × 12 in". */
  readonly sizeText: string;
  readonly status: SaveStatus;
  readonly onSaveNow: () => void;
  readonly onResolve: (choice: 'reload' | 'keep-mine') => void;
  readonly showKeys: boolean;
  readonly onToggleKeys: () => void;
}

/** The workbench's top line: back link, editable title, block size, save state, the printable plan and SVG downloads and the key list. */
export function WorkbenchHeader({ designId, title, onTitle, sizeText, status, onSaveNow, onResolve, showKeys, onToggleKeys }: WorkbenchHeaderProps) {
  return (
    <header className="flex flex-wrap items-center gap-3">
      <a href="/designs" className="text-denim-600 underline">My designs</a>
      <label className="flex min-w-0 max-w-full items-center gap-2">
        <span className="sr-only">Design title</span>
        {/* As wide as the title (size in characters), never wider than the row: long titles are not cut at 20 characters. */}
        <input value={title} onChange={(e) => onTitle(e.target.value)} size={Math.min(Math.max(title.length + 1, 8), 70)} className="min-w-0 max-w-full rounded border border-transparent bg-transparent px-1 text-2xl font-bold hover:border-muslin-300 focus:border-denim-500" maxLength={200} />
      </label>
      <span className="text-denim-700">{sizeText}</span>
      <SaveIndicator status={status} onSaveNow={onSaveNow} onResolve={onResolve} />
      <span className="ml-auto flex flex-wrap gap-2">
        <PlanDownload href={`/api/designs/${designId}/plan.pdf`} />
        <a href={`/api/designs/${designId}/export.svg`} download className="rounded border border-denim-600 px-3 py-1 text-sm">Download SVG</a>
        <button type="button" onClick={onToggleKeys} aria-expanded={showKeys} className="rounded border border-denim-600 px-3 py-1 text-sm">Keys</button>
      </span>
    </header>
  );
}
