'use client';

import { useState } from 'react';
import BridgeRecordFields, { EMPTY_RECORD, type RecordDraft } from '@/components/bridges/BridgeRecordFields';
import NewBridgeCreateBar from '@/components/bridges/NewBridgeCreateBar';
import NewBridgeStart, { type Start } from '@/components/bridges/NewBridgeStart';
import EditorForm from '@/components/editor/EditorForm';

/**
 * Creates a bridge without writing JSON: choose a start (the starter bridge, a LandXML file's
 * alignment and profile, or a copy of a stored bridge), fill in the record, finish the geometry in
 * the form editor with its live checks and plan preview, then create it. Pasting a JSON description
 * stays available, folded away, for integrators.
 */
export default function NewBridgeForm() {
  const [start, setStart] = useState<Start | null>(null);
  const [record, setRecord] = useState<RecordDraft>(EMPTY_RECORD);
  const [fields, setFields] = useState<Record<string, string[]>>({});

  if (!start) {
    return (
      <NewBridgeStart
        onStart={(s) => {
          setRecord({ ...EMPTY_RECORD, ...s.record, name: s.draft.name });
          setFields({});
          setStart(s);
        }}
      />
    );
  }

  return (
    <div className="space-y-6">
      <div className="flex flex-wrap items-center justify-between gap-3 rounded-md border border-brand-300 bg-brand-50 p-3 text-sm text-brand-800" role="status">
        <span>{start.note}</span>
        <button type="button" className="btn-secondary" onClick={() => setStart(null)}>
          Choose another start
        </button>
      </div>
      <section aria-labelledby="new-record-title" className="card space-y-3 p-4">
        <h2 id="new-record-title" className="text-lg font-bold text-concrete-900">
          Name and record
        </h2>
        <BridgeRecordFields draft={record} onChange={setRecord} fields={fields} withName />
      </section>
      <div>
        <h2 className="mb-2 text-lg font-bold text-concrete-900">Geometry</h2>
        <EditorForm key={start.key} initialDraft={start.draft} footer={(check) => <NewBridgeCreateBar check={check} record={record} onFields={setFields} />} />
      </div>
    </div>
  );
}
