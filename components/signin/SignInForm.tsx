'use client';

import { signIn } from 'next-auth/react';
import { useRouter } from 'next/navigation';
import { useState } from 'react';
import { safeCallbackPath } from '@/lib/auth/safe-callback';
import { LOCKED, signInErrorText, WRONG_CREDENTIALS } from '@/components/signin/signin-messages';

/**
 * E-mail and password sign-in. A failure never says which of the two was wrong; an account locked
 * after repeated failures gets its own message.
 */
export default function SignInForm({ callbackUrl, initialError }: { callbackUrl?: string; initialError?: string }) {
  const router = useRouter();
  const [email, setEmail] = useState('');
  const [password, setPassword] = useState('');
  const [busy, setBusy] = useState(false);
  const [message, setMessage] = useState<string | null>(signInErrorText(initialError));

  async function onSubmit(event: React.FormEvent<HTMLFormElement>) {
    event.preventDefault();
    setBusy(true);
    setMessage(null);
    const target = safeCallbackPath(callbackUrl, window.location.origin);
    try {
      const result = await signIn('credentials', { redirect: false, email: email.trim(), password, callbackUrl: target });
      if (result?.ok && !result.error) {
        router.replace(target);
        router.refresh();
        return;
      }
      if (result?.error === 'locked' || result?.status === 429) setMessage(LOCKED);
      else if (result?.error === 'CredentialsSignin' || result?.status === 401) setMessage(WRONG_CREDENTIALS);
      else setMessage(signInErrorText(result?.error ?? 'Default'));
    } catch {
      setMessage('The server could not be reached. Check the connection and try again.');
    }
    setBusy(false);
  }

  return (
    <form onSubmit={onSubmit} noValidate className="space-y-4" aria-describedby={message ? 'signin-message' : undefined}>
      {message ? (
        <p id="signin-message" role="alert" className="rounded-md border border-fail-600 bg-fail-100 px-3 py-2 text-sm text-fail-600">
          {message}
        </p>
      ) : null}
      <div>
        <label htmlFor="email" className="field-label">
          E-mail
        </label>
        <input id="email" name="email" type="email" autoComplete="username" required value={email} onChange={(e) => setEmail(e.target.value)} className="field-input" />
      </div>
      <div>
        <label htmlFor="password" className="field-label">
          Password
        </label>
        <input id="password" name="password" type="password" autoComplete="current-password" required value={password} onChange={(e) => setPassword(e.target.value)} className="field-input" />
      </div>
      <button type="submit" className="btn-primary w-full" disabled={busy || !email.trim() || !password}>
        {busy ? 'Signing in…' : 'Sign in'}
      </button>
    </form>
  );
}
