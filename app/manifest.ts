import type { MetadataRoute } from 'next';
import tailwind from '@/tailwind.config';

// Colours come from the design tokens (tailwind.config.ts): the deep brand green of the field header
// for the phone's status bar, the concrete-50 page ground for the launch screen.
const colors = (tailwind.theme?.extend?.colors ?? {}) as Record<string, Record<string, string>>;

/** The web app manifest (served at /manifest.webmanifest): lets a phone add Chordline to its home screen. */
export default function manifest(): MetadataRoute.Manifest {
  return {
    id: '/',
    name: 'Chordline: deck overhang geometry',
    short_name: 'Chordline',
    description: 'Deck overhang widths, edge drops and form targets for curved bridges, with a field mode that works without signal.',
    start_url: '/bridges',
    scope: '/',
    display: 'standalone',
    orientation: 'portrait',
    theme_color: colors.brand['800'],
    background_color: colors.concrete['50'],
    icons: [
      { src: '/icons/icon-192.png', sizes: '192x192', type: 'image/png', purpose: 'any' },
      { src: '/icons/icon-512.png', sizes: '512x512', type: 'image/png', purpose: 'any' },
      { src: '/icons/maskable-192.png', sizes: '192x192', type: 'image/png', purpose: 'maskable' },
      { src: '/icons/maskable-512.png', sizes: '512x512', type: 'image/png', purpose: 'maskable' },
    ],
  };
}
