/// <reference lib="webworker" />
// Chordline's service worker, bundled by @serwist/turbopack (app/serwist/[path]/route.ts) and served
// as /serwist/sw.js with scope "/". Caching is Serwist's; this file only says which strategy serves what.
import {
  CacheableResponsePlugin,
  CacheFirst,
  ExpirationPlugin,
  NetworkFirst,
  NetworkOnly,
  Serwist,
  StaleWhileRevalidate,
  type PrecacheEntry,
  type RuntimeCaching,
  type SerwistGlobalConfig,
} from 'serwist';
import { CACHE_NAMES, VERSION_MESSAGE } from './cache-names';

declare global {
  interface WorkerGlobalScope extends SerwistGlobalConfig {
    __SW_MANIFEST: (PrecacheEntry | string)[] | undefined;
  }
}

declare const self: ServiceWorkerGlobalScope;

const okOnly = () => new CacheableResponsePlugin({ statuses: [200] });
/** Slow deck-side signal: after this long without an answer, the kept copy is shown. */
const NETWORK_TIMEOUT_SECONDS = 8;

const runtimeCaching: RuntimeCaching[] = [
  // Sign-in and session answers, and the pages of e-mailed one-time links, are never cached.
  { matcher: ({ sameOrigin, url }) => sameOrigin && /^\/(api\/auth|invite|reset)\//.test(url.pathname), handler: new NetworkOnly() },
  // Photos: their bytes never change under an id.
  {
    matcher: ({ sameOrigin, url }) => sameOrigin && url.pathname.startsWith('/api/attachments/'),
    method: 'GET',
    handler: new CacheFirst({ cacheName: CACHE_NAMES.photos, plugins: [okOnly(), new ExpirationPlugin({ maxEntries: 120, maxAgeSeconds: 30 * 24 * 3600 })] }),
  },
  // Data: the network first, the last answer kept when there is none.
  {
    matcher: ({ sameOrigin, url }) => sameOrigin && url.pathname.startsWith('/api/'),
    method: 'GET',
    handler: new NetworkFirst({
      cacheName: CACHE_NAMES.data,
      networkTimeoutSeconds: NETWORK_TIMEOUT_SECONDS,
      plugins: [okOnly(), new ExpirationPlugin({ maxEntries: 300, maxAgeSeconds: 60 * 24 * 3600 })],
    }),
  },
  // Client-side navigations ask for the React Server Components payload.
  {
    matcher: ({ request, sameOrigin }) => sameOrigin && request.headers.get('RSC') === '1',
    method: 'GET',
    handler: new NetworkFirst({
      cacheName: CACHE_NAMES.rsc,
      networkTimeoutSeconds: NETWORK_TIMEOUT_SECONDS,
      plugins: [okOnly(), new ExpirationPlugin({ maxEntries: 60, maxAgeSeconds: 60 * 24 * 3600 })],
    }),
  },
  // Fonts and the other build files not in the precache list.
  {
    matcher: ({ sameOrigin, url }) => sameOrigin && url.pathname.startsWith('/_next/static/'),
    handler: new CacheFirst({ cacheName: CACHE_NAMES.static, plugins: [okOnly(), new ExpirationPlugin({ maxEntries: 200 })] }),
  },
  {
    matcher: ({ sameOrigin, url }) => sameOrigin && /^\/(icons\/|manifest\.webmanifest$|icon\.svg$)/.test(url.pathname),
    handler: new StaleWhileRevalidate({ cacheName: CACHE_NAMES.static, plugins: [okOnly()] }),
  },
  // Pages (field mode among them): the network first, the last copy when offline.
  {
    matcher: ({ request, sameOrigin, url }) => sameOrigin && !url.pathname.startsWith('/api/') && (request.mode === 'navigate' || request.destination === ''),
    method: 'GET',
    handler: new NetworkFirst({
      cacheName: CACHE_NAMES.pages,
      networkTimeoutSeconds: NETWORK_TIMEOUT_SECONDS,
      matchOptions: { ignoreVary: true, ignoreSearch: false },
      plugins: [okOnly(), new ExpirationPlugin({ maxEntries: 80, maxAgeSeconds: 60 * 24 * 3600 })],
    }),
  },
];

const manifest = self.__SW_MANIFEST ?? [];

/** This build's version: a short hash of the precache list (it changes whenever any built file does). */
function versionOf(entries: (PrecacheEntry | string)[]): string {
  const text = JSON.stringify(entries);
  let h = 0x811c9dc5;
  for (let i = 0; i < text.length; i++) h = Math.imul(h ^ text.charCodeAt(i), 0x01000193) >>> 0;
  return h.toString(16).padStart(8, '0');
}
const version = versionOf(manifest);

const serwist = new Serwist({
  precacheEntries: manifest,
  // A new version waits until every Chordline tab is closed and takes over on the next visit.
  skipWaiting: false,
  clientsClaim: true,
  navigationPreload: false,
  runtimeCaching,
  fallbacks: {
    entries: [{ url: '/offline', matcher: ({ request }) => request.destination === 'document' }],
  },
});

self.addEventListener('message', (event) => {
  if (event.data && event.data.type === VERSION_MESSAGE) event.ports[0]?.postMessage({ version });
});

serwist.addEventListeners();
