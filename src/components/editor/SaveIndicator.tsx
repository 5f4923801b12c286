import { useEffect, useState } from 'react';
import { describeSaveStatus, type SaveStatus } from './saveStatus.ts';

export interface SaveIndicatorProps {
  readonly status: SaveStatus;
  readonly onSaveNow: () => void;
  readonly onResolve: (choice: 'reload' | 'keep-mine') => void;
}

/** Saved / unsaved / retrying, always visible; a conflict offers the two ways out. */
export function SaveIndicator({ status, onSaveNow, onResolve }: SaveIndicatorProps) {
  const [now, setNow] = useState(() => Date.now());
  useEffect(() => {
    if (status.kind !== 'retrying') return;
    const t = setInterval(() => setNow(Date.now()), 500);
    return () => clearInterval(t);
  }, [status]);
  const tone = status.kind === 'saved' ? 'bg-sage-500' : status.kind === 'saving' || status.kind === 'unsaved' ? 'bg-ochre-500' : 'bg-madder-500';
  return (
    <div className="flex flex-wrap items-center gap-2 text-sm" data-save-status={status.kind}>
      <span className={`inline-block h-2.5 w-2.5 rounded-full ${tone}`} aria-hidden="true" />
      <span role="status" aria-live="polite">{describeSaveStatus(status, now)}</span>
      {status.kind === 'retrying' && <button type="button" className="underline" onClick={onSaveNow}>Try now</button>}
      {status.kind === 'conflict' && (
        <span role="alert" className="flex gap-2">
          <button type="button" className="rounded border border-denim-600 px-2 py-0.5" onClick={() => onResolve('reload')}>Load the saved copy</button>
          <button type="button" className="rounded border border-madder-600 px-2 py-0.5" onClick={() => onResolve('keep-mine')}>Keep mine</button>
        </span>
      )}
    </div>
  );
}
