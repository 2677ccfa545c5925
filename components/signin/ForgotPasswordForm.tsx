'use client';

import Link from 'next/link';
import { useState } from 'react';
import { ApiError, sendJson } from '@/lib/client/api-client';

/**
 * Asks for a password-reset link (POST /api/password-reset). Every accepted request gets the
 * server's one neutral answer, which never says whether the address has an account.
 */
export default function ForgotPasswordForm() {
  const [email, setEmail] = useState('');
  const [busy, setBusy] = useState(false);
  const [answer, setAnswer] = useState<string | null>(null);
  const [error, setError] = useState<{ text: string; field: boolean } | null>(null);

  async function onSubmit(event: React.FormEvent<HTMLFormElement>) {
    event.preventDefault();
    setBusy(true);
    setError(null);
    try {
      const res = await sendJson<{ message: string }>('/api/password-reset', 'POST', { email: email.trim() });
      setAnswer(res.message);
    } catch (err) {
      const e = err as ApiError;
      setError({ text: e.fields?.email?.join(' ') ?? e.message, field: Boolean(e.fields?.email) });
    }
    setBusy(false);
  }

  if (answer) {
    return (
      <div className="space-y-4">
        <p role="status" className="rounded-md border border-pass-600 bg-pass-100 px-3 py-2 text-sm text-pass-700">
          {answer}
        </p>
        <Link href="/signin" className="btn-secondary inline-block">
          Back to sign in
        </Link>
      </div>
    );
  }

  return (
    <form onSubmit={onSubmit} noValidate className="space-y-4">
      {error && !error.field ? (
        <p role="alert" className="rounded-md border border-fail-600 bg-fail-100 px-3 py-2 text-sm text-fail-600">
          {error.text}
        </p>
      ) : null}
      <div>
        <label htmlFor="reset-email" className="field-label">
          E-mail
        </label>
        <input
          id="reset-email"
          name="email"
          type="email"
          autoComplete="username"
          required
          maxLength={254}
          value={email}
          onChange={(e) => setEmail(e.target.value)}
          className="field-input"
          aria-invalid={error?.field ? true : undefined}
          aria-describedby={error?.field ? 'reset-email-error' : undefined}
        />
        {error?.field ? (
          <p id="reset-email-error" className="field-error">
            {error.text}
          </p>
        ) : null}
      </div>
      <button type="submit" className="btn-primary w-full" disabled={busy || !email.trim()}>
        {busy ? 'Sending…' : 'Send me a link'}
      </button>
      <p className="text-sm text-concrete-600">
        <Link href="/signin" className="font-semibold text-brand-700 underline-offset-2 hover:underline">
          Back to sign in
        </Link>
      </p>
    </form>
  );
}
