import type { BracketGroup, CheckRow } from '@/components/checks/check-types';
import { keepBridge } from '@/components/offline/kept-bridges';
import type { KeptBridge, KeptTolerances } from '@/components/offline/offline-db';
import { fetcher } from '@/lib/client/api-client';
import { CACHE_NAMES } from '@/lib/sw/cache-names';
import type { Units } from '@/lib/units';

/** What field mode shows: from the server's page, or from the copy kept on the phone. */
export type FieldData = {
  bridge: { id: number; name: string; revision: number };
  units: Units;
  groups: BracketGroup[];
  tolerances: KeptTolerances;
};

/** Field mode's own address, kept in the page cache so it opens without a connection. */
export const fieldPath = (bridgeId: number) => `/bridges/${bridgeId}/field`;

/**
 * Keeps a bridge on this phone: the revision, offset table, field targets and tolerances on screen and
 * the latest checks, with the time saved, in IndexedDB; and field mode's page in the page cache.
 */
export async function keepForField(data: FieldData, userId: number): Promise<KeptBridge> {
  const id = data.bridge.id;
  const [offsets, checks] = await Promise.all([fetcher<unknown>(`/api/bridges/${id}/offsets`), fetcher<CheckRow[]>(`/api/bridges/${id}/checks`)]);
  const copy: KeptBridge = { ...data.bridge, units: data.units, groups: data.groups, offsets, tolerances: data.tolerances, checks, savedAt: new Date().toISOString(), userId };
  await keepBridge(copy);
  if (typeof caches !== 'undefined') {
    const cache = await caches.open(CACHE_NAMES.pages);
    await cache.add(new Request(fieldPath(id), { credentials: 'same-origin' }));
  }
  return copy;
}

/** Field data from a kept copy. */
export function fromKept(copy: KeptBridge): FieldData {
  return { bridge: { id: copy.id, name: copy.name, revision: copy.revision }, units: copy.units, groups: copy.groups, tolerances: copy.tolerances };
}

/** "07:42" today, "1 Dec 07:42" on another day, in the phone's time. */
export function savedTimeText(iso: string, now = new Date()): string {
  const d = new Date(iso);
  const hm = `${String(d.getHours()).padStart(2, '0')}:${String(d.getMinutes()).padStart(2, '0')}`;
  if (d.toDateString() === now.toDateString()) return hm;
  return `${d.getDate()} ${d.toLocaleString('en', { month: 'short' })} ${hm}`;
}
