import { useCallback, useEffect, useRef, useState } from 'react';
import { apiRequest } from './apiClient.ts';
import { designListSchema, type DesignList, type DesignListItem, type DesignSort } from '@shared/contract/designs.ts';
import { designListPath, pendingRefreshDelayMs } from './designsApi.ts';
import type { Units } from '@shared/design/design.schema.ts';
import { formatLength, formatSize, formatThread } from '@shared/units/units.ts';
import { formatEdited } from './formatFigures.ts';

type Load = { readonly state: 'loading' } | { readonly state: 'ready'; readonly list: DesignList } | { readonly state: 'failed'; readonly message: string };

interface Columns {
  readonly key: DesignSort | null;
  readonly label: string;
}
const COLUMNS: readonly Columns[] = [
  { key: null, label: 'Drawing' },
  { key: 'title', label: 'Title' },
  { key: null, label: 'Size' },
  { key: 'passes', label: 'Passes' },
  { key: 'stops', label: 'Stops' },
  { key: 'travel', label: 'Travel' },
  { key: 'thread', label: 'Thread' },
  { key: 'updated', label: 'Last edited' },
];

/**
 * The quilter's designs: sortable, searchable, paged; duplicate and delete (with undo); every figure in the viewer's
 * units. A table from tablet width up, cards on phones (a table of nine columns does not fit 390 px).
 */
function Thumbnail({ svg, size }: { svg: string | null; size: number }) {
  return svg === null ? (
    <span className="block shrink-0 rounded border border-muslin-200 bg-muslin-100" style={{ width: size, height: size }} title="The drawing's picture is being made" />
  ) : (
    <img src={`data:image/svg+xml;charset=utf-8,${encodeURIComponent(svg)}`} alt="" width={size} height={size} className="shrink-0 rounded border border-muslin-200 bg-white" />
  );
}

