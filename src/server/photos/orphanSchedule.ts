// Runs the orphan-photo sweep (orphanPhotos.ts) in the server process: once when this module is first loaded,
// i.e. on the first request after a start (which is when a crash's leftovers appear), then every hour.
import { db } from '../db.ts';
import { deleteObject, listObjectPages } from '../storage/objectStore.ts';
import { sweepOrphanPhotos, type ObjectStoreAccess, type SweepResult } from './orphanPhotos.ts';

const SWEEP_EVERY_MS = 60 * 60 * 1000;
const STARTED = Symbol.for('threadway.orphanPhotoSchedule');
const g = globalThis as { [STARTED]?: boolean };

export const appObjectStore: ObjectStoreAccess = { listPages: listObjectPages, remove: deleteObject };

/** One sweep now (also what POST /api/admin/storage-sweep runs). */
export function sweepOrphanPhotosNow(): Promise<SweepResult> {
  return sweepOrphanPhotos(db, appObjectStore);
}

function startOrphanSchedule(): void {
  if (g[STARTED]) return;
  g[STARTED] = true;
  let running = false;
  const tick = async () => {
    if (running) return;
    running = true;
    try {
      const r = await sweepOrphanPhotosNow();
      if (r.removed || r.failed) console.log(`[photo-sweep] removed ${r.removed} orphaned object(s), ${r.failed} failed`);
    } catch (error) {
      // Storage or database down: the next tick tries again.
      console.error('[photo-sweep] failed:', error);
    } finally {
      running = false;
    }
  };
  void tick();
  setInterval(() => void tick(), SWEEP_EVERY_MS).unref();
}

startOrphanSchedule();
