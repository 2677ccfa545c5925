import type { CheckRow } from '@/components/checks/check-types';
import type { OutboxCheck, OutboxItem, OutboxPhoto } from './offline-db';
import { emitOutbox } from './outbox-events';
import { addKeptCheck } from './kept-bridges';
import { checkSent, noteFailure, outboxItems, removeItem } from './outbox';

/** How a run ended: everything of this user sent, or why it stopped (the next run starts there). */
export type SendRun = { sent: number; stopped: null | 'offline' | 'busy' | 'signed-out'; attempts: number };

const SIGNED_OUT = 'Signed out: sign in again to send.';
const NO_CONNECTION = 'No connection: kept on this phone, will resend.';

/** The signed-in user's id as the server sees it now, null when signed out; throws when unreachable. */
async function sessionUserId(): Promise<number | null> {
  const res = await fetch('/api/auth/session', { headers: { accept: 'application/json' }, cache: 'no-store' });
  if (!res.ok) throw new Error(`session ${res.status}`);
  const body = (await res.json().catch(() => ({}))) as { user?: { id?: number } };
  const id = Number(body.user?.id);
  return Number.isInteger(id) && id > 0 ? id : null;
}

async function timedFetch(url: string, init: RequestInit): Promise<Response> {
  const controller = new AbortController();
  const timer = setTimeout(() => controller.abort(), 30000);
  try {
    return await fetch(url, { ...init, signal: controller.signal });
  } finally {
    clearTimeout(timer);
  }
}

function sendCheck(item: OutboxCheck): Promise<Response> {
  return timedFetch(`/api/bridges/${item.bridgeId}/checks`, {
    method: 'POST',
    headers: { 'content-type': 'application/json', accept: 'application/json' },
    body: JSON.stringify({ ...item.body, client_key: item.key, ...(item.revision !== null ? { revision: item.revision } : {}) }),
  });
}

function sendPhoto(item: OutboxPhoto): Promise<Response> {
  const form = new FormData();
  form.append('file', item.blob, item.name);
  form.append('client_key', item.key);
  if (item.checkId !== null) form.append('check_id', String(item.checkId));
  else form.append('caption', `Span ${item.span}, ${item.girder}, point ${item.point}: its measurement was not recorded.`);
  return timedFetch(`/api/bridges/${item.bridgeId}/attachments`, { method: 'POST', body: form, headers: { accept: 'application/json' } });
}

const describe = (item: OutboxItem) =>
  item.kind === 'check' ? `span ${item.body.span}, ${item.body.girder}, point ${item.body.point}` : `the photo of span ${item.span}, ${item.girder}, point ${item.point}`;

/** One item to the server. true: done (sent or refused for good); else why it must wait. */
async function sendOne(item: OutboxItem): Promise<true | 'offline' | 'busy' | 'signed-out'> {
  let res: Response;
  try {
    res = item.kind === 'check' ? await sendCheck(item) : await sendPhoto(item);
  } catch {
    await noteFailure(item.key, NO_CONNECTION);
    return 'offline';
  }
  if (res.ok) {
    const body = await res.json().catch(() => null);
    if (item.kind === 'check') {
      const check = body as CheckRow;
      await checkSent(item.key, check.id);
      await addKeptCheck(item.bridgeId, check);
      emitOutbox({ type: 'saved', bridgeId: item.bridgeId, check, key: item.key });
    } else {
      await removeItem(item.key);
      emitOutbox({ type: 'photo-saved', bridgeId: item.bridgeId, checkId: item.checkId, key: item.key });
    }
    return true;
  }
  if (res.status === 401) {
    await noteFailure(item.key, SIGNED_OUT, false);
    return 'signed-out';
  }
  if (res.status >= 400 && res.status < 500 && res.status !== 408 && res.status !== 429) {
    const body = (await res.json().catch(() => ({}))) as { error?: string };
    await removeItem(item.key);
    emitOutbox({ type: 'refused', bridgeId: item.bridgeId, key: item.key, what: describe(item), reason: body.error ?? `The server refused it (${res.status}).` });
    return true;
  }
  await noteFailure(item.key, `Server busy (${res.status}): kept on this phone, will resend.`);
  return 'busy';
}

async function run(): Promise<SendRun> {
  let userId: number | null;
  try {
    userId = await sessionUserId();
  } catch {
    return { sent: 0, stopped: 'offline', attempts: 0 };
  }
  let sent = 0;
  for (;;) {
    const items = await outboxItems();
    if (userId === null) {
      for (const item of items.filter((i) => i.lastError !== SIGNED_OUT)) await noteFailure(item.key, SIGNED_OUT, false);
      if (items.length) emitOutbox({ type: 'changed' });
      return { sent, stopped: items.length ? 'signed-out' : null, attempts: 0 };
    }
    // Only what this user took: another person's measurements wait for them to sign in.
    const head = items.find((i) => i.userId === userId);
    if (!head) return { sent, stopped: null, attempts: 0 };
    const outcome = await sendOne(head);
    emitOutbox({ type: 'changed' });
    if (outcome !== true) return { sent, stopped: outcome, attempts: head.attempts + 1 };
    sent++;
  }
}

let running: Promise<SendRun> | null = null;
/** Asked again while a run was finishing: run once more, so an item added at that moment is not left waiting. */
let again = false;

function runLocked(): Promise<SendRun> {
  const locks = typeof navigator !== 'undefined' ? navigator.locks : undefined;
  return locks ? (async () => await locks.request('chordline-outbox', () => run()))() : run();
}

/**
 * Sends this user's waiting items to the server one by one, in the order taken, each with its client
 * key, so a resend after a lost answer is recorded once. Runs once at a time per page and, where the
 * browser has Web Locks, once at a time across tabs. A check goes before its photos; a photo learns its
 * check's id from the store when the check is saved.
 */
export function sendOutbox(): Promise<SendRun> {
  if (running) {
    again = true;
    return running;
  }
  const current = (async () => {
    let result = await runLocked();
    while (again && result.stopped === null) {
      again = false;
      const next = await runLocked();
      result = { ...next, sent: result.sent + next.sent };
    }
    again = false;
    return result;
  })().finally(() => {
    running = null;
  });
  running = current;
  return current;
}
