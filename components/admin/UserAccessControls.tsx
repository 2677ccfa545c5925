'use client';

import { useState } from 'react';
import { mutate } from 'swr';
import { ApiError, sendJson } from '@/lib/client/api-client';
import type { PublicUserRow } from '@/components/admin/public-user';

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
        <div role="alertdialog" aria-labelledby={`remove-${user.id}`} className="rounded-md border border-fail-600 bg-fail-100 p-3">
          <p id={`remove-${user.id}`} className="text-sm font-semibold text-concrete-900">
            Remove {user.name}? They are signed out everywhere and can no longer sign in. Their checks, revisions and photos keep their name.
          </p>
          <div className="mt-2 flex flex-wrap gap-2">
            <button type="button" className="btn-danger" onClick={() => void remove()} disabled={busy} autoFocus>
              {busy ? 'Removing…' : 'Yes, remove this user'}
            </button>
            <button type="button" className="btn-secondary" onClick={() => setConfirming(false)} disabled={busy}>
              Keep
            </button>
          </div>
        </div>
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
