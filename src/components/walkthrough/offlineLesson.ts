// Keeps the open lesson usable offline: registers public/lesson-sw.js and asks it to store this page, the lesson's
// route data and every script, style and font the page loaded (read from the browser's resource timing list, so
// whatever the build named its chunks is covered). Not in `astro dev`: Vite serves modules that change on every edit.

/** What the page can say about working offline. */
export type OfflineReadiness = 'unsupported' | 'keeping' | 'ready' | 'failed';

const WORKER_URL = '/lesson-sw.js';

/** Same-origin files this page loaded, except API answers (the route data is added by name) and the worker. */
function loadedFiles(): string[] {
  const urls = new Set<string>();
  for (const entry of performance.getEntriesByType('resource')) {
    const u = new URL(entry.name, location.href);
    if (u.origin !== location.origin || u.pathname.startsWith('/api/') || u.pathname === WORKER_URL) continue;
    urls.add(u.pathname + u.search);
  }
  return [...urls];
}

/** Registers the worker and has it keep this lesson for `accountId`; resolves to whether the lesson was kept. */
export async function keepLessonOffline(accountId: string, lessonId: string): Promise<OfflineReadiness> {
  if (!import.meta.env.PROD || !('serviceWorker' in navigator) || !('caches' in window)) return 'unsupported';
  try {
    await navigator.serviceWorker.register(WORKER_URL, { scope: '/' });
    const registration = await navigator.serviceWorker.ready;
    const worker = registration.active;
    if (!worker) return 'failed';
    const urls = [location.pathname, `/api/lessons/${encodeURIComponent(lessonId)}`, ...loadedFiles()];
    const answer = await new Promise<unknown>((resolve) => {
      const channel = new MessageChannel();
      channel.port1.onmessage = (e: MessageEvent) => resolve(e.data);
      worker.postMessage({ type: 'keep-lesson', account: accountId, urls }, [channel.port2]);
    });
    return typeof answer === 'object' && answer !== null && (answer as { ok?: unknown }).ok === true ? 'ready' : 'failed';
  } catch {
    return 'failed';
  }
}
