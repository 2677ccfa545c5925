/** Cache Storage names the service worker fills and the app reads or clears (signing out). */
export const CACHE_NAMES = {
  pages: 'chordline-pages',
  rsc: 'chordline-rsc',
  data: 'chordline-data',
  photos: 'chordline-photos',
  static: 'chordline-static',
} as const;

/** Caches that hold a bridge's data (pages, payloads, API answers, photos): cleared on sign-out. */
export const BRIDGE_DATA_CACHES = [CACHE_NAMES.pages, CACHE_NAMES.rsc, CACHE_NAMES.data, CACHE_NAMES.photos];

/** The message a page sends the worker to learn its version (answered on the message port). */
export const VERSION_MESSAGE = 'CHORDLINE_VERSION';

/** Where the worker script is served (app/serwist/[path]/route.ts). */
export const SW_URL = '/serwist/sw.js';
