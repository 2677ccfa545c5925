'use client';

import { SerwistProvider } from '@serwist/turbopack/react';
import { SW_URL } from '@/lib/sw/cache-names';
import OfflineSync from './OfflineSync';
import type { OutboxUser } from './outbox';
import UpdateNotice from './UpdateNotice';

/**
 * Registers Chordline's service worker (scope "/", so field mode at /bridges/N/field is covered),
 * sends what waits on the phone, and says when a new version has taken over.
 */
export default function ServiceWorkerRegistration({ user, children }: { user: OutboxUser; children: React.ReactNode }) {
  return (
    <SerwistProvider swUrl={SW_URL} options={{ scope: '/' }} reloadOnOnline={false} cacheOnNavigation disable={process.env.NODE_ENV === 'development'}>
      <OfflineSync user={user} />
      <UpdateNotice />
      {children}
    </SerwistProvider>
  );
}
