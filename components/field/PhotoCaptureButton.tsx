'use client';

import { useEffect, useId, useRef, useState } from 'react';
import { emitOutbox, onOutbox } from '@/components/offline/outbox-events';
import { queuePhoto, type OutboxUser } from '@/components/offline/outbox';
import { resizePhoto } from '@/components/offline/resize-photo';

type Target = { checkId: number | null; checkKey: string | null; span: number; girder: string; point: number };

/**
 * Takes a photo with the phone's camera (or picks one) for a bracket's latest measurement, makes it
 * small on the phone, and keeps it in the outbox; it is sent after its measurement, with its own client
 * key, so it reaches the server once even when taken with no signal.
 */
export default function PhotoCaptureButton({ bridgeId, user, target }: { bridgeId: number; user: OutboxUser; target: Target }) {
  const id = useId();
  const [state, setState] = useState<{ kind: 'idle' | 'busy' | 'kept' | 'done' | 'error'; text?: string }>({ kind: 'idle' });
  const waitingKey = useRef<string | null>(null);

  useEffect(
    () =>
      onOutbox((event) => {
        if (event.type === 'photo-saved' && event.key === waitingKey.current) {
          waitingKey.current = null;
          setState({ kind: 'done', text: event.checkId ? `Photo attached to check #${event.checkId}.` : 'Photo saved with the bridge.' });
        }
      }),
    [],
  );

  async function onChange(event: React.ChangeEvent<HTMLInputElement>) {
    const file = event.target.files?.[0];
    event.target.value = '';
    if (!file) return;
    setState({ kind: 'busy' });
    try {
      const small = await resizePhoto(file);
      if (!small) throw new Error('This photo could not be read and is larger than 10 MB; take it at a lower resolution.');
      const name = `${file.name.replace(/\.[^.]*$/, '') || 'photo'}${small.blob.type === 'image/jpeg' ? '.jpg' : ''}`;
      const item = await queuePhoto(user, bridgeId, { blob: small.blob, name, ...target });
      waitingKey.current = item.key;
      setState({ kind: 'kept', text: 'Photo kept on this phone; it is sent after its measurement.' });
      emitOutbox({ type: 'changed' });
      emitOutbox({ type: 'send-now' });
    } catch (err) {
      setState({ kind: 'error', text: (err as Error).message || 'The photo could not be kept.' });
    }
  }

  const label = target.checkId ? `Add a photo to check #${target.checkId}` : 'Add a photo to this measurement';
  return (
    <div className="mt-2">
      <label htmlFor={id} className={`btn-secondary h-12 w-full cursor-pointer text-base ${state.kind === 'busy' ? 'pointer-events-none opacity-60' : ''}`}>
        {state.kind === 'busy' ? 'Keeping photo…' : label}
      </label>
      <input id={id} type="file" accept="image/jpeg,image/png,image/webp" capture="environment" className="sr-only" onChange={(e) => void onChange(e)} />
      {state.text ? (
        <p role={state.kind === 'error' ? 'alert' : 'status'} className={`mt-1 text-sm ${state.kind === 'error' ? 'text-fail-600' : state.kind === 'done' ? 'text-pass-700' : 'text-caution-700'}`}>
          {state.text}
        </p>
      ) : null}
    </div>
  );
}
