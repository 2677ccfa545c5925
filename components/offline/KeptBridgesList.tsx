'use client';

import { useEffect, useState } from 'react';
import type { KeptBridge, OutboxItem } from './offline-db';
import { keptBridges } from './kept-bridges';
import { outboxItems } from './outbox';

const timeText = (iso: string) => new Date(iso).toLocaleString('en', { day: 'numeric', month: 'short', hour: '2-digit', minute: '2-digit', hourCycle: 'h23' });

/** The bridges kept on this phone, each with field mode, its revision, when it was saved and what waits. */
export default function KeptBridgesList() {
  const [state, setState] = useState<{ bridges: KeptBridge[]; waiting: OutboxItem[] } | null>(null);

  useEffect(() => {
    Promise.all([keptBridges(), outboxItems()])
      .then(([bridges, waiting]) => setState({ bridges, waiting }))
      .catch(() => setState({ bridges: [], waiting: [] }));
  }, []);

  if (!state) return <p className="mt-4 text-concrete-600">Looking at what this phone holds…</p>;
  if (state.bridges.length === 0) {
    return <p className="card mt-4 p-4 text-concrete-700">No bridge is kept on this phone. With a connection, open a bridge&apos;s field mode and press &quot;Keep on this phone&quot;.</p>;
  }
  return (
    <ul className="mt-4 space-y-2">
      {state.bridges.map((b) => {
        const waiting = state.waiting.filter((i) => i.bridgeId === b.id).length;
        return (
          <li key={b.id} className="card p-4">
            <a href={`/bridges/${b.id}/field`} className="text-lg font-semibold text-brand-700 underline">
              {b.name}: field mode
            </a>
            <p className="mt-1 text-sm text-concrete-600">
              Revision {b.revision} · saved {timeText(b.savedAt)}
              {waiting ? ` · ${waiting} waiting to be sent` : ''}
            </p>
          </li>
        );
      })}
    </ul>
  );
}
