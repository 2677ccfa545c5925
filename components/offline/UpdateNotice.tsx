'use client';

import { useEffect, useState } from 'react';
import { SW_URL, VERSION_MESSAGE } from '@/lib/sw/cache-names';

const SEEN_KEY = 'chordline.sw.version';

/** Asks the controlling service worker for its version (a hash of what it precached). */
function workerVersion(worker: ServiceWorker): Promise<string | null> {
  return new Promise((resolve) => {
    const channel = new MessageChannel();
    const timer = setTimeout(() => resolve(null), 3000);
    channel.port1.onmessage = (e) => {
      clearTimeout(timer);
      resolve(typeof e.data?.version === 'string' ? e.data.version : null);
    };
    worker.postMessage({ type: VERSION_MESSAGE }, [channel.port2]);
  });
}

/**
 * Says when a new version of Chordline has taken over since the last visit, and when one is ready and
 * waiting (it takes over the next time the app is opened, after every Chordline tab is closed).
 */
export default function UpdateNotice() {
  const [note, setNote] = useState<null | 'updated' | 'waiting'>(null);

  useEffect(() => {
    if (!('serviceWorker' in navigator)) return;
    let gone = false;
    const sw = navigator.serviceWorker;
    const checkWaiting = (reg: ServiceWorkerRegistration | undefined) => {
      if (!reg) return;
      if (reg.waiting && reg.active && !gone) setNote((n) => n ?? 'waiting');
      reg.addEventListener('updatefound', () => {
        const installing = reg.installing;
        installing?.addEventListener('statechange', () => {
          if (installing.state === 'installed' && sw.controller && !gone) setNote('waiting');
        });
      });
    };
    void sw.getRegistration(SW_URL).then(checkWaiting);
    void sw.ready.then(async () => {
      const controller = sw.controller;
      if (!controller) return;
      const version = await workerVersion(controller);
      if (!version || gone) return;
      const seen = localStorage.getItem(SEEN_KEY);
      localStorage.setItem(SEEN_KEY, version);
      if (seen && seen !== version) setNote('updated');
    });
    return () => {
      gone = true;
    };
  }, []);

  if (!note) return null;
  return (
    <div
      role="status"
      className="fixed inset-x-3 bottom-3 z-50 flex items-start gap-3 rounded-lg border border-brand-300 bg-white p-3 text-sm text-concrete-900 shadow-lg md:left-auto md:right-4 md:max-w-sm"
    >
      <p className="flex-1">
        {note === 'updated'
          ? 'Chordline has been updated to a new version since your last visit.'
          : 'A new version of Chordline is ready. It takes over the next time you open Chordline (close every Chordline tab first).'}
      </p>
      <button type="button" className="btn-secondary px-2 py-1" onClick={() => setNote(null)}>
        OK
      </button>
    </div>
  );
}
