'use client';

import { useId } from 'react';
import { STAGES, STAGE_LABELS, type Stage } from '@/lib/services/bridge-record';

export type RecordDraft = {
  name: string;
  structureNumber: string;
  route: string;
  featureCrossed: string;
  district: string;
  contractor: string;
  stage: Stage;
};

export const EMPTY_RECORD: RecordDraft = { name: '', structureNumber: '', route: '', featureCrossed: '', district: '', contractor: '', stage: 'design' };

const TEXT_FIELDS: { key: Exclude<keyof RecordDraft, 'stage'>; label: string; max: number; hint?: string }[] = [
  { key: 'structureNumber', label: 'Structure number', max: 40, hint: 'As the district files it' },
  { key: 'route', label: 'Route or road', max: 120 },
  { key: 'featureCrossed', label: 'Feature crossed', max: 200, hint: 'River, road or rail line under the bridge' },
  { key: 'district', label: 'County or district', max: 120 },
  { key: 'contractor', label: 'Contractor', max: 200 },
];

/** The inputs of the bridge record (and optionally the name), with the server's field errors under each. */
export default function BridgeRecordFields({
  draft,
  onChange,
  fields,
  withName = false,
}: {
  draft: RecordDraft;
  onChange: (next: RecordDraft) => void;
  fields: Record<string, string[]>;
  withName?: boolean;
}) {
  const ids = useId();
  const set = (key: keyof RecordDraft, value: string) => onChange({ ...draft, [key]: value });
  const input = (key: Exclude<keyof RecordDraft, 'stage'>, label: string, max: number, hint?: string, required = false) => {
    const errors = fields[key];
    const id = `${ids}-${key}`;
    return (
      <div key={key}>
        <label htmlFor={id} className="field-label">
          {label}
          {required ? null : <span className="font-normal text-concrete-500"> (optional)</span>}
        </label>
        <input
          id={id}
          name={key}
          value={draft[key]}
          maxLength={max}
          required={required}
          onChange={(e) => set(key, e.target.value)}
          aria-invalid={errors ? true : undefined}
          aria-describedby={errors ? `${id}-error` : hint ? `${id}-hint` : undefined}
          className="field-input"
        />
        {errors ? (
          <p id={`${id}-error`} className="field-error">
            {errors.join(' ')}
          </p>
        ) : hint ? (
          <p id={`${id}-hint`} className="mt-1 text-xs text-concrete-600">
            {hint}
          </p>
        ) : null}
      </div>
    );
  };
  return (
    <div className="grid gap-4 sm:grid-cols-2">
      {withName ? <div className="sm:col-span-2">{input('name', 'Bridge name', 200, undefined, true)}</div> : null}
      {TEXT_FIELDS.map((f) => input(f.key, f.label, f.max, f.hint))}
      <div>
        <label htmlFor={`${ids}-stage`} className="field-label">
          Stage
        </label>
        <select id={`${ids}-stage`} name="stage" value={draft.stage} onChange={(e) => set('stage', e.target.value)} className="field-input">
          {STAGES.map((s) => (
            <option key={s} value={s}>
              {STAGE_LABELS[s]}
            </option>
          ))}
        </select>
        {fields.stage ? <p className="field-error">{fields.stage.join(' ')}</p> : null}
      </div>
    </div>
  );
}
