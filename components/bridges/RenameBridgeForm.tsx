'use client';

import { useRouter } from 'next/navigation';
import { useId, useState } from 'react';
import { mutate } from 'swr';
import { ApiError, sendJson } from '@/lib/client/api-client';

/** Renames a bridge through PATCH /api/bridges/[id]; shown to engineers and administrators. */
export default function RenameBridgeForm({ bridgeId, name }: { bridgeId: number; name: string }) {
  const router = useRouter();
  const id = useId();
  const [open, setOpen] = useState(false);
  const [value, setValue] = useState(name);
  const [error, setError] = useState<string | null>(null);
  const [busy, setBusy] = useState(false);

  if (!open) {
    return (
      <button
        type="button"
        className="btn-secondary"
        onClick={() => {
          setValue(name);
          setError(null);
          setOpen(true);
        }}
      >
        Rename
      </button>
    );
  }

  async function onSubmit(event: React.FormEvent<HTMLFormElement>) {
    event.preventDefault();
    setBusy(true);
    setError(null);
    try {
      await sendJson(`/api/bridges/${bridgeId}`, 'PATCH', { name: value });
      await mutate('/api/bridges');
      setOpen(false);
      router.refresh();
    } catch (err) {
      const e = err as ApiError;
      setError(e.fields?.name?.join(' ') ?? e.message);
    }
    setBusy(false);
  }

  return (
    <form onSubmit={onSubmit} noValidate className="flex w-full flex-wrap items-start gap-2 sm:w-auto">
      <div className="min-w-64 flex-1">
        <label htmlFor={`${id}-name`} className="sr-only">
          New name
        </label>
        <input
          id={`${id}-name`}
          autoFocus
          value={value}
          onChange={(e) => setValue(e.target.value)}
          maxLength={200}
          aria-invalid={error ? true : undefined}
          aria-describedby={error ? `${id}-error` : undefined}
          className="field-input mt-0"
        />
        {error ? (
          <p id={`${id}-error`} className="field-error">
            {error}
          </p>
        ) : null}
      </div>
      <button type="submit" className="btn-primary" disabled={busy}>
        {busy ? 'Saving…' : 'Save name'}
      </button>
      <button type="button" className="btn-secondary" onClick={() => setOpen(false)} disabled={busy}>
        Cancel
      </button>
    </form>
  );
}
