'use client';

import { useCallback, useEffect, useRef, useState } from 'react';
import type { CheckRow } from '@/components/checks/check-types';

/** A measurement typed in the field that the server has not answered yet. */
export type PendingCheck = {
  key: string;
  span: number;
  girder: string;
  point: number;
  measured_edge_width: number | null;
  measured_drop_from_girder_top: number | null;
  note: string;
  typedAt: string;
  attempts: number;
  /** Last failure, for the screen ("no connection", "server busy"). */
  lastError: string | null;
};

/** A measurement the server refused (400/403/404): kept on screen with its reason, never resent. */
export type RefusedCheck = PendingCheck & { reason: string };

const storageKey = (bridgeId: number) => `chordline.field.pending.${bridgeId}`;

function load(bridgeId: number): PendingCheck[] {
  try {
    const v = JSON.parse(localStorage.getItem(storageKey(bridgeId)) ?? '[]');
    return Array.isArray(v) ? (v as PendingCheck[]).filter((p) => p && typeof p.key === 'string') : [];
  } catch {
    return [];
  }
}

function save(bridgeId: number, list: PendingCheck[]): void {
  try {
    if (list.length) localStorage.setItem(storageKey(bridgeId), JSON.stringify(list));
    else localStorage.removeItem(storageKey(bridgeId));
  } catch {
    // Private mode or a full store: the entries stay in memory for this visit.
  }
}

function newKey(): string {
  return typeof crypto !== 'undefined' && 'randomUUID' in crypto ? crypto.randomUUID() : `${Date.now()}-${Math.random().toString(36).slice(2)}`;
}

/**
 * Keeps typed measurements in localStorage until the server has them, sends them one by one in order,
 * and retries after a failure (no connection, timeout, 5xx, 429) with a growing pause, at once when the
 * browser comes back online. A refusal (4xx) is final and reported with the server's reason.
 */
export function useFieldQueue(bridgeId: number, onSaved: (check: CheckRow, key: string) => void) {
  const [pending, setPending] = useState<PendingCheck[]>([]);
  const [refused, setRefused] = useState<RefusedCheck[]>([]);
  const [online, setOnline] = useState(true);
  const sending = useRef(false);
  const timer = useRef<ReturnType<typeof setTimeout> | null>(null);
  const savedRef = useRef(onSaved);
  savedRef.current = onSaved;

  const update = useCallback(
    (fn: (list: PendingCheck[]) => PendingCheck[]) => {
      const next = fn(load(bridgeId));
      save(bridgeId, next);
      setPending(next);
      return next;
    },
    [bridgeId],
  );

  const flush = useCallback(async () => {
    if (sending.current) return;
    sending.current = true;
    if (timer.current) clearTimeout(timer.current);
    timer.current = null;
    try {
      for (;;) {
        const [head] = load(bridgeId);
        if (!head) break;
        let res: Response | null = null;
        let failure: string | null = null;
        try {
          const controller = new AbortController();
          const t = setTimeout(() => controller.abort(), 20000);
          res = await fetch(`/api/bridges/${bridgeId}/checks`, {
            method: 'POST',
            headers: { 'content-type': 'application/json', accept: 'application/json' },
            body: JSON.stringify({
              span: head.span,
              girder: head.girder,
              point: head.point,
              measured_edge_width: head.measured_edge_width,
              measured_drop_from_girder_top: head.measured_drop_from_girder_top,
              note: head.note,
              // The same key on every resend: the server records a measurement once.
              client_key: head.key.replace(/[^A-Za-z0-9_-]/g, '').slice(0, 64),
            }),
            signal: controller.signal,
          });
          clearTimeout(t);
        } catch {
          failure = 'No connection: kept on this phone, will resend.';
        }
        if (res && res.ok) {
          const check = (await res.json()) as CheckRow;
          update((list) => list.filter((p) => p.key !== head.key));
          savedRef.current(check, head.key);
          continue;
        }
        if (res && res.status >= 400 && res.status < 500 && res.status !== 408 && res.status !== 429) {
          let reason = `The server refused this entry (${res.status}).`;
          try {
            const body = (await res.json()) as { error?: string };
            if (body.error) reason = body.error;
          } catch {}
          if (res.status === 401) {
            // Signed out: keep it and stop; it goes once the user signs in again.
            update((list) => list.map((p) => (p.key === head.key ? { ...p, lastError: 'Signed out: sign in again to send.' } : p)));
            break;
          }
          update((list) => list.filter((p) => p.key !== head.key));
          setRefused((r) => [...r, { ...head, reason }]);
          continue;
        }
        const why = failure ?? `Server busy (${res?.status}): kept on this phone, will resend.`;
        const next = update((list) => list.map((p) => (p.key === head.key ? { ...p, attempts: p.attempts + 1, lastError: why } : p)));
        const attempts = next.find((p) => p.key === head.key)?.attempts ?? 1;
        timer.current = setTimeout(() => void flush(), Math.min(30000, 2000 * 2 ** Math.min(attempts - 1, 4)));
        break;
      }
    } finally {
      sending.current = false;
    }
  }, [bridgeId, update]);

  useEffect(() => {
    setPending(load(bridgeId));
    setOnline(navigator.onLine);
    const goOnline = () => {
      setOnline(true);
      void flush();
    };
    const goOffline = () => setOnline(false);
    window.addEventListener('online', goOnline);
    window.addEventListener('offline', goOffline);
    void flush();
    return () => {
      window.removeEventListener('online', goOnline);
      window.removeEventListener('offline', goOffline);
      if (timer.current) clearTimeout(timer.current);
    };
  }, [bridgeId, flush]);

  const enqueue = useCallback(
    (entry: Omit<PendingCheck, 'key' | 'typedAt' | 'attempts' | 'lastError'>) => {
      const item: PendingCheck = { ...entry, key: newKey(), typedAt: new Date().toISOString(), attempts: 0, lastError: null };
      update((list) => [...list, item]);
      void flush();
      return item;
    },
    [flush, update],
  );

  const dismissRefused = useCallback((key: string) => setRefused((r) => r.filter((x) => x.key !== key)), []);

  return { pending, refused, online, enqueue, retryNow: flush, dismissRefused };
}
