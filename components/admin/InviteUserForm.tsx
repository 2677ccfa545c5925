'use client';

import { useId, useState } from 'react';
import { mutate } from 'swr';
import { ROLES, ROLE_LABELS } from '@/lib/auth/roles';
import { ApiError, sendJson } from '@/lib/client/api-client';
import { dateTimeText } from '@/lib/units';
import type { PublicUserRow } from '@/components/admin/public-user';

const EMPTY = { name: '', email: '', role: 'crew' };

type Answer = { user: PublicUserRow; via: 'smtp' | 'outbox' };

/** What the administrator is told after a link was mailed: where it went and until when it works. */
export function sentText(email: string, via: 'smtp' | 'outbox', what: string, expiresAt: string | null): string {
  const until = expiresAt ? ` It works once, until ${dateTimeText(expiresAt)}.` : '';
  return via === 'smtp' ? `${what} sent to ${email}.${until}` : `${what} for ${email} is in the Outbox (no mail server is set up): pass the link on from there.${until}`;
}

/**
 * Invites a person by e-mail (POST /api/admin/users/invite): the account is made without a password
 * and the person chooses their own from the one-time link (24 hours). Field errors show at each field.
 */
export default function InviteUserForm() {
  const id = useId();
  const [values, setValues] = useState(EMPTY);
  const [fields, setFields] = useState<Record<string, string[]>>({});
  const [message, setMessage] = useState<{ kind: 'ok' | 'error'; text: string } | null>(null);
  const [busy, setBusy] = useState(false);

  function set<K extends keyof typeof EMPTY>(key: K, value: string) {
    setValues((v) => ({ ...v, [key]: value }));
  }

  async function onSubmit(event: React.FormEvent<HTMLFormElement>) {
    event.preventDefault();
    setBusy(true);
    setFields({});
    setMessage(null);
    const local: Record<string, string[]> = {};
    if (!values.email.trim()) local.email = ['Enter a valid e-mail address.'];
    if (!values.name.trim()) local.name = ['Enter a name.'];
    if (Object.keys(local).length) {
      setFields(local);
      setBusy(false);
      return;
    }
    try {
      const sent = await sendJson<Answer>('/api/admin/users/invite', 'POST', { ...values, email: values.email.trim() });
      await mutate('/api/admin/users');
      setValues(EMPTY);
      setMessage({ kind: 'ok', text: sentText(sent.user.email, sent.via, 'Invite', sent.user.inviteExpiresAt) });
    } catch (err) {
      const e = err as ApiError;
      setFields(e.fields ?? {});
      setMessage({ kind: 'error', text: e.message });
      // A mail failure still made the account (pending): show it in the list.
      if (e.status === 502) await mutate('/api/admin/users');
    }
    setBusy(false);
  }

  const field = (key: keyof typeof EMPTY, label: string, input: React.ReactNode) => {
    const errors = fields[key];
    return (
      <div>
        <label htmlFor={`${id}-${key}`} className="field-label">
          {label}
        </label>
        {input}
        {errors ? (
          <p id={`${id}-${key}-error`} className="field-error">
            {errors.join(' ')}
          </p>
        ) : null}
      </div>
    );
  };
  const aria = (key: keyof typeof EMPTY) => (fields[key] ? { 'aria-invalid': true as const, 'aria-describedby': `${id}-${key}-error` } : {});

  return (
    <form onSubmit={onSubmit} noValidate className="card space-y-4 p-6">
      <div>
        <h2 className="text-lg font-bold text-concrete-900">Invite by e-mail</h2>
        <p className="mt-1 text-sm text-concrete-600">The person gets a link to choose their own password. It works once, within 24 hours; until then the invite shows as pending below.</p>
      </div>
      <div className="grid gap-4 sm:grid-cols-3">
        {field(
          'name',
          'Name',
          <input id={`${id}-name`} maxLength={120} autoComplete="off" value={values.name} onChange={(e) => set('name', e.target.value)} className="field-input" {...aria('name')} />,
        )}
        {field(
          'email',
          'E-mail',
          <input id={`${id}-email`} type="email" maxLength={254} autoComplete="off" value={values.email} onChange={(e) => set('email', e.target.value)} className="field-input" {...aria('email')} />,
        )}
        {field(
          'role',
          'Role',
          <select id={`${id}-role`} value={values.role} onChange={(e) => set('role', e.target.value)} className="field-input" {...aria('role')}>
            {ROLES.map((r) => (
              <option key={r} value={r}>
                {ROLE_LABELS[r]}
              </option>
            ))}
          </select>,
        )}
      </div>
      {message ? (
        <p role={message.kind === 'error' ? 'alert' : 'status'} className={`text-sm ${message.kind === 'error' ? 'text-fail-600' : 'text-pass-700'}`}>
          {message.text}
        </p>
      ) : null}
      <button type="submit" className="btn-primary" disabled={busy}>
        {busy ? 'Sending invite…' : 'Send invite'}
      </button>
    </form>
  );
}
