'use client';

import { signOut } from 'next-auth/react';
import { useState } from 'react';
import { clearPhoneForSignOut } from '@/components/offline/clear-phone';
import { outboxCount } from '@/components/offline/outbox';

/**
 * Ends the session and returns to the sign-in page. Asks first when measurements or photos this user
 * took are still waiting on the phone (signing out deletes them); then clears the bridge data kept on
 * the phone.
 */
export default function SignOutButton({ userId }: { userId: number }) {
  const [state, setState] = useState<{ kind: 'idle' | 'asking' | 'busy'; waiting: number; note?: string }>({ kind: 'idle', waiting: 0 });

  async function leave() {
    setState((s) => ({ ...s, kind: 'busy' }));
    await clearPhoneForSignOut(userId);
    // Without a connection the server cannot end the session; the phone's data is already gone.
    await signOut({ callbackUrl: '/signin' }).catch(() =>
      setState({ kind: 'idle', waiting: 0, note: 'No connection: the bridge data is cleared from this phone; sign out again when the connection returns.' }),
    );
  }

  async function start() {
    const waiting = await outboxCount(userId).catch(() => 0);
    if (waiting > 0) setState({ kind: 'asking', waiting });
    else await leave();
  }

  if (state.kind === 'asking') {
    return (
      <div role="alertdialog" aria-labelledby="signout-ask" className="rounded-md border border-caution-500 bg-caution-100 p-3 text-sm text-concrete-900">
        <p id="signout-ask" className="font-semibold">
          {state.waiting} {state.waiting === 1 ? 'measurement or photo has' : 'measurements or photos have'} not reached the server yet.
        </p>
        <p className="mt-1">
          Signing out deletes {state.waiting === 1 ? 'it' : 'them'} from this phone. Stay signed in and let {state.waiting === 1 ? 'it' : 'them'} send when there is a connection.
        </p>
        <div className="mt-2 flex flex-wrap gap-2">
          <button type="button" className="btn-primary" onClick={() => setState({ kind: 'idle', waiting: 0 })}>
            Stay signed in
          </button>
          <button type="button" className="btn-secondary border-fail-600 text-fail-600" onClick={() => void leave()}>
            Delete and sign out
          </button>
        </div>
      </div>
    );
  }
  return (
    <>
      <button
        type="button"
        disabled={state.kind === 'busy'}
        onClick={() => void start()}
        className="rounded-md border border-brand-300/60 px-3 py-1.5 text-sm font-semibold text-white hover:bg-brand-700 disabled:opacity-60"
      >
        {state.kind === 'busy' ? 'Signing out…' : 'Sign out'}
      </button>
      {state.note ? (
        <p role="status" className="mt-1 text-xs text-brand-100">
          {state.note}
        </p>
      ) : null}
    </>
  );
}
