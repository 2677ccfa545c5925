'use client';

import { useId, useState } from 'react';
import { ApiError, fetcher } from '@/lib/client/api-client';
import { toDraft, type Draft } from '@/lib/editor/draft';
import type { BridgeDescription } from '@/lib/geometry';
import type { RecordDraft } from '@/components/bridges/BridgeRecordFields';

type Found = { id: number; name: string; structureNumber: string | null; route: string | null };
type Detail = Found & { description: BridgeDescription; district: string | null; contractor: string | null };

/** Finds a stored bridge by name, structure number or route (server-side search) and hands over its current geometry as a draft. */
export default function CopyBridgePicker({ onPick }: { onPick: (draft: Draft, from: string, record: Partial<RecordDraft>) => void }) {
  const ids = useId();
  const [q, setQ] = useState('');
  const [found, setFound] = useState<Found[] | null>(null);
  const [error, setError] = useState<string | null>(null);
  const [busy, setBusy] = useState(false);

  async function search(event: React.FormEvent) {
    event.preventDefault();
    setBusy(true);
    setError(null);
    try {
      setFound(await fetcher<Found[]>(`/api/bridges?limit=20&sort=name${q.trim() ? `&q=${encodeURIComponent(q.trim())}` : ''}`));
    } catch (err) {
      setError(err instanceof ApiError ? err.message : 'The search failed. Try again.');
    }
    setBusy(false);
  }

  async function pick(b: Found) {
    setBusy(true);
    setError(null);
    try {
      const d = await fetcher<Detail>(`/api/bridges/${b.id}`);
      const name = `Copy of ${d.name}`.slice(0, 200);
      onPick(toDraft({ ...d.description, name }), d.name, { route: d.route ?? '', district: d.district ?? '', contractor: d.contractor ?? '' });
    } catch (err) {
      setError(err instanceof ApiError ? err.message : 'That bridge could not be read. Try again.');
      setBusy(false);
    }
  }

  return (
    <div className="mt-2">
      <form onSubmit={search} role="search" className="flex flex-wrap items-end gap-2">
        <div className="min-w-48 flex-1">
          <label htmlFor={`${ids}-q`} className="field-label">
            Find the bridge to copy
          </label>
          <input id={`${ids}-q`} type="search" value={q} onChange={(e) => setQ(e.target.value)} maxLength={100} placeholder="Name, structure number or route" className="field-input py-1.5" />
        </div>
        <button type="submit" className="btn-secondary" disabled={busy}>
          {busy && !found ? 'Searching…' : 'Find'}
        </button>
      </form>
      {error ? (
        <p role="alert" className="field-error">
          {error}
        </p>
      ) : null}
      {found ? (
        found.length === 0 ? (
          <p className="mt-2 text-sm text-concrete-600">No bridge matches. Try part of the name or the structure number.</p>
        ) : (
          <ul className="mt-2 max-h-64 divide-y divide-concrete-100 overflow-y-auto rounded-md border border-concrete-200" aria-label="Bridges to copy">
            {found.map((b) => (
              <li key={b.id} className="flex items-center justify-between gap-2 px-3 py-2 text-sm">
                <span className="min-w-0">
                  <span className="font-semibold text-concrete-900">{b.name}</span>
                  <span className="block text-xs text-concrete-600">{[b.structureNumber, b.route].filter(Boolean).join(' · ') || 'No record filed'}</span>
                </span>
                <button type="button" className="btn-secondary shrink-0 px-3 py-1" onClick={() => pick(b)} disabled={busy}>
                  Copy
                </button>
              </li>
            ))}
          </ul>
        )
      ) : null}
    </div>
  );
}
