import { offlineDb, type CheckBody, type OutboxCheck, type OutboxItem, type OutboxPhoto } from './offline-db';

/** Who is taking the measurement: every item keeps it and is sent only under that account. */
export type OutboxUser = { id: number; email: string };

/** A new client key: letters, digits and dashes, as the server's client_key rule asks. */
export function newClientKey(): string {
  if (typeof crypto !== 'undefined' && 'randomUUID' in crypto) return crypto.randomUUID();
  return `${Date.now().toString(36)}-${Math.random().toString(36).slice(2, 12)}`;
}

/** Puts a measurement at the end of the queue; it keeps the revision whose targets were on screen. */
export async function queueCheck(user: OutboxUser, bridgeId: number, revision: number | null, body: CheckBody, key = newClientKey(), takenAt = new Date().toISOString()): Promise<OutboxCheck> {
  const item: OutboxCheck = { kind: 'check', key, bridgeId, userId: user.id, userEmail: user.email, takenAt, attempts: 0, lastError: null, revision, body };
  const db = await offlineDb();
  item.seq = await db.add('outbox', item);
  return item;
}

/** Puts a photo at the end of the queue, for a saved check (its id) or a waiting one (its key). */
export async function queuePhoto(user: OutboxUser, bridgeId: number, photo: Pick<OutboxPhoto, 'blob' | 'name' | 'checkId' | 'checkKey' | 'span' | 'girder' | 'point'>): Promise<OutboxPhoto> {
  const item: OutboxPhoto = {
    kind: 'photo',
    key: newClientKey(),
    bridgeId,
    userId: user.id,
    userEmail: user.email,
    takenAt: new Date().toISOString(),
    attempts: 0,
    lastError: null,
    ...photo,
  };
  const db = await offlineDb();
  item.seq = await db.add('outbox', item);
  return item;
}

/** Waiting items in the order taken; only one bridge's when given. */
export async function outboxItems(bridgeId?: number): Promise<OutboxItem[]> {
  const db = await offlineDb();
  const items = bridgeId === undefined ? await db.getAll('outbox') : await db.getAllFromIndex('outbox', 'by-bridge', bridgeId);
  return items.sort((a, b) => (a.seq ?? 0) - (b.seq ?? 0));
}

/** How many items wait, in all or for one user. */
export async function outboxCount(userId?: number): Promise<number> {
  const db = await offlineDb();
  return userId === undefined ? db.count('outbox') : db.countFromIndex('outbox', 'by-user', userId);
}

/**
 * The server has a check: it leaves the queue, and photos waiting for it learn its id, in one
 * transaction, so a closed browser never leaves a photo without its check.
 */
export async function checkSent(key: string, checkId: number): Promise<void> {
  const db = await offlineDb();
  const tx = db.transaction('outbox', 'readwrite');
  const item = await tx.store.index('by-key').get(key);
  if (item?.seq !== undefined) await tx.store.delete(item.seq);
  let cursor = await tx.store.openCursor();
  while (cursor) {
    const v = cursor.value;
    if (v.kind === 'photo' && v.checkKey === key) await cursor.update({ ...v, checkId, checkKey: null });
    cursor = await cursor.continue();
  }
  await tx.done;
}

/** Removes one item (sent, or refused by the server). */
export async function removeItem(key: string): Promise<void> {
  const db = await offlineDb();
  const tx = db.transaction('outbox', 'readwrite');
  const item = await tx.store.index('by-key').get(key);
  if (item?.seq !== undefined) await tx.store.delete(item.seq);
  await tx.done;
}

/** Records a failed attempt; the item stays in its place. Returns the attempts so far. */
export async function noteFailure(key: string, why: string, countAttempt = true): Promise<number> {
  const db = await offlineDb();
  const tx = db.transaction('outbox', 'readwrite');
  const item = await tx.store.index('by-key').get(key);
  let attempts = 0;
  if (item) {
    attempts = item.attempts + (countAttempt ? 1 : 0);
    await tx.store.put({ ...item, attempts, lastError: why });
  }
  await tx.done;
  return attempts;
}

/** Deletes every waiting item of one user (signing out, after asking). */
export async function clearUserItems(userId: number): Promise<number> {
  const db = await offlineDb();
  const tx = db.transaction('outbox', 'readwrite');
  let removed = 0;
  let cursor = await tx.store.index('by-user').openCursor(userId);
  while (cursor) {
    await cursor.delete();
    removed++;
    cursor = await cursor.continue();
  }
  await tx.done;
  return removed;
}
