'use client';

import { useRouter } from 'next/navigation';
import { useId, useState } from 'react';
import { ApiError, sendJson } from '@/lib/client/api-client';
import type { Units } from '@/lib/units';

type Settings = {
  units: Units;
  width_tolerance: number;
  reading_tolerance: number;
  base_rod_length: number;
  is_default: { width_tolerance: boolean; reading_tolerance: boolean; base_rod_length: boolean };
  defaults: { width_tolerance: number; reading_tolerance: number; base_rod_length: number };
};

type Key = 'width_tolerance' | 'reading_tolerance' | 'base_rod_length';

const LABELS: Record<Key, string> = {
  width_tolerance: 'Edge width tolerance (±)',
  reading_tolerance: 'Level-bar reading tolerance (±)',
  base_rod_length: 'Base rod length',
};

/** Tolerances and base rod length of one bridge; engineers edit them, everyone else reads them. */
export default function FieldTolerancesForm({ bridgeId, settings, canEdit }: { bridgeId: number; settings: Settings; canEdit: boolean }) {
  const router = useRouter();
  const id = useId();
  const u = settings.units;
  const digits = u === 'm' ? 4 : 4;
  const show = (v: number) => String(Number(v.toFixed(digits)));
  const [values, setValues] = useState<Record<Key, string>>({
    width_tolerance: show(settings.width_tolerance),
    reading_tolerance: show(settings.reading_tolerance),
    base_rod_length: show(settings.base_rod_length),
  });
  const [errors, setErrors] = useState<Record<string, string[]>>({});
  const [message, setMessage] = useState<string | null>(null);
  const [busy, setBusy] = useState(false);

  async function save(body: Partial<Record<Key, number | null>>) {
    setBusy(true);
    setErrors({});
    setMessage(null);
    try {
      const next = await sendJson<Settings>(`/api/bridges/${bridgeId}/tolerances`, 'PATCH', body);
      setValues({ width_tolerance: show(next.width_tolerance), reading_tolerance: show(next.reading_tolerance), base_rod_length: show(next.base_rod_length) });
      setMessage('Saved. New checks use these values; earlier checks keep the tolerance they were judged with.');
      router.refresh();
    } catch (err) {
      const e = err as ApiError;
      setErrors(Object.keys(e.fields).length ? e.fields : { _: [e.message] });
    }
    setBusy(false);
  }

  function onSubmit(event: React.FormEvent) {
    event.preventDefault();
    const body: Partial<Record<Key, number | null>> = {};
    const bad: Record<string, string[]> = {};
    for (const k of Object.keys(LABELS) as Key[]) {
      const n = Number(values[k]);
      if (values[k].trim() === '' || !Number.isFinite(n)) bad[k] = [`Type a number in ${u}.`];
      else body[k] = n;
    }
    if (Object.keys(bad).length) {
      setErrors(bad);
      return;
    }
    void save(body);
  }

  return (
    <form onSubmit={onSubmit} noValidate className="card p-4">
      <div className="grid gap-3 sm:grid-cols-3">
        {(Object.keys(LABELS) as Key[]).map((k) => (
          <div key={k}>
            <label htmlFor={`${id}-${k}`} className="field-label">
              {LABELS[k]} ({u})
            </label>
            <input
              id={`${id}-${k}`}
              inputMode="decimal"
              value={values[k]}
              readOnly={!canEdit}
              onChange={(e) => setValues((v) => ({ ...v, [k]: e.target.value }))}
              aria-invalid={errors[k] ? true : undefined}
              className="field-input tabular read-only:bg-concrete-100"
            />
            <p className="mt-1 text-xs text-concrete-600">
              {settings.is_default[k] ? 'Default' : 'Set for this bridge'}; common practice {show(settings.defaults[k])} {u}
              {k === 'width_tolerance' ? (u === 'm' ? ' (6 mm)' : ' (1/4 in)') : k === 'reading_tolerance' ? (u === 'm' ? ' (3 mm)' : '') : u === 'm' ? ' (150 mm)' : ''}.
            </p>
            {errors[k] ? <p className="field-error">{errors[k].join(' ')}</p> : null}
          </div>
        ))}
      </div>
      {canEdit ? (
        <div className="mt-3 flex flex-wrap gap-2">
          <button type="submit" className="btn-primary" disabled={busy}>
            Save tolerances
          </button>
          <button type="button" className="btn-secondary" disabled={busy} onClick={() => void save({ width_tolerance: null, reading_tolerance: null, base_rod_length: null })}>
            Back to the defaults
          </button>
        </div>
      ) : (
        <p className="mt-3 text-xs text-concrete-600">An engineer sets these for the bridge.</p>
      )}
      {errors._ ? (
        <p role="alert" className="field-error">
          {errors._.join(' ')}
        </p>
      ) : null}
      {message ? (
        <p role="status" className="mt-2 text-sm text-pass-700">
          {message}
        </p>
      ) : null}
    </form>
  );
}