export function DesignTable({ viewerUnits }: { viewerUnits: Units }) {
  const [sort, setSort] = useState<DesignSort>('updated');
  const [dir, setDir] = useState<'asc' | 'desc'>('desc');
  const [query, setQuery] = useState('');
  const [page, setPage] = useState(1);
  const [load, setLoad] = useState<Load>({ state: 'loading' });
  const [deleted, setDeleted] = useState<DesignListItem | null>(null);
  const [notice, setNotice] = useState('');

  const refresh = useCallback(async () => {
    const res = await apiRequest('GET', designListPath({ sort, dir, q: query, page }));
    if (!res.ok) return setLoad({ state: 'failed', message: res.error.message });
    const parsed = designListSchema.safeParse(res.value);
    setLoad(parsed.success ? { state: 'ready', list: parsed.data } : { state: 'failed', message: 'The design list came back in a shape this page does not read.' });
  }, [sort, dir, query, page]);

  const pendingRounds = useRef(0);
  useEffect(() => {
    pendingRounds.current = 0;
    const t = setTimeout(() => void refresh(), query ? 250 : 0);
    return () => clearTimeout(t);
  }, [refresh, query]);

  // Figures are worked out after a save: while some are on the way, ask again now and then.
  useEffect(() => {
    if (load.state !== 'ready') return;
    const delay = pendingRefreshDelayMs(load.list, pendingRounds.current);
    if (delay === null) return;
    const t = setTimeout(() => {
      pendingRounds.current += 1;
      void refresh();
    }, delay);
    return () => clearTimeout(t);
  }, [load, refresh]);

  function sortBy(key: DesignSort) {
    if (key === sort) setDir(dir === 'asc' ? 'desc' : 'asc');
    else {
      setSort(key);
      setDir(key === 'updated' ? 'desc' : 'asc');
    }
    setPage(1);
  }

  async function duplicate(d: DesignListItem) {
    const res = await apiRequest('POST', `/api/designs/${d.id}/duplicate`);
    setNotice(res.ok ? `Made a copy of “${d.title}”.` : res.error.message);
    await refresh();
  }

  async function remove(d: DesignListItem) {
    const res = await apiRequest('DELETE', `/api/designs/${d.id}`);
    if (!res.ok) return setNotice(res.error.message);
    setDeleted(d);
    setNotice('');
    await refresh();
  }

  async function undoDelete() {
    if (!deleted) return;
    const res = await apiRequest('POST', `/api/designs/${deleted.id}/restore`);
    setNotice(res.ok ? `Brought back “${deleted.title}”.` : res.error.message);
    setDeleted(null);
    await refresh();
  }

  const list = load.state === 'ready' ? load.list : null;
  const pages = list ? Math.max(1, Math.ceil(list.total / list.pageSize)) : 1;
  const now = Date.now();
  return (
    <section className="mt-6" aria-label="My designs">
      <div className="flex flex-wrap items-center gap-3">
        <label className="flex items-center gap-2">
          <span>Search titles</span>
          <input type="search" value={query} onChange={(e) => { setQuery(e.target.value); setPage(1); }} className="rounded border border-muslin-300 bg-white px-3 py-1.5" />
        </label>
        <p role="status" aria-live="polite" className="text-denim-700">
          {deleted ? (
            <>Deleted “{deleted.title}”. <button type="button" onClick={undoDelete} className="font-semibold text-denim-600 underline">Undo</button></>
          ) : notice}
        </p>
      </div>
      {load.state === 'loading' && <p className="mt-6">Loading your designs…</p>}
      {load.state === 'failed' && <p className="mt-6 text-madder-600" role="alert">{load.message} <button type="button" className="underline" onClick={() => void refresh()}>Try again</button></p>}
      {list && list.total === 0 && !query && (
        <div className="mt-8 rounded border-2 border-dashed border-muslin-300 p-8 text-center">
          <p className="text-xl font-semibold">No designs yet.</p>
          <p className="mt-2">Start from a pieced layout — a nine-patch, a star, a log cabin — and draw the quilting lines over it.</p>
          <a href="/designs/new" className="mt-4 inline-block rounded bg-denim-600 px-4 py-2 font-semibold text-white">Start your first design</a>
        </div>
      )}
      {list && list.total === 0 && query && <p className="mt-6">No design titles contain “{query}”.</p>}
      {list && list.designs.length > 0 && (
        <div className="mt-4">
          <div className="md:hidden" data-designs-cards>
            <label className="flex items-center gap-2">
              <span>Sort by</span>
              <select
                value={`${sort}:${dir}`}
                onChange={(e) => {
                  const [key, order] = e.target.value.split(':') as [DesignSort, 'asc' | 'desc'];
                  setSort(key);
                  setDir(order);
                  setPage(1);
                }}
                className="min-h-11 rounded border border-muslin-300 bg-white px-2"
              >
                {COLUMNS.filter((c) => c.key !== null).flatMap((c) => [
                  <option key={`${c.key}:asc`} value={`${c.key}:asc`}>{c.label}{c.key === 'updated' ? ' (oldest first)' : ' (lowest first)'}</option>,
                  <option key={`${c.key}:desc`} value={`${c.key}:desc`}>{c.label}{c.key === 'updated' ? ' (newest first)' : ' (highest first)'}</option>,
                ])}
              </select>
            </label>
            <ul className="mt-3 flex flex-col gap-3">
              {list.designs.map((d) => (
                <li key={d.id} className="flex items-start gap-3 rounded-lg border border-muslin-200 bg-white p-3">
                  <Thumbnail svg={d.thumbnailSvg} size={64} />
                  <div className="min-w-0 flex-1">
                    <a href={`/designs/${d.id}`} className="font-semibold break-words text-denim-600 underline">{d.title}</a>
                    <p className="text-sm text-denim-700">
                      {formatSize(d.width, d.height, d.units, viewerUnits)} ·{' '}
                      {d.summaryPending ? 'figures on the way' : d.summary ? `${d.summary.passes} ${d.summary.passes === 1 ? 'pass' : 'passes'} · ${d.summary.stops} ${d.summary.stops === 1 ? 'stop' : 'stops'}` : 'no route yet'}
                    </p>
                    {d.summary && (
                      <p className="text-sm text-denim-700">
                        Travel {formatLength(d.summary.travelLength, d.units, viewerUnits)} · thread {formatThread(d.summary.thread.totalYards, viewerUnits)}
                      </p>
                    )}
                    <p className="text-sm text-denim-700">Edited <time dateTime={d.updatedAt}>{formatEdited(Date.parse(d.updatedAt), now)}</time></p>
                    <p className="mt-1 flex gap-4">
                      <button type="button" onClick={() => void duplicate(d)} className="min-h-11 underline" aria-label={`Duplicate ${d.title}`}>Duplicate</button>
                      <button type="button" onClick={() => void remove(d)} className="min-h-11 text-madder-600 underline" aria-label={`Delete ${d.title}`}>Delete</button>
                    </p>
                  </div>
                </li>
              ))}
            </ul>
          </div>
          <div className="hidden overflow-x-auto md:block">
          <table className="w-full border-collapse text-left">
            <thead>
              <tr className="border-b-2 border-muslin-300">
                {COLUMNS.map((c) => (
                  <th key={c.label} scope="col" className="px-2 py-2" aria-sort={c.key === sort ? (dir === 'asc' ? 'ascending' : 'descending') : undefined}>
                    {c.key ? (
                      <button type="button" onClick={() => sortBy(c.key!)} className="font-semibold underline-offset-2 hover:underline">
                        {c.label}{c.key === sort ? (dir === 'asc' ? ' ▲' : ' ▼') : ''}
                      </button>
                    ) : c.label}
                  </th>
                ))}
                <th scope="col" className="px-2 py-2"><span className="sr-only">Actions</span></th>
              </tr>
            </thead>
            <tbody>
              {list.designs.map((d) => (
                <tr key={d.id} className="border-b border-muslin-200 align-middle">
                  <td className="px-2 py-2"><Thumbnail svg={d.thumbnailSvg} size={56} /></td>
                  <td className="px-2 py-2"><a href={`/designs/${d.id}`} className="font-semibold text-denim-600 underline">{d.title}</a></td>
                  <td className="px-2 py-2 whitespace-nowrap">{formatSize(d.width, d.height, d.units, viewerUnits)}</td>
                  <td className="px-2 py-2">
                    {d.summaryPending ? <span title="The route engine is working out the figures">…<span className="sr-only">figures on the way</span></span> : (d.summary?.passes ?? '–')}
                  </td>
                  <td className="px-2 py-2">{d.summary?.stops ?? '–'}</td>
                  <td className="px-2 py-2 whitespace-nowrap">{d.summary ? formatLength(d.summary.travelLength, d.units, viewerUnits) : '–'}</td>
                  <td className="px-2 py-2 whitespace-nowrap">{d.summary ? formatThread(d.summary.thread.totalYards, viewerUnits) : '–'}</td>
                  <td className="px-2 py-2 whitespace-nowrap"><time dateTime={d.updatedAt}>{formatEdited(Date.parse(d.updatedAt), now)}</time></td>
                  <td className="px-2 py-2 whitespace-nowrap">
                    <button type="button" onClick={() => void duplicate(d)} className="mr-2 underline" aria-label={`Duplicate ${d.title}`}>Duplicate</button>
                    <button type="button" onClick={() => void remove(d)} className="text-madder-600 underline" aria-label={`Delete ${d.title}`}>Delete</button>
                  </td>
                </tr>
              ))}
            </tbody>
          </table>
          </div>
          {pages > 1 && (
            <nav className="mt-4 flex items-center gap-3" aria-label="Pages">
              <button type="button" disabled={page <= 1} onClick={() => setPage(page - 1)} className="rounded border px-3 py-1 disabled:opacity-50">Previous</button>
              <span>Page {page} of {pages}</span>
              <button type="button" disabled={page >= pages} onClick={() => setPage(page + 1)} className="rounded border px-3 py-1 disabled:opacity-50">Next</button>
            </nav>
          )}
        </div>
      )}
    </section>
  );
}
