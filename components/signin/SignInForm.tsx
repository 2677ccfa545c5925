'use client';

import { signIn } from 'next-auth/react';
import { useRouter } from 'next/navigation';
import { useState, useSyncExternalStore } from 'react';
import { safeCallbackPath } from '@/lib/auth/safe-callback';
import { LOCKED, signInErrorText, WRONG_CREDENTIALS } from '@/components/signin/signin-messages';

const noSubscription = () => () => undefined;

/** The address the browser shows for this page; null while rendering on the server. */
function usePageOrigin(): string | null {
  return useSyncExternalStore(
    noSubscription,
    () => window.location.origin,
    () => null,
  );
}

/**
 * E-mail and password sign-in. A failure never says which of the two was wrong; an account locked
 * after repeated failures gets its own message. Opened at another address than the app's own (say
 * 127.0.0.1 where the app is set up as localhost), signing in would be refused as a cross-site
 * request, so the form says so and links to the app's own address instead.
 */
export default function SignInForm({ callbackUrl, initialError, appOrigin }: { callbackUrl?: string; initialError?: string; appOrigin: string }) {
  const router = useRouter();
  const pageOrigin = usePageOrigin();
  const elsewhere = pageOrigin !== null && pageOrigin !== appOrigin;
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

  if (elsewhere) {
    const here = `${appOrigin}/signin${callbackUrl ? `?callbackUrl=${encodeURIComponent(safeCallbackPath(callbackUrl, appOrigin))}` : ''}`;
    return (
      <div role="alert" className="space-y-3 rounded-md border border-fail-600 bg-fail-100 px-3 py-3 text-sm text-fail-600" data-testid="signin-elsewhere">
        <p>
          This Chordline is set up to be opened at <strong>{appOrigin}</strong>, and this page was opened at <strong>{pageOrigin}</strong>. Signing in from here would be refused as a request from
          another site.
        </p>
        <p>
          <a href={here} className="btn-primary inline-block">
            Open the sign-in page at {appOrigin}
          </a>
        </p>
        <p className="text-concrete-700">If people reach the app at another address, the administrator sets NEXTAUTH_URL to that address (see the README).</p>
      </div>
    );
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
