import 'fake-indexeddb/auto';
import { afterEach, describe, expect, it } from 'vitest';
import { closeOfflineDb, DB_NAME, type KeptBridge } from '@/components/offline/offline-db';
import { forgetAllBridges, keepBridge, keptBridge, keptBridges } from '@/components/offline/kept-bridges';
import { checkSent, clearUserItems, noteFailure, outboxCount, outboxItems, queueCheck, queuePhoto, removeItem } from '@/components/offline/outbox';
import { LEGACY_PREFIX, migrateLegacyQueue } from '@/components/offline/legacy-queue';

// The phone's offline store (IndexedDB through idb), run against fake-indexeddb: an independent,
// complete implementation of the W3C Indexed Database API 3.0 used here in place of a browser's.

const ann = { id: 7, email: 'ann@example.com' };
const bob = { id: 8, email: 'bob@example.com' };
const body = (point: number) => ({ span: 1, girder: 'G1', point, measured_edge_width: 4.5 + point / 100, measured_drop_from_girder_top: null, note: '' });

function copy(id: number, name: string, revision: number): KeptBridge {
  return {
    id,
    name,
    revision,
    units: 'ft',
    groups: [],
    offsets: { points: [] },
    tolerances: { width: 0.0208, reading: 0.01, base_rod_length: 0.5 },
    checks: [],
    savedAt: '2026-12-02T07:42:00.000Z',
    userId: ann.id,
  };
}

afterEach(async () => {
  await closeOfflineDb();
  await new Promise<void>((resolve, reject) => {
    const req = indexedDB.deleteDatabase(DB_NAME);
    req.onsuccess = () => resolve();
    req.onerror = () => reject(req.error);
  });
});

describe('kept bridges', () => {
  it('keeps a copy with its revision and time, replaces it on a second keep, and forgets all on sign-out', async () => {
    await keepBridge(copy(3, 'Second Street', 2));
    await keepBridge(copy(1, 'Avon Road', 1));
    await keepBridge({ ...copy(3, 'Second Street', 3), savedAt: '2026-12-02T09:10:00.000Z' });
    const again = await keptBridge(3);
    expect(again?.revision).toBe(3);
    expect(again?.savedAt).toBe('2026-12-02T09:10:00.000Z');
    expect((await keptBridges()).map((b) => b.name)).toEqual(['Avon Road', 'Second Street']);
    await forgetAllBridges();
    expect(await keptBridges()).toEqual([]);
    expect(await keptBridge(3)).toBeNull();
  });
});

describe('the outbox', () => {
  it('gives back items in the order taken, across bridges, with who took them', async () => {
    const a = await queueCheck(ann, 1, 3, body(0));
    const b = await queueCheck(bob, 2, 1, body(1));
    const c = await queueCheck(ann, 1, 3, body(2));
    const all = await outboxItems();
    expect(all.map((i) => i.key)).toEqual([a.key, b.key, c.key]);
    expect(all.map((i) => i.userEmail)).toEqual(['ann@example.com', 'bob@example.com', 'ann@example.com']);
    expect((await outboxItems(1)).map((i) => i.key)).toEqual([a.key, c.key]);
    expect(await outboxCount()).toBe(3);
    expect(await outboxCount(ann.id)).toBe(2);
    expect(new Set(all.map((i) => i.key)).size).toBe(3);
    for (const i of all) expect(i.key).toMatch(/^[A-Za-z0-9_-]{8,64}$/);
  });

  it('keeps a photo with its bytes and hands it its check id when the check is saved', async () => {
    const check = await queueCheck(ann, 1, 3, body(4));
    const bytes = new Uint8Array([0xff, 0xd8, 0xff, 0xe0, 1, 2, 3]);
    const photo = await queuePhoto(ann, 1, { blob: new Blob([bytes], { type: 'image/jpeg' }), name: 'p.jpg', checkId: null, checkKey: check.key, span: 1, girder: 'G1', point: 4 });
    await checkSent(check.key, 41);
    const left = await outboxItems();
    expect(left).toHaveLength(1);
    const kept = left[0];
    expect(kept.kind).toBe('photo');
    if (kept.kind !== 'photo') return;
    expect(kept.key).toBe(photo.key);
    expect(kept.checkId).toBe(41);
    expect(kept.checkKey).toBeNull();
    expect(new Uint8Array(await kept.blob.arrayBuffer())).toEqual(bytes);
  });

  it('counts failed attempts in place and removes an item by its key', async () => {
    const a = await queueCheck(ann, 1, 3, body(0));
    const b = await queueCheck(ann, 1, 3, body(1));
    expect(await noteFailure(a.key, 'No connection')).toBe(1);
    expect(await noteFailure(a.key, 'No connection')).toBe(2);
    expect(await noteFailure(a.key, 'Signed out', false)).toBe(2);
    const [first] = await outboxItems();
    expect(first).toMatchObject({ key: a.key, attempts: 2, lastError: 'Signed out' });
    await removeItem(a.key);
    expect((await outboxItems()).map((i) => i.key)).toEqual([b.key]);
  });

  it("clears only the signing-out user's items", async () => {
    await queueCheck(ann, 1, 3, body(0));
    await queueCheck(bob, 1, 3, body(1));
    await queueCheck(ann, 2, 1, body(2));
    expect(await clearUserItems(ann.id)).toBe(2);
    expect((await outboxItems()).map((i) => i.userId)).toEqual([bob.id]);
  });

  it('survives closing the store and opening it again (a closed browser)', async () => {
    const a = await queueCheck(ann, 1, 3, body(0));
    await keepBridge(copy(1, 'Avon Road', 3));
    await closeOfflineDb();
    expect((await outboxItems()).map((i) => i.key)).toEqual([a.key]);
    expect((await keptBridge(1))?.revision).toBe(3);
  });
});

