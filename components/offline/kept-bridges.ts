import type { CheckRow } from '@/components/checks/check-types';
import { offlineDb, type KeptBridge } from './offline-db';

/** Saves (or replaces) the phone's copy of a bridge for field mode without a connection. */
export async function keepBridge(copy: KeptBridge): Promise<void> {
  const db = await offlineDb();
  await db.put('bridges', copy);
}

/** The phone's copy of a bridge, or null when it was never kept (or was cleared). */
export async function keptBridge(id: number): Promise<KeptBridge | null> {
  const db = await offlineDb();
  return (await db.get('bridges', id)) ?? null;
}

/** Every bridge kept on this phone, by name. */
export async function keptBridges(): Promise<KeptBridge[]> {
  const db = await offlineDb();
  return (await db.getAll('bridges')).sort((a, b) => a.name.localeCompare(b.name));
}

/** Removes one bridge's copy from the phone. */
export async function forgetBridge(id: number): Promise<void> {
  const db = await offlineDb();
  await db.delete('bridges', id);
}

/** Removes every kept bridge from the phone (signing out). */
export async function forgetAllBridges(): Promise<void> {
  const db = await offlineDb();
  await db.clear('bridges');
}

/** A check the server just recorded joins the kept copy's latest checks (newest first), if kept. */
export async function addKeptCheck(bridgeId: number, check: CheckRow): Promise<void> {
  const db = await offlineDb();
  const tx = db.transaction('bridges', 'readwrite');
  const copy = await tx.store.get(bridgeId);
  if (copy) await tx.store.put({ ...copy, checks: [check, ...copy.checks.filter((c) => c.id !== check.id)] });
  await tx.done;
}
