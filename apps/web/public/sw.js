// Catline's service worker keeps the app shell (the page, its scripts, styles, fonts, icons and manifest)
// so a tablet that lost the network can still open Catline, which then says it is not live. It never
// stores or answers an API call or the live link: launch figures come only from the server.
const SHELL = 'catline-shell-v1';
const PAGE = '/index.html';

const isHashedAsset = (url) => url.pathname.startsWith('/assets/');
const isShellFile = (url) => /^\/[\w.-]+\.(svg|png|webmanifest)$/.test(url.pathname);

/** The page and what it names itself: what a cold start without the network needs. */
async function keepShell() {
  const cache = await caches.open(SHELL);
  const page = await fetch(PAGE, { cache: 'no-cache' });
  if (!page.ok) return;
  const named = [...(await page.clone().text()).matchAll(/(?:src|href)="(\/[^"]+)"/g)].map((match) => match[1]);
  await cache.put(PAGE, page);
  await cache.addAll(
    named.filter((path) => {
      const url = new URL(path, self.location.origin);
      return isHashedAsset(url) || isShellFile(url);
    }),
  );
}

/** The network's answer, kept for later; the kept one when the network does not answer. */
async function networkFirst(request, key) {
  try {
    const response = await fetch(request);
    if (response.ok) {
      const copy = response.clone();
      void caches.open(SHELL).then((cache) => cache.put(key, copy));
    }
    return response;
  } catch {
    return (await caches.match(key)) ?? Response.error();
  }
}

/** Hashed names change with their content: a kept copy is never out of date. */
async function cacheFirst(request) {
  const kept = await caches.match(request);
  if (kept) return kept;
  const response = await fetch(request);
  if (response.ok) {
    const copy = response.clone();
    void caches.open(SHELL).then((cache) => cache.put(request, copy));
  }
  return response;
}

self.addEventListener('install', (event) => {
  event.waitUntil(keepShell().then(() => self.skipWaiting()));
});

self.addEventListener('activate', (event) => {
  event.waitUntil(
    caches
      .keys()
      .then((keys) => Promise.all(keys.filter((key) => key !== SHELL).map((key) => caches.delete(key))))
      .then(() => self.clients.claim()),
  );
});

self.addEventListener('fetch', (event) => {
  const request = event.request;
  const url = new URL(request.url);
  // API calls and the live link (socket.io) always go to the server, never to a cache.
  if (request.method !== 'GET' || url.origin !== self.location.origin) return;
  if (url.pathname.startsWith('/api/') || url.pathname.startsWith('/socket.io/')) return;
  if (request.mode === 'navigate') event.respondWith(networkFirst(request, PAGE));
  else if (isHashedAsset(url)) event.respondWith(cacheFirst(request));
  else if (isShellFile(url)) event.respondWith(networkFirst(request, request));
});
