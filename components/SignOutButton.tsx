'use client';

import { signOut } from 'next-auth/react';
import { useState } from 'react';

/** Ends the session and returns to the sign-in page. */
export default function SignOutButton() {
  const [busy, setBusy] = useState(false);
  return (
    <button
      type="button"
      disabled={busy}
      onClick={() => {
        setBusy(true);
        void signOut({ callbackUrl: '/signin' });
      }}
      className="rounded-md border border-brand-300/60 px-3 py-1.5 text-sm font-semibold text-white hover:bg-brand-700 disabled:opacity-60"
    >
      {busy ? 'Signing out…' : 'Sign out'}
    </button>
  );
}
