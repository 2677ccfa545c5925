'use client';

import { useCallback, useEffect, useState } from 'react';
import { keptBridge } from '@/components/offline/kept-bridges';
import type { KeptBridge } from '@/components/offline/offline-db';
import { fromKept, keepForField, type FieldData } from './keep-for-field';
import { useOnline } from './use-online';

/** A page rendered this recently came from the server, not from the phone's page cache. */
const FRESH_PAGE_MS = 10 * 60 * 1000;

/**
 * Where field mode's numbers come from. Online: the server's page. Offline with the bridge kept on the
 * phone: the kept copy (its revision, targets and tolerances). A kept copy is brought up to date
 * whenever field mode opens from the server, so the phone always holds the last revision seen.
 */
export function useFieldData(server: FieldData, userId: number, renderedAt: string) {
  const id = server.bridge.id;
  const [kept, setKept] = useState<KeptBridge | null>(null);
  const online = useOnline();
  const [keeping, setKeeping] = useState<{ busy: boolean; error: string | null }>({ busy: false, error: null });

  const keep = useCallback(async () => {
    setKeeping({ busy: true, error: null });
    try {
      setKept(await keepForField(server, userId));
      setKeeping({ busy: false, error: null });
    } catch (err) {
      setKeeping({ busy: false, error: `Not kept: ${(err as Error).message || 'the server could not be reached.'}` });
    }
  }, [server, userId]);

  useEffect(() => {
    let gone = false;
    keptBridge(id)
      .then((copy) => {
        if (gone) return;
        setKept(copy);
        const fresh = Date.now() - Date.parse(renderedAt) < FRESH_PAGE_MS;
        // Quietly bring the kept copy up to date when this page came from the server.
        if (copy && navigator.onLine && fresh)
          keepForField(server, userId).then(
            (c) => !gone && setKept(c),
            () => undefined,
          );
      })
      .catch(() => undefined);
    return () => {
      gone = true;
    };
    // The server data is the page's; it changes only with a new page.
    // eslint-disable-next-line react-hooks/exhaustive-deps -- keyed on the bridge and the page render
  }, [id, renderedAt]);

  const fromPhone = !online && kept !== null;
  return { data: fromPhone ? fromKept(kept) : server, kept, online, fromPhone, keep, keeping };
}
