import type { CheckRow } from '@/components/checks/check-types';

/** What happens to the waiting items: other parts of the page (and other tabs) follow along. */
export type OutboxEvent =
  | { type: 'changed' }
  | { type: 'saved'; bridgeId: number; check: CheckRow; key: string }
  | { type: 'photo-saved'; bridgeId: number; checkId: number | null; key: string }
  | { type: 'refused'; bridgeId: number; key: string; what: string; reason: string }
  | { type: 'send-now' };

const CHANNEL = 'chordline-outbox';
const local = typeof EventTarget !== 'undefined' ? new EventTarget() : null;
let channel: BroadcastChannel | null = null;

function broadcast(): BroadcastChannel | null {
  if (!channel && typeof BroadcastChannel !== 'undefined') channel = new BroadcastChannel(CHANNEL);
  return channel;
}

/**
 * Tells this page and every other Chordline tab. A BroadcastChannel delivers to every other channel
 * object of the name, this page's listeners included; without one, only this page hears.
 */
export function emitOutbox(event: OutboxEvent): void {
  const bc = broadcast();
  if (!bc) {
    local?.dispatchEvent(new CustomEvent(CHANNEL, { detail: event }));
    return;
  }
  try {
    bc.postMessage(event);
  } catch {
    // Not cloneable: this page still hears it.
    local?.dispatchEvent(new CustomEvent(CHANNEL, { detail: event }));
  }
}

/** Follows outbox events from this page and other tabs; returns the unsubscribe function. */
export function onOutbox(listener: (event: OutboxEvent) => void): () => void {
  const fromPage = (e: Event) => listener((e as CustomEvent<OutboxEvent>).detail);
  const fromChannel = (e: MessageEvent<OutboxEvent>) => listener(e.data);
  local?.addEventListener(CHANNEL, fromPage);
  const own = typeof BroadcastChannel !== 'undefined' ? new BroadcastChannel(CHANNEL) : null;
  own?.addEventListener('message', fromChannel);
  return () => {
    local?.removeEventListener(CHANNEL, fromPage);
    own?.close();
  };
}
