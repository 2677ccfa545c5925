import type { Metadata } from 'next';
import Wordmark from '@/components/Wordmark';
import KeptBridgesList from '@/components/offline/KeptBridgesList';

export const metadata: Metadata = { title: 'Offline' };
export const dynamic = 'force-static';

/**
 * Shown by the service worker for a page that is not on the phone while there is no connection: what
 * the phone holds, with field mode for every kept bridge.
 */
export default function OfflinePage() {
  return (
    <div className="min-h-screen">
      <header className="bg-brand-800 px-4 py-3">
        <Wordmark />
      </header>
      <main className="mx-auto max-w-xl px-4 py-6">
        <h1 className="text-2xl font-bold text-concrete-900">No connection</h1>
        <p className="mt-2 text-concrete-700">This page is not kept on this phone. Field mode opens without a connection for the bridges kept here.</p>
        <KeptBridgesList />
      </main>
    </div>
  );
}
