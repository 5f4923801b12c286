import { z } from 'zod';
import { designRecordSchema, type DesignList, type DesignRecord, type DesignSort } from '@shared/contract/designs.ts';

/** How long to wait before asking again for figures or thumbnails still being made; null when none are. */
export function pendingRefreshDelayMs(list: DesignList, round: number): number | null {
  if (!list.designs.some((d) => d.summaryPending || d.thumbnailSvg === null)) return null;
  if (round >= 20) return null; // ~2 minutes: the next visit asks again
  return Math.min(10_000, 1_500 * 1.25 ** round);
}

/** The query string of the list request. */
export function designListPath(q: { sort: DesignSort; dir: 'asc' | 'desc'; q: string; page: number }): string {
  const p = new URLSearchParams({ sort: q.sort, dir: q.dir, page: String(q.page) });
  if (q.q.trim()) p.set('q', q.q.trim());
  return `/api/designs?${p.toString()}`;
}

/** The id of a design in a create or duplicate answer (`{ design: { id } }`), or null when it is not there. */
export function createdDesignId(body: unknown): string | null {
  const parsed = z.object({ design: z.object({ id: z.string() }) }).safeParse(body);
  return parsed.success ? parsed.data.design.id : null;
}

/** Reads `{ design: record }` from a read, update or 409 answer; null when the shape does not match. */
export function parseDesignRecord(body: unknown): DesignRecord | null {
  const parsed = z.object({ design: designRecordSchema }).safeParse(body);
  return parsed.success ? parsed.data.design : null;
}
