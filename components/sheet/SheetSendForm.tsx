'use client';

import { useId, useState } from 'react';
import { ApiError, sendJson } from '@/lib/client/api-client';

/** E-mails the field sheet (CSV attached) to up to ten addresses through POST /api/bridges/[id]/send-sheet. */
export default function SheetSendForm({ bridgeId, span }: { bridgeId: number; span: number | null }) {
  const id = useId();
  const [to, setTo] = useState('');
  const [busy, setBusy] = useState(false);
  const [error, setError] = useState<string | null>(null);
  const [done, setDone] = useState<string | null>(null);

  async function onSubmit(event: React.FormEvent) {
    event.preventDefault();
    const list = to
      .split(/[\s,;]+/)
      .map((s) => s.trim())
      .filter(Boolean);
    if (list.length === 0) {
      setError('Type at least one e-mail address.');
      return;
    }
    setBusy(true);
    setError(null);
    setDone(null);
    try {
      const res = await sendJson<{ via: 'smtp' | 'outbox'; to: string[] }>(`/api/bridges/${bridgeId}/send-sheet`, 'POST', { to: list, span });
      setDone(
        res.via === 'smtp' ? `Sent to ${res.to.join(', ')}.` : `Captured in the local outbox for ${res.to.join(', ')} (no mail server is configured; an administrator can read it under Outbox).`,
      );
      setTo('');
    } catch (err) {
      const e = err as ApiError;
      const fieldMessages = Object.entries(e.fields ?? {})
        .filter(([k]) => k.startsWith('to'))
        .map(([k, v]) => {
          const i = Number(k.split('.')[1]);
          return Number.isInteger(i) && list[i] ? `${list[i]}: ${v.join(' ')}` : v.join(' ');
        });
      setError(fieldMessages.length ? fieldMessages.join(' ') : e.message);
    }
    setBusy(false);
  }

  return (
    <form id="send-sheet" onSubmit={onSubmit} noValidate className="card no-print scroll-mt-4 p-4">
      <label htmlFor={`${id}-to`} className="field-label">
        E-mail this sheet{span ? ` (span ${span})` : ''} with the CSV attached
      </label>
      <div className="mt-1 flex flex-wrap gap-2">
        <input
          id={`${id}-to`}
          type="text"
          inputMode="email"
          autoComplete="email"
          placeholder="name@example.com, another@example.com"
          value={to}
          onChange={(e) => setTo(e.target.value)}
          aria-invalid={error ? true : undefined}
          aria-describedby={error ? `${id}-error` : done ? `${id}-done` : undefined}
          className="field-input mt-0 min-w-64 flex-1"
        />
        <button type="submit" className="btn-primary" disabled={busy}>
          {busy ? 'Sending…' : 'Send'}
        </button>
      </div>
      {error ? (
        <p id={`${id}-error`} role="alert" className="field-error">
          {error}
        </p>
      ) : null}
      {done ? (
        <p id={`${id}-done`} role="status" className="mt-2 text-sm text-pass-700">
          {done}
        </p>
      ) : null}
    </form>
  );
}
