'use client';

import type { KeptBridge } from '@/components/offline/offline-db';
import { savedTimeText } from './keep-for-field';

type Props = {
  kept: KeptBridge | null;
  online: boolean;
  busy: boolean;
  error: string | null;
  onKeep: () => void;
};

/**
 * "Keep on this phone": saves the bridge's revision, targets, tolerances and latest checks so field mode
 * opens on the deck without a connection. Once kept, says when, and updates on request.
 */
export default function KeepOnPhoneBar({ kept, online, busy, error, onKeep }: Props) {
  // Offline with a kept copy, the header already says where the numbers come from and when they were saved.
  if (!online && kept) return null;
  return (
    <div className="flex items-center gap-2 border-b border-brand-900 bg-brand-900 px-4 py-1.5 text-xs text-brand-50">
      <p className="min-w-0 flex-1" data-testid="kept-status">
        {kept
          ? `Kept on this phone · saved ${savedTimeText(kept.savedAt)} · revision ${kept.revision}`
          : online
            ? 'Not kept on this phone: field mode needs the network to open.'
            : 'Not kept on this phone: showing the page as last loaded.'}
      </p>
      {online ? (
        <button type="button" onClick={onKeep} disabled={busy} className="shrink-0 rounded-md border border-brand-300/60 px-2.5 py-1 font-semibold text-white hover:bg-brand-700 disabled:opacity-60">
          {busy ? 'Saving…' : kept ? 'Update' : 'Keep on this phone'}
        </button>
      ) : null}
      {error ? (
        <p role="alert" className="basis-full text-caution-100">
          {error}
        </p>
      ) : null}
    </div>
  );
}
