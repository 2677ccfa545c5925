'use client';

import { useRouter } from 'next/navigation';
import { useState } from 'react';
import { mutate } from 'swr';
import { ApiError, sendJson } from '@/lib/client/api-client';

/** Deletes a bridge and all its revisions after a second, explicit confirmation (administrators). */
export default function DeleteBridgeButton({ bridgeId, name }: { bridgeId: number; name: string }) {
  const router = useRouter();
  const [confirming, setConfirming] = useState(false);
  const [busy, setBusy] = useState(false);
  const [error, setError] = useState<string | null>(null);

  if (!confirming) {
    return (
      <button type="button" className="btn-danger" onClick={() => setConfirming(true)}>
        Delete
      </button>
    );
  }

  async function onDelete() {
    setBusy(true);
    setError(null);
    try {
      await sendJson(`/api/bridges/${bridgeId}`, 'DELETE');
      await mutate('/api/bridges');
      router.push('/bridges');
      router.refresh();
      return;
    } catch (err) {
      setError((err as ApiError).message);
    }
    setBusy(false);
  }

  return (
    <div role="alertdialog" aria-labelledby="delete-bridge-question" className="w-full rounded-md border border-fail-600 bg-fail-100 p-4">
      <p id="delete-bridge-question" className="font-semibold text-concrete-900">
        Delete “{name}” and all of its revisions? This cannot be undone.
      </p>
      {error ? <p className="field-error">{error}</p> : null}
      <div className="mt-3 flex gap-2">
        <button type="button" className="btn-danger" onClick={onDelete} disabled={busy} autoFocus>
          {busy ? 'Deleting…' : 'Yes, delete this bridge'}
        </button>
        <button type="button" className="btn-secondary" onClick={() => setConfirming(false)} disabled={busy}>
          Keep it
        </button>
      </div>
    </div>
  );
}