describe('moving the earlier localStorage queue', () => {
  function storage(entries: Record<string, string>): Storage {
    const map = new Map(Object.entries(entries));
    return {
      get length() {
        return map.size;
      },
      key: (i: number) => [...map.keys()][i] ?? null,
      getItem: (k: string) => map.get(k) ?? null,
      setItem: (k: string, v: string) => void map.set(k, v),
      removeItem: (k: string) => void map.delete(k),
      clear: () => map.clear(),
    };
  }

  it('moves every waiting measurement in order under its own key, once, and empties the old entry', async () => {
    const old = [
      {
        key: '0b6c1f8e-1111-4a5b-9c3d-000000000001',
        span: 2,
        girder: 'G5',
        point: 3,
        measured_edge_width: 4.51,
        measured_drop_from_girder_top: 0.3,
        note: 'a',
        typedAt: '2026-12-01T15:00:00.000Z',
        attempts: 2,
        lastError: 'x',
      },
      {
        key: '0b6c1f8e-1111-4a5b-9c3d-000000000002',
        span: 2,
        girder: 'G5',
        point: 4,
        measured_edge_width: null,
        measured_drop_from_girder_top: 0.31,
        note: '',
        typedAt: '2026-12-01T15:01:00.000Z',
        attempts: 0,
        lastError: null,
      },
    ];
    const store = storage({ [`${LEGACY_PREFIX}5`]: JSON.stringify(old), 'other.key': 'kept' });
    expect(await migrateLegacyQueue(ann, store)).toBe(2);
    expect(store.getItem(`${LEGACY_PREFIX}5`)).toBeNull();
    expect(store.getItem('other.key')).toBe('kept');
    const moved = await outboxItems(5);
    expect(moved.map((i) => i.key)).toEqual(old.map((o) => o.key));
    expect(moved[0]).toMatchObject({ kind: 'check', userId: ann.id, takenAt: old[0].typedAt, revision: null, attempts: 0, lastError: null });
    if (moved[1].kind === 'check') expect(moved[1].body).toEqual({ span: 2, girder: 'G5', point: 4, measured_edge_width: null, measured_drop_from_girder_top: 0.31, note: '' });
    // A second run (the old entry written again by an old tab) adds nothing twice.
    store.setItem(`${LEGACY_PREFIX}5`, JSON.stringify(old));
    expect(await migrateLegacyQueue(ann, store)).toBe(0);
    expect(await outboxCount()).toBe(2);
  });

  it('drops an unreadable entry without failing', async () => {
    const store = storage({ [`${LEGACY_PREFIX}9`]: '{not json' });
    expect(await migrateLegacyQueue(ann, store)).toBe(0);
    expect(store.length).toBe(0);
  });
});
