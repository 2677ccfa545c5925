import { offlineDb, type CheckBody } from './offline-db';
import { queueCheck, type OutboxUser } from './outbox';

/** The earlier field screen kept unsent measurements in localStorage under this prefix + bridge id. */
export const LEGACY_PREFIX = 'chordline.field.pending.';

type LegacyItem = CheckBody & { key: string; typedAt?: string };

function legacyKeys(storage: Storage): string[] {
  const keys: string[] = [];
  for (let i = 0; i < storage.length; i++) {
    const k = storage.key(i);
    if (k && k.startsWith(LEGACY_PREFIX)) keys.push(k);
  }
  return keys;
}

/**
 * Moves measurements still waiting in the earlier localStorage queue into the offline store, in the
 * order they were typed and under their own client keys (a key already in the store is not added
 * twice), then removes the old entry. They are given to the signed-in user, the only one who could
 * have typed them on this browser's profile, and are judged against the bridge's latest revision (the
 * old queue did not note one). Returns how many moved.
 */
export async function migrateLegacyQueue(user: OutboxUser, storage: Storage = localStorage): Promise<number> {
  let moved = 0;
  for (const storageKey of legacyKeys(storage)) {
    const bridgeId = Number(storageKey.slice(LEGACY_PREFIX.length));
    let items: LegacyItem[] = [];
    try {
      const parsed = JSON.parse(storage.getItem(storageKey) ?? '[]');
      items = Array.isArray(parsed) ? parsed.filter((p) => p && typeof p.key === 'string') : [];
    } catch {
      items = [];
    }
    if (!Number.isInteger(bridgeId) || bridgeId <= 0) continue;
    const db = await offlineDb();
    for (const p of items) {
      const key = p.key.replace(/[^A-Za-z0-9_-]/g, '').slice(0, 64);
      if (key.length < 8 || (await db.getFromIndex('outbox', 'by-key', key))) continue;
      const body: CheckBody = {
        span: p.span,
        girder: p.girder,
        point: p.point,
        measured_edge_width: p.measured_edge_width ?? null,
        measured_drop_from_girder_top: p.measured_drop_from_girder_top ?? null,
        note: p.note ?? '',
      };
      await queueCheck(user, bridgeId, null, body, key, p.typedAt ?? new Date().toISOString());
      moved++;
    }
    storage.removeItem(storageKey);
  }
  return moved;
}
