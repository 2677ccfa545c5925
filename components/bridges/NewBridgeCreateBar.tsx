'use client';

import { useRouter } from 'next/navigation';
import { useState } from 'react';
import FieldErrorList from '@/components/FieldErrorList';
import type { RecordDraft } from '@/components/bridges/BridgeRecordFields';
import { ApiError, sendJson } from '@/lib/client/api-client';
import type { DraftCheck } from '@/lib/editor/check-draft';

/**
 * The new-bridge editor's last step: creates the bridge (POST /api/bridges) from the record and the
 * checked geometry, or says what still stands in the way.
 */
export default function NewBridgeCreateBar({ check, record, onFields }: { check: DraftCheck; record: RecordDraft; onFields: (f: Record<string, string[]>) => void }) {
  const router = useRouter();
  const [busy, setBusy] = useState(false);
  const [error, setError] = useState<{ message: string; fields: Record<string, string[]> } | null>(null);
  const noName = record.name.trim() === '';
  const blocked = busy || noName || check.problemCount > 0;

  async function create() {
    setBusy(true);
    setError(null);
    onFields({});
    try {
      const { name, ...rest } = record;
      const created = await sendJson<{ id: number }>('/api/bridges', 'POST', { name, ...rest, description: { ...check.description, name: name.trim() } });
      router.push(`/bridges/${created.id}`);
      router.refresh();
      return;
    } catch (err) {
      const e = err instanceof ApiError ? err : new ApiError(0, 'The bridge could not be created. Try again.');
      setError({ message: e.message, fields: e.fields });
      onFields(e.fields);
    }
    setBusy(false);
  }

  return (
    <section aria-labelledby="create-bar-title" className="card border-brand-300 p-4">
      <h2 id="create-bar-title" className="text-lg font-bold text-concrete-900">
        Create the bridge
      </h2>
      <p className="mt-0.5 text-sm text-concrete-600">The geometry is stored as revision 1; later changes add revisions and keep this one.</p>
      <div className="mt-3 flex flex-wrap items-center gap-3">
        <button type="button" className="btn-primary" onClick={create} disabled={blocked}>
          {busy ? 'Creating…' : 'Create bridge'}
        </button>
        <span className="text-sm text-concrete-600" aria-live="polite">
          {noName
            ? 'Give the bridge a name above.'
            : check.problemCount > 0
              ? `Fix the ${check.problemCount} ${check.problemCount === 1 ? 'problem' : 'problems'} marked in red first.`
              : 'Ready to create.'}
        </span>
      </div>
      {error ? (
        <div className="mt-3 space-y-2">
          <p role="alert" className="rounded-md border border-fail-600 bg-fail-100 p-3 text-sm text-fail-600">
            {error.message}
          </p>
          <FieldErrorList fields={error.fields} title="The server found these problems" />
        </div>
      ) : null}
    </section>
  );
}
