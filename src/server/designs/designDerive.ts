// Figures for the designs table, computed after a save instead of during it: a save stores the drawing and
// returns at once; this queue then plans the design in the engine pool's background lane (behind every check
// and plan, fairly between accounts) and writes the figures if the design is still at that version. It also
// rebuilds list thumbnails written before thumbnails had a point budget (in the codec pool). The designs list
// asks again for rows still pending (e.g. after a server restart), so figures always appear eventually.
// In memory only: nothing here must survive a restart.
import type { DesignRow } from '@db/schema.ts';
import { db } from '../db.ts';
import { isDatabaseUnavailable } from '../dbOutage.ts';
import { runCodec, runEngine } from '../engine/enginePool.ts';
import { findDesignText, setDesignSummary, setDesignThumbnail } from './design.repository.ts';

/** What a design still needs: its figures, its list thumbnail, or both. */
export interface DeriveNeeds {
  readonly summary: boolean;
  readonly thumbnail: boolean;
}

interface Pending extends DeriveNeeds {
  readonly id: string;
  readonly ownerId: string;
  readonly version: number;
  readonly attempt: number;
}

/** By design id; a newer version replaces an older request. */
const pending = new Map<string, Pending>();
/** Accounts with a job in the pool now: one at a time each, so a busy account cannot fill the background lane. */
const working = new Set<string>();
/** Requests beyond this are dropped (the designs list asks again). */
const MAX_PENDING = 5_000;
/** Busy pool or database down: try again after 1, 2, 4 … 60 s, at most this many times. */
const MAX_ATTEMPTS = 10;

export function requestDesignDerive(row: Pick<DesignRow, 'id' | 'owner_id' | 'version'>, needs: DeriveNeeds = { summary: true, thumbnail: false }): void {
  if (!needs.summary && !needs.thumbnail) return;
  const known = pending.get(row.id);
  if (known && known.version > row.version) return;
  if (known && known.version === row.version && (known.summary || !needs.summary) && (known.thumbnail || !needs.thumbnail)) return;
  if (!known && pending.size >= MAX_PENDING) return;
  const merged = known?.version === row.version ? { summary: known.summary || needs.summary, thumbnail: known.thumbnail || needs.thumbnail } : needs;
  pending.set(row.id, { id: row.id, ownerId: row.owner_id, version: row.version, attempt: 0, ...merged });
  pump();
}

/** How many designs wait for figures (for logs and tests). */
export function pendingDerives(): number {
  return pending.size + working.size;
}

function pump(): void {
  for (const p of [...pending.values()]) {
    if (working.has(p.ownerId)) continue;
    pending.delete(p.id);
    working.add(p.ownerId);
    void derive(p).finally(() => {
      working.delete(p.ownerId);
      pump();
    });
  }
}

async function derive(p: Pending): Promise<void> {
  try {
    const stored = await findDesignText(db, p.id, p.version);
    if (!stored) return; // saved again or deleted meanwhile: a newer request covers it
    let left: Pending = p;
    if (p.thumbnail) {
      const r = await runCodec({ op: 'acceptStored', text: stored.data_json, thumbnail: true }, p.ownerId);
      if (r.ok && r.value.thumbnailSvg !== null) await setDesignThumbnail(db, p.id, p.version, r.value.thumbnailSvg);
      else if (!r.ok && r.error.kind !== 'failed' && r.error.kind !== 'timeout') return retryLater(p);
      else console.error(`[figures] thumbnail of design ${p.id} v${p.version} failed`, r.ok ? '' : r.error);
      left = { ...p, thumbnail: false };
    }
    if (!p.summary) return;
    const r = await runEngine({ op: 'summary', designText: stored.data_json }, { key: p.ownerId, lane: 'background' });
    if (r.ok) {
      await setDesignSummary(db, p.id, p.version, r.value.ok ? r.value.value : null);
      return;
    }
    switch (r.error.kind) {
      case 'timeout': // too dense to plan within the cap: no figures, as for a design the planner refuses
        await setDesignSummary(db, p.id, p.version, null);
        return;
      case 'failed':
        console.error(`[figures] design ${p.id} v${p.version}:`, r.error.message);
        await setDesignSummary(db, p.id, p.version, null);
        return;
      default: // busy, account-busy, queue-timeout, cancelled, closed
        retryLater(left);
    }
  } catch (error) {
    if (isDatabaseUnavailable(error)) retryLater(p);
    else console.error(`[figures] design ${p.id} v${p.version}:`, error);
  }
}

function retryLater(p: Pending): void {
  if (p.attempt + 1 >= MAX_ATTEMPTS) return; // the designs list asks again when it shows the design
  const delay = Math.min(60_000, 1_000 * 2 ** p.attempt);
  setTimeout(() => {
    const known = pending.get(p.id);
    if (!known) pending.set(p.id, { ...p, attempt: p.attempt + 1 });
    else if (known.version === p.version) pending.set(p.id, { ...known, summary: known.summary || p.summary, thumbnail: known.thumbnail || p.thumbnail });
    pump();
  }, delay).unref();
}
