'use client';

import { useRouter } from 'next/navigation';
import { useId, useState } from 'react';
import { ApiError, sendJson } from '@/lib/client/api-client';
import BridgeRecordFields, { type RecordDraft } from '@/components/bridges/BridgeRecordFields';
import type { BridgeRecord } from '@/lib/services/bridge-record';

/**
 * Changes a bridge's name and record (structure number, route, feature crossed, district, contractor,
 * stage) through PATCH /api/bridges/[id]; shown to engineers and administrators.
 */
export default function BridgeRecordForm({ bridgeId, name, record }: { bridgeId: number; name: string; record: BridgeRecord }) {
  const router = useRouter();
  const id = useId();
  const initial = (): RecordDraft => ({
    name,
    structureNumber: record.structureNumber ?? '',
    route: record.route ?? '',
    featureCrossed: record.featureCrossed ?? '',
    district: record.district ?? '',
    contractor: record.contractor ?? '',
    stage: record.stage,
  });
  const [open, setOpen] = useState(false);
  const [draft, setDraft] = useState<RecordDraft>(initial);
  const [fields, setFields] = useState<Record<string, string[]>>({});
  const [error, setError] = useState<string | null>(null);
  const [busy, setBusy] = useState(false);

  if (!open) {
    return (
      <button
        type="button"
        className="btn-secondary"
        onClick={() => {
          setDraft(initial());
          setFields({});
          setError(null);
          setOpen(true);
        }}
      >
        Edit name and record
      </button>
    );
  }

  async function onSubmit(event: React.FormEvent<HTMLFormElement>) {
    event.preventDefault();
    setBusy(true);
    setError(null);
    setFields({});
    try {
      await sendJson(`/api/bridges/${bridgeId}`, 'PATCH', draft);
      setOpen(false);
      router.refresh();
    } catch (err) {
      const e = err instanceof ApiError ? err : new ApiError(0, 'The record could not be saved. Try again.');
      setError(e.message);
      setFields(e.fields ?? {});
    }
    setBusy(false);
  }

  return (
    <form onSubmit={onSubmit} noValidate className="card w-full space-y-4 p-4" aria-labelledby={`${id}-title`}>
      <h2 id={`${id}-title`} className="text-lg font-bold text-concrete-900">
        Name and record
      </h2>
      <BridgeRecordFields draft={draft} onChange={setDraft} fields={fields} withName />
      {error && Object.keys(fields).length === 0 ? (
        <p role="alert" className="rounded-md border border-fail-600 bg-fail-100 px-3 py-2 text-sm text-fail-600">
          {error}
        </p>
      ) : null}
      <div className="flex flex-wrap gap-2">
        <button type="submit" className="btn-primary" disabled={busy}>
          {busy ? 'Saving…' : 'Save record'}
        </button>
        <button type="button" className="btn-secondary" onClick={() => setOpen(false)} disabled={busy}>
          Cancel
        </button>
      </div>
    </form>
  );
}
