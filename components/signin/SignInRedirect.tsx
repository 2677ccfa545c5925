'use client';

import { useEffect } from 'react';

/**
 * Shown by the signed-in layout when there is no session: sends the browser to the sign-in page
 * with the address it asked for, so it comes back there afterwards. A plain link for when scripts
 * do not run.
 */
export default function SignInRedirect() {
  useEffect(() => {
    const back = `${window.location.pathname}${window.location.search}`;
    window.location.replace(`/signin?callbackUrl=${encodeURIComponent(back)}`);
  }, []);
  return (
    <main className="mx-auto max-w-md px-4 py-16 text-center">
      <p className="text-concrete-700">
        Your session has ended.{' '}
        <a href="/signin" className="font-semibold text-brand-700 underline">
          Sign in
        </a>{' '}
        to continue.
      </p>
    </main>
  );
}
