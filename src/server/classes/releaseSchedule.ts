// Runs the lesson-release sweep in the server process: once when this module is first loaded and then every
// RELEASE_SWEEP_SECONDS. Links in the e-mails need the site's address, so the schedule needs PUBLIC_ORIGIN.
import { PUBLIC_ORIGIN, RELEASE_SWEEP_SECONDS } from 'astro:env/server';
import { db } from '../db.ts';
import { sweepLessonReleases } from './releaseSweep.ts';

const STARTED = Symbol.for('threadway.releaseSchedule');
const g = globalThis as { [STARTED]?: boolean };

export function startReleaseSchedule(): void {
  if (g[STARTED]) return;
  g[STARTED] = true;
  if (!PUBLIC_ORIGIN) {
    console.warn('[release-sweep] PUBLIC_ORIGIN is not set: lesson-release e-mails go out only through POST /api/lessons/release-sweep');
    return;
  }
  const origin = PUBLIC_ORIGIN;
  let running = false;
  const tick = async () => {
    if (running) return;
    running = true;
    try {
      const r = await sweepLessonReleases(db, origin);
      if (r.sent || r.failed) console.log(`[release-sweep] sent ${r.sent}, failed ${r.failed}`);
    } catch (error) {
      console.error('[release-sweep] failed:', error);
    } finally {
      running = false;
    }
  };
  void tick();
  setInterval(() => void tick(), Math.max(5, RELEASE_SWEEP_SECONDS) * 1000).unref();
}

startReleaseSchedule();
