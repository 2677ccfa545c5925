'use client';

import { useId, useState } from 'react';

/**
 * Takes a photo with the phone's camera (or picks one) and attaches it to a saved check through
 * POST /api/bridges/[id]/attachments. The server decides the type from the bytes; 10 MB at most.
 */
export default function PhotoCaptureButton({ bridgeId, checkId, onAttached }: { bridgeId: number; checkId: number; onAttached?: () => void }) {
  const id = useId();
  const [state, setState] = useState<{ kind: 'idle' | 'busy' | 'done' | 'error'; text?: string }>({ kind: 'idle' });

  async function onChange(event: React.ChangeEvent<HTMLInputElement>) {
    const file = event.target.files?.[0];
    event.target.value = '';
    if (!file) return;
    if (file.size > 10 * 1024 * 1024) {
      setState({ kind: 'error', text: 'The photo is larger than 10 MB; take it at a lower resolution.' });
      return;
    }
    setState({ kind: 'busy' });
    const form = new FormData();
    form.append('file', file);
    form.append('check_id', String(checkId));
    try {
      const res = await fetch(`/api/bridges/${bridgeId}/attachments`, { method: 'POST', body: form });
      const body = (await res.json().catch(() => ({}))) as { error?: string };
      if (!res.ok) throw new Error(body.error ?? `The server answered ${res.status}.`);
      setState({ kind: 'done', text: `Photo attached to check #${checkId}.` });
      onAttached?.();
    } catch (err) {
      setState({
        kind: 'error',
        text: err instanceof TypeError ? 'No connection: the photo was not sent. Try again when the connection is back.' : (err as Error).message,
      });
    }
  }

  return (
    <div className="mt-2">
      <label htmlFor={id} className={`btn-secondary h-12 w-full cursor-pointer text-base ${state.kind === 'busy' ? 'pointer-events-none opacity-60' : ''}`}>
        {state.kind === 'busy' ? 'Sending photo…' : `Add a photo to check #${checkId}`}
      </label>
      <input id={id} type="file" accept="image/jpeg,image/png,image/webp" capture="environment" className="sr-only" onChange={(e) => void onChange(e)} />
      {state.kind === 'done' || state.kind === 'error' ? (
        <p role={state.kind === 'error' ? 'alert' : 'status'} className={`mt-1 text-sm ${state.kind === 'error' ? 'text-fail-600' : 'text-pass-700'}`}>
          {state.text}
        </p>
      ) : null}
    </div>
  );
}
