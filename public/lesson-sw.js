// Threadway's service worker: keeps a lesson's walkthrough usable at the sewing machine without a connection.
// Plain JavaScript, no build step, no library. Registered by src/components/walkthrough/offlineLesson.ts on lesson
// pages (students only) with scope '/', so it also sees signing out from any page.
//
// - A lesson page asks it (message 'keep-lesson') to store that page, its route data (GET /api/lessons/:id) and
//   the scripts, styles and fonts it loaded, in one cache per signed-in account.
// - Lesson pages and lesson data: network first (the copy is refreshed on every visit), the stored copy when the
//   network fails, marked with the header x-threadway-offline-copy: 1.
// - Built assets (/_astro/…, names carry a content hash): the stored copy first.
// - Everything else passes through untouched. Progress (PUT) is never stored here: the page queues it itself.
// - Signing out (POST /sign-out, or its landing page) and a lesson page of another account delete the stored copies,
//   so the next person at a shared machine cannot open them.
const PREFIX = 'threadway-lesson-v1:';
const LESSON_PAGE = /^\/classes\/[^/]+\/lessons\/[^/]+\/?$/;
const LESSON_DATA = /^\/api\/lessons\/[^/]+$/;

self.addEventListener('install', () => {
  self.skipWaiting();
});

self.addEventListener('activate', (event) => {
  event.waitUntil(
    (async () => {
      const names = await caches.keys();
      await Promise.all(names.filter((n) => n.startsWith('threadway-') && !n.startsWith(PREFIX)).map((n) => caches.delete(n)));
      await self.clients.claim();
    })(),
  );
});

async function forgetAll(except) {
  const names = await caches.keys();
  await Promise.all(names.filter((n) => n.startsWith(PREFIX) && n !== except).map((n) => caches.delete(n)));
}

async function keepLesson(account, urls) {
  const name = PREFIX + account;
  await forgetAll(name);
  const cache = await caches.open(name);
  let kept = 0;
  for (const url of urls) {
    const u = new URL(url, self.location.origin);
    if (u.origin !== self.location.origin) continue;
    try {
      const res = await fetch(u.href, { credentials: 'same-origin', cache: 'no-store' });
      if (res.ok && !res.redirected) {
        await cache.put(u.href, res);
        kept += 1;
      }
    } catch {
      // Offline already: what was kept before stays.
    }
  }
  return kept;
}

self.addEventListener('message', (event) => {
  const data = event.data;
  if (!data || data.type !== 'keep-lesson' || typeof data.account !== 'string' || !Array.isArray(data.urls)) return;
  const port = event.ports[0];
  event.waitUntil(
    keepLesson(data.account, data.urls.filter((u) => typeof u === 'string').slice(0, 200)).then(
      (kept) => port && port.postMessage({ ok: true, kept }),
      () => port && port.postMessage({ ok: false, kept: 0 }),
    ),
  );
});

async function storedCopy(request) {
  const hit = await caches.match(request, { ignoreSearch: true });
  if (!hit) return null;
  const headers = new Headers(hit.headers);
  headers.set('x-threadway-offline-copy', '1');
  return new Response(hit.body, { status: hit.status, statusText: hit.statusText, headers });
}

async function networkFirst(request, keepFresh) {
  try {
    const res = await fetch(request);
    if (keepFresh && res.ok && !res.redirected) {
      const names = (await caches.keys()).filter((n) => n.startsWith(PREFIX));
      // Refresh only a copy already kept: the page decides what is kept (and for which account).
      for (const name of names) {
        const cache = await caches.open(name);
        if (await cache.match(request, { ignoreSearch: true })) await cache.put(request.url.split('?')[0], res.clone());
      }
    }
    return res;
  } catch (error) {
    const copy = await storedCopy(request);
    if (copy) return copy;
    throw error;
  }
}

async function cacheFirst(request) {
  const hit = await caches.match(request);
  return hit || fetch(request);
}

self.addEventListener('fetch', (event) => {
  const request = event.request;
  const url = new URL(request.url);
  if (url.origin !== self.location.origin) return;
  if (request.method === 'POST' && url.pathname === '/sign-out') {
    event.waitUntil(forgetAll(null));
    return;
  }
  if (request.method !== 'GET') return;
  if (request.mode === 'navigate' && url.searchParams.has('signed-out')) {
    event.waitUntil(forgetAll(null));
    return;
  }
  if (request.mode === 'navigate' && LESSON_PAGE.test(url.pathname)) {
    event.respondWith(networkFirst(request, true));
  } else if (LESSON_DATA.test(url.pathname)) {
    event.respondWith(networkFirst(request, true));
  } else if (url.pathname.startsWith('/_astro/')) {
    event.respondWith(cacheFirst(request));
  }
});
