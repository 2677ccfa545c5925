'use client';

import { useState } from 'react';
import { mutate } from 'swr';
import { ApiError, sendJson } from '@/lib/client/api-client';
import type { PublicUserRow } from '@/components/admin/public-user';
import ConfirmPanel from './ConfirmPanel';

/**
 * Disable or enable an account (PATCH { disabled }), or remove it after a second, explicit
 * confirmation (DELETE). Either ends every session of the account at once; removal keeps its
 * checks, revisions and photos under its name. Not offered on the administrator's own row.
 */
export default function UserAccessControls({ user, isSelf }: { user: PublicUserRow; isSelf: boolean }) {
  const [confirming, setConfirming] = useState(false);
  const [busy, setBusy] = useState(false);
  const [error, setError] = useState<string | null>(null);

  if (isSelf) return <p className="text-sm text-concrete-600">Your own account: another administrator can disable or remove it.</p>;

  async function run(work: () => Promise<unknown>) {
    setBusy(true);
    setError(null);
    try {
      await work();
      await mutate('/api/admin/users');
      setConfirming(false);
    } catch (err) {
      setError((err as ApiError).message);
    }
    setBusy(false);
  }

  const toggle = () => run(() => sendJson(`/api/admin/users/${user.id}`, 'PATCH', { disabled: !user.disabled }));
  const remove = () => run(() => sendJson(`/api/admin/users/${user.id}`, 'DELETE'));

  return (
    <div className="space-y-2">
      {confirming ? (
        <ConfirmPanel
          id={`remove-${user.id}`}
          question={`Remove ${user.name}? They are signed out everywhere and can no longer sign in. Their checks, revisions and photos keep their name.`}
          confirmLabel="Yes, remove this user"
          busyLabel="Removing…"
          busy={busy}
          onConfirm={() => void remove()}
          onKeep={() => setConfirming(false)}
        />
      ) : (
        <div className="flex flex-wrap gap-2">
          <button type="button" className="btn-secondary" onClick={() => void toggle()} disabled={busy}>
            {user.disabled ? 'Enable' : 'Disable'}
          </button>
          <button type="button" className="btn-danger" onClick={() => setConfirming(true)} disabled={busy}>
            Remove
          </button>
        </div>
      )}
      {error ? (
        <p role="alert" className="field-error">
          {error}
        </p>
      ) : null}
    </div>
  );
}
