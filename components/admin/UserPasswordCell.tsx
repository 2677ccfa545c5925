'use client';

import { useState } from 'react';
import { mutate } from 'swr';
import { ApiError, sendJson } from '@/lib/client/api-client';
import { dateTimeText } from '@/lib/units';
import type { PublicUserRow } from '@/components/admin/public-user';
import { sentText } from '@/components/admin/InviteUserForm';
import ConfirmPanel from './ConfirmPanel';

/**
 * The sign-in column of one user. A pending invite: when its link stops working, "Re-send invite"
 * (a new link; the old one stops working) and "Withdraw invite" (the unused account is deleted). An
 * active account: "Send reset link", which mails the person a one-time link to choose a new
 * password, so no administrator ever types or passes on a password.
 */
export default function UserPasswordCell({ user }: { user: PublicUserRow }) {
  const [busy, setBusy] = useState(false);
  const [note, setNote] = useState<{ kind: 'ok' | 'error'; text: string } | null>(null);
  const [confirming, setConfirming] = useState(false);

  async function run(work: () => Promise<string | null>) {
    setBusy(true);
    setNote(null);
    try {
      const text = await work();
      await mutate('/api/admin/users');
      if (text) setNote({ kind: 'ok', text });
    } catch (err) {
      setNote({ kind: 'error', text: (err as ApiError).message });
    }
    setBusy(false);
    setConfirming(false);
  }

  const resend = () =>
    run(async () => {
      const a = await sendJson<{ user: PublicUserRow; via: 'smtp' | 'outbox' }>(`/api/admin/users/${user.id}/invite`, 'POST');
      return sentText(user.email, a.via, 'New invite', a.user.inviteExpiresAt);
    });
  const withdraw = () => run(async () => (await sendJson(`/api/admin/users/${user.id}/invite`, 'DELETE'), null));
  const sendReset = () =>
    run(async () => {
      const a = await sendJson<{ via: 'smtp' | 'outbox'; expires_at: string }>(`/api/admin/users/${user.id}/reset-link`, 'POST');
      return sentText(user.email, a.via, 'Reset link', a.expires_at);
    });

  const expired = user.inviteExpired;
  return (
    <div className="space-y-2">
      {user.invitePending ? (
        <>
          <p className="text-sm">
            <span className={`whitespace-nowrap rounded px-1.5 py-0.5 text-xs font-semibold ${expired ? 'bg-fail-100 text-fail-600' : 'bg-caution-100 text-caution-700'}`}>
              {expired ? 'Invite expired' : 'Invite pending'}
            </span>
            {user.inviteExpiresAt ? (
              <span className="ml-2 text-concrete-600">
                {expired ? 'Link ended' : 'Link works until'} {dateTimeText(user.inviteExpiresAt)}
              </span>
            ) : null}
          </p>
          {confirming ? (
            <ConfirmPanel
              id={`withdraw-${user.id}`}
              question={`Withdraw the invite to ${user.email}? The link stops working and the unused account is deleted.`}
              confirmLabel="Yes, withdraw"
              busyLabel="Withdrawing…"
              busy={busy}
              onConfirm={() => void withdraw()}
              onKeep={() => setConfirming(false)}
            />
          ) : (
            <div className="flex flex-wrap gap-2">
              <button type="button" className="btn-secondary" onClick={() => void resend()} disabled={busy}>
                {busy ? 'Sending…' : 'Re-send invite'}
              </button>
              <button type="button" className="btn-danger" onClick={() => setConfirming(true)} disabled={busy}>
                Withdraw invite
              </button>
            </div>
          )}
        </>
      ) : (
        <button type="button" className="btn-secondary" onClick={() => void sendReset()} disabled={busy || user.disabled} title={user.disabled ? 'Enable the account first' : undefined}>
          {busy ? 'Sending…' : 'Send reset link'}
        </button>
      )}
      {note ? (
        <p role={note.kind === 'error' ? 'alert' : 'status'} className={`text-sm ${note.kind === 'error' ? 'text-fail-600' : 'text-pass-700'}`}>
          {note.text}
        </p>
      ) : null}
    </div>
  );
}
