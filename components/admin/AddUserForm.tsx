'use client';

import { useId, useState } from 'react';
import { mutate } from 'swr';
import { ROLES, ROLE_LABELS } from '@/lib/auth/roles';
import { ApiError, sendJson } from '@/lib/client/api-client';

const EMPTY = { email: '', name: '', role: 'crew', password: '' };

/** Adds a user through POST /api/admin/users; the server's field errors show at each field. */
export default function AddUserForm() {
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
    if (values.password.length < 10) local.password = ['Use at least 10 characters.'];
    if (!values.email.trim()) local.email = ['Enter a valid e-mail address.'];
    if (!values.name.trim()) local.name = ['Enter a name.'];
    if (Object.keys(local).length) {
      setFields(local);
      setBusy(false);
      return;
    }
    try {
      const created = await sendJson<{ email: string }>('/api/admin/users', 'POST', values);
      await mutate('/api/admin/users');
      setValues(EMPTY);
      setMessage({ kind: 'ok', text: `Added ${created.email}. Give them the password by a separate, safe route.` });
    } catch (err) {
      const e = err as ApiError;
      setFields(e.fields ?? {});
      setMessage({ kind: 'error', text: e.message });
    }
    setBusy(false);
  }

  const field = (key: keyof typeof EMPTY, label: string, input: React.ReactNode, hint?: string) => {
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
        ) : hint ? (
          <p className="mt-1 text-xs text-concrete-600">{hint}</p>
        ) : null}
      </div>
    );
  };
  const aria = (key: keyof typeof EMPTY) => (fields[key] ? { 'aria-invalid': true as const, 'aria-describedby': `${id}-${key}-error` } : {});

  return (
    <form onSubmit={onSubmit} noValidate className="card space-y-4 p-6">
      <h2 className="text-lg font-bold text-concrete-900">Add a user</h2>
      <div className="grid gap-4 sm:grid-cols-2">
        {field(
          'email',
          'E-mail',
          <input id={`${id}-email`} type="email" autoComplete="off" value={values.email} onChange={(e) => set('email', e.target.value)} className="field-input" {...aria('email')} />,
        )}
        {field('name', 'Name', <input id={`${id}-name`} value={values.name} onChange={(e) => set('name', e.target.value)} className="field-input" {...aria('name')} />)}
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
        {field(
          'password',
          'Password',
          <input
            id={`${id}-password`}
            type="password"
            autoComplete="new-password"
            value={values.password}
            onChange={(e) => set('password', e.target.value)}
            className="field-input"
            {...aria('password')}
          />,
          'At least 10 characters.',
        )}
      </div>
      {message ? (
        <p role={message.kind === 'error' ? 'alert' : 'status'} className={`text-sm ${message.kind === 'error' ? 'text-fail-600' : 'text-pass-700'}`}>
          {message.text}
        </p>
      ) : null}
      <button type="submit" className="btn-primary" disabled={busy}>
        {busy ? 'Adding…' : 'Add user'}
      </button>
    </form>
  );
}
