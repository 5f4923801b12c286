import { formatDate } from '@shared/format/dates.ts';
import { useCallback, useEffect, useState } from 'react';
import { z } from 'zod';
import { apiRequest } from '../designs/apiClient.ts';
import type { DesignRecord } from '@shared/contract/designs.ts';
import { parseDesignRecord } from '../designs/designsApi.ts';

const versionListSchema = z.object({
  current: z.number(),
  versions: z.array(z.object({ version: z.number(), title: z.string(), savedAt: z.string(), lines: z.number(), seams: z.number() })),
});
type VersionList = z.infer<typeof versionListSchema>;

export interface SavedVersionsPanelProps {
  readonly designId: string;
  /** The version this page is based on; the list reloads when it changes. */
  readonly baseVersion: number;
  /** Going back is offered only when every edit is saved. */
  readonly canGoBack: boolean;
  /** The server's answer to a restore: the document is replaced with it. */
  readonly onRestored: (record: DesignRecord) => void;
  /** 409: the design moved on; the save indicator's conflict choice takes over. */
  readonly onConflict: (server: DesignRecord | null) => void;
}

/** Saved versions of the design, newest first; going back saves that version again as the newest. */
export function SavedVersionsPanel({ designId, baseVersion, canGoBack, onRestored, onConflict }: SavedVersionsPanelProps) {
  const [open, setOpen] = useState(false);
  const [list, setList] = useState<VersionList | null>(null);
  const [message, setMessage] = useState<string | null>(null);
  const [busy, setBusy] = useState(false);

  const reload = useCallback(async () => {
    const res = await apiRequest('GET', `/api/designs/${designId}/versions`);
    const parsed = res.ok ? versionListSchema.safeParse(res.value) : null;
    if (parsed?.success) {
      setList(parsed.data);
    } else {
      setMessage(res.ok ? 'The saved versions could not be read.' : res.error.message);
    }
  }, [designId]);

  useEffect(() => {
    if (open) void reload();
  }, [open, baseVersion, reload]);

  async function goBack(version: number) {
    setBusy(true);
    setMessage(null);
    const res = await apiRequest('POST', `/api/designs/${designId}/versions/${version}/restore`, { baseVersion });
    setBusy(false);
    if (res.ok) {
      const record = parseDesignRecord(res.value);
      if (record) {
        onRestored(record);
        setMessage(`Went back to version ${version}; it is saved as version ${record.version}.`);
      } else setMessage('The restored design could not be read. Reload the page.');
      return;
    }
    if (res.error.kind === 'http' && res.error.status === 409) {
      onConflict(parseDesignRecord(res.error.body));
      setMessage('Saved elsewhere in the meantime: choose which copy to keep');
      return;
    }
    setMessage(res.error.message);
  }

  return (
    <details className="rounded border border-muslin-300 bg-white p-3 text-sm" onToggle={(e) => setOpen(e.currentTarget.open)}>
      <summary className="cursor-pointer font-semibold">Saved versions</summary>
      {message && <p role="status" className="mt-1">{message}</p>}
      {!canGoBack && <p className="mt-1 text-xs text-denim-700">Going back is possible once every edit is saved.</p>}
      {list === null ? (
        open && !message && <p className="mt-1">Reading saved versions…</p>
      ) : (
        <ol className="mt-2 flex flex-col gap-2" aria-label="Saved versions, newest first">
          {list.versions.map((v) => (
            <li key={v.version} className="border-b border-muslin-100 pb-1" data-version={v.version}>
              <div className="flex justify-between gap-2">
                <span className="font-semibold">Version {v.version}{v.version === list.current ? ' (current)' : ''}</span>
                <time dateTime={v.savedAt} className="text-denim-700">{formatDate(v.savedAt, 'day-time')}</time>
              </div>
              <p>{v.lines} quilting line{v.lines === 1 ? '' : 's'}, {v.seams} seam{v.seams === 1 ? '' : 's'}</p>
              {v.version !== list.current && (
                <button type="button" disabled={!canGoBack || busy} onClick={() => void goBack(v.version)} aria-label={`Go back to version ${v.version}`} className="mt-0.5 rounded border border-denim-600 px-2 py-0.5 disabled:opacity-40">
                  Go back to this version
                </button>
              )}
            </li>
          ))}
        </ol>
      )}
    </details>
  );
}
