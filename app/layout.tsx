import type { Metadata } from 'next';
import '@fontsource/source-sans-3/400.css';
import '@fontsource/source-sans-3/600.css';
import '@fontsource/source-sans-3/700.css';
import './globals.css';

export const metadata: Metadata = {
  title: { default: 'Chordline', template: '%s · Chordline' },
  description: 'Deck overhang widths, edge drops and form targets for curved bridges with chorded girders.',
};

export default function RootLayout({ children }: { children: React.ReactNode }) {
  return (
    <html lang="en">
      <body className="min-h-screen antialiased">{children}</body>
    </html>
  );
}
