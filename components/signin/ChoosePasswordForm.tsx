'use client';

import Link from 'next/link';
import { useState } from 'react';
import { ApiError, sendJson } from '@/lib/client/api-client';

const MIN = 10;

/**
 * Chooses a password from an e-mailed link (POST /api/password-links). The same rules as everywhere
 * (10 to 200 characters); typed twice. The link works once: a second use gets the server's
 * "used or has expired" answer.
 */
export default function ChoosePasswordForm({ purpose, token, email }: { purpose: 'invite' | 'reset'; token: string; email: string }) {
  const [password, setPassword] = useState('');
  const [again, setAgain] = useState('');
  const [busy, setBusy] = useState(false);
  const [done, setDone] = useState(false);
  const [fields, setFields] = useState<{ password?: string; again?: string }>({});
  const [message, setMessage] = useState<string | null>(null);

  async function onSubmit(event: React.FormEvent<HTMLFormElement>) {
    event.preventDefault();
    setFields({});
    setMessage(null);
    if (password.length < MIN) return setFields({ password: `Use at least ${MIN} characters.` });
    if (password !== again) return setFields({ again: 'The two passwords are not the same.' });
    setBusy(true);
    try {
      await sendJson('/api/password-links', 'POST', { purpose, token, password });
      setDone(true);
    } catch (err) {
      const e = err as ApiError;
      if (e.fields?.password) setFields({ password: e.fields.password.join(' ') });
      else setMessage(e.message);
    }
    setBusy(false);
  }

  if (done) {
    return (
      <div className="space-y-4">
        <p role="status" className="rounded-md border border-pass-600 bg-pass-100 px-3 py-2 text-sm text-pass-700">
          Your password is saved{purpose === 'reset' ? ' and the account is signed out everywhere else' : ''}. Sign in with {email} and your new password.
        </p>
        <Link href="/signin" className="btn-primary inline-block">
          Go to sign in
        </Link>
      </div>
    );
  }

  const described = (key: 'password' | 'again') => (fields[key] ? { 'aria-invalid': true as const, 'aria-describedby': `choose-${key}-error` } : {});
  return (
    <form onSubmit={onSubmit} noValidate className="space-y-4">
      {message ? (
        <p role="alert" className="rounded-md border border-fail-600 bg-fail-100 px-3 py-2 text-sm text-fail-600">
          {message}
        </p>
      ) : null}
      {/* The account name for password managers, not editable. */}
      <input type="email" name="username" autoComplete="username" value={email} readOnly hidden />
      <div>
        <label htmlFor="choose-password" className="field-label">
          New password
        </label>
        <input
          id="choose-password"
          type="password"
          autoComplete="new-password"
          maxLength={200}
          value={password}
          onChange={(e) => setPassword(e.target.value)}
          className="field-input"
          {...described('password')}
        />
        {fields.password ? (
          <p id="choose-password-error" className="field-error">
            {fields.password}
          </p>
        ) : (
          <p className="mt-1 text-xs text-concrete-600">At least {MIN} characters. A few unrelated words make a good one.</p>
        )}
      </div>
      <div>
        <label htmlFor="choose-again" className="field-label">
          Type it again
        </label>
        <input id="choose-again" type="password" autoComplete="new-password" maxLength={200} value={again} onChange={(e) => setAgain(e.target.value)} className="field-input" {...described('again')} />
        {fields.again ? (
          <p id="choose-again-error" className="field-error">
            {fields.again}
          </p>
        ) : null}
      </div>
      <button type="submit" className="btn-primary w-full" disabled={busy || !password || !again}>
        {busy ? 'Saving…' : 'Save password'}
      </button>
    </form>
  );
}
