'use client';

import { useEffect } from 'react';
import { migrateLegacyQueue } from './legacy-queue';
import { emitOutbox, onOutbox } from './outbox-events';
import { outboxCount, type OutboxUser } from './outbox';
import { sendOutbox } from './send-outbox';

/** Pause before the next try after a failed send: 2 s, doubling, at most 30 s. */
const pauseAfter = (attempts: number) => Math.min(30000, 2000 * 2 ** Math.min(Math.max(attempts, 1) - 1, 4));

/**
 * Sends what waits on the phone on every signed-in page: at once, whenever the browser comes back
 * online or field mode asks, and again after a failure with a growing pause. Moves the earlier
 * localStorage queue into the store first. Renders nothing.
 */
export default function OfflineSync({ user }: { user: OutboxUser }) {
  const { id, email } = user;
  useEffect(() => {
    let timer: ReturnType<typeof setTimeout> | null = null;
    let stopped = false;
    const send = async () => {
      if (timer) clearTimeout(timer);
      timer = null;
      if ((await outboxCount().catch(() => 0)) === 0) return;
      const run = await sendOutbox().catch(() => null);
      if (stopped || !run) return;
      // Offline: the 'online' event starts the next run; signed out: signing in again reloads the page.
      if (run.stopped === 'busy' || (run.stopped === 'offline' && navigator.onLine)) timer = setTimeout(() => void send(), pauseAfter(run.attempts));
    };
    migrateLegacyQueue({ id, email })
      .then((moved) => moved && emitOutbox({ type: 'changed' }))
      .catch(() => undefined)
      .finally(() => void send());
    const stop = onOutbox((event) => {
      if (event.type === 'send-now') void send();
    });
    const online = () => void send();
    window.addEventListener('online', online);
    return () => {
      stopped = true;
      if (timer) clearTimeout(timer);
      stop();
      window.removeEventListener('online', online);
    };
  }, [id, email]);
  return null;
}
