import { createSerwistRoute } from '@serwist/turbopack';

// The service worker (lib/sw/service-worker.ts) bundled at build time with the list of built files to
// precache: the app shell's scripts, styles and fonts, and the icons. Served as /serwist/sw.js.
const distDir = (process.env.NEXT_DIST_DIR || '.next').replace(/^\.\//, '').replace(/\/?$/, '/');

export const { dynamic, dynamicParams, revalidate, generateStaticParams, GET } = createSerwistRoute({
  swSrc: 'lib/sw/service-worker.ts',
  useNativeEsbuild: true,
  globPatterns: [`${distDir}static/**/*.{js,css,woff2}`, 'public/icons/*.png'],
  additionalPrecacheEntries: [{ url: '/offline', revision: String(Date.now()) }],
  maximumFileSizeToCacheInBytes: 4 * 1024 * 1024,
});
