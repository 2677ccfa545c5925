'use client';

import { useCallback, useEffect, useState } from 'react';
import type { CheckRow } from '@/components/checks/check-types';
import type { CheckBody, OutboxItem } from '@/components/offline/offline-db';
import { emitOutbox, onOutbox } from '@/components/offline/outbox-events';
import { outboxItems, queueCheck, type OutboxUser } from '@/components/offline/outbox';
import { useOnline } from './use-online';

/** An item the server refused (400/403/404): shown with its reason, never resent. */
export type RefusedItem = { key: string; what: string; reason: string };

/**
 * Field mode's view of the phone's outbox for one bridge: the measurements and photos waiting (in the
 * order taken, anyone's), the ones the server refused, and `enqueue` to keep a new measurement against
 * the revision on screen. Sending is done by the app-wide sender (OfflineSync), asked with `send-now`.
 */
export function useFieldQueue(bridgeId: number, user: OutboxUser, revision: number, onSaved: (check: CheckRow) => void) {
  const [items, setItems] = useState<OutboxItem[]>([]);
  const [refused, setRefused] = useState<RefusedItem[]>([]);
  const online = useOnline();

  const reload = useCallback(() => {
    outboxItems(bridgeId)
      .then(setItems)
      .catch(() => setItems([]));
  }, [bridgeId]);

  useEffect(() => {
    reload();
    const stop = onOutbox((event) => {
      if (event.type === 'changed') reload();
      if (event.type === 'saved' && event.bridgeId === bridgeId) onSaved(event.check);
      if (event.type === 'refused' && event.bridgeId === bridgeId) setRefused((r) => [...r, { key: event.key, what: event.what, reason: event.reason }]);
    });
    return () => {
      stop();
    };
  }, [bridgeId, reload, onSaved]);

  const enqueue = useCallback(
    async (body: CheckBody) => {
      const item = await queueCheck(user, bridgeId, revision, body);
      setItems((list) => [...list, item]);
      emitOutbox({ type: 'changed' });
      emitOutbox({ type: 'send-now' });
      return item;
    },
    [bridgeId, revision, user],
  );

  const retryNow = useCallback(() => emitOutbox({ type: 'send-now' }), []);
  const dismissRefused = useCallback((key: string) => setRefused((r) => r.filter((x) => x.key !== key)), []);

  const mine = items.filter((i) => i.userId === user.id);
  const others = items.filter((i) => i.userId !== user.id);
  return { items, mine, others, refused, online, enqueue, retryNow, dismissRefused };
}
