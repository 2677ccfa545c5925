'use client';

import { useRouter } from 'next/navigation';
import { useState } from 'react';
import { ApiError, sendJson } from '@/lib/client/api-client';
import { dateTimeText, stationText, type Units } from '@/lib/units';

type Missing = { girder: string; point: number; station: number; measure: string; reason: string };
type SignOffRow = { id: number; span: number; revision: number; by: string | null; note: string; created_at: string; out_of_date: boolean };
export type SpanStatusRow = { span: number; girders: string[]; brackets: number; ready: boolean; missing: Missing[]; signoff: SignOffRow | null };

/**
 * Sign-off state of each span: signed (and whether a later revision made it out of date), ready, or
 * what is still missing. Inspectors sign a span off when every bracket has a passing latest check.
 */
export default function SignOffPanel({ bridgeId, units, spans, canSign }: { bridgeId: number; units: Units; spans: SpanStatusRow[]; canSign: boolean }) {
  const router = useRouter();
  const [busy, setBusy] = useState<number | null>(null);
  const [errors, setErrors] = useState<Record<number, string>>({});

  async function sign(span: number) {
    setBusy(span);
    setErrors((e) => ({ ...e, [span]: '' }));
    try {
      await sendJson(`/api/bridges/${bridgeId}/signoffs`, 'POST', { span });
      router.refresh();
    } catch (err) {
      setErrors((e) => ({ ...e, [span]: (err as ApiError).message }));
    }
    setBusy(null);
  }

  return (
    <div className="grid gap-3 md:grid-cols-2 xl:grid-cols-3">
      {spans.map((s) => {
        const open = new Set(s.missing.map((m) => `${m.girder}|${m.point}`)).size;
        const current = s.signoff && !s.signoff.out_of_date;
        const tone = current ? 'border-pass-600' : s.signoff?.out_of_date ? 'border-caution-500' : 'border-concrete-200';
        return (
          <article key={s.span} className={`card border-2 p-4 ${tone}`} aria-labelledby={`span-${s.span}-title`}>
            <div className="flex items-start justify-between gap-2">
              <h3 id={`span-${s.span}-title`} className="text-lg font-bold text-concrete-900">
                Span {s.span}
              </h3>
              <span
                className={`rounded-full px-2 py-0.5 text-xs font-bold ${
                  current ? 'bg-pass-100 text-pass-700' : s.signoff?.out_of_date ? 'bg-caution-100 text-caution-700' : s.ready ? 'bg-brand-50 text-brand-700' : 'bg-concrete-100 text-concrete-700'
                }`}
              >
                {current ? 'Signed off' : s.signoff?.out_of_date ? 'Sign-off out of date' : s.ready ? 'Ready to sign off' : `${s.brackets - open} of ${s.brackets} brackets done`}
              </span>
            </div>
            <p className="mt-1 text-sm text-concrete-600">
              {s.brackets} brackets on {s.girders.join(' and ')}
            </p>
            {s.signoff ? (
              <p className="mt-2 text-sm text-concrete-800">
                Signed off by {s.signoff.by ?? 'a removed user'} at revision <span className="tabular">{s.signoff.revision}</span>, {dateTimeText(s.signoff.created_at)}.
                {s.signoff.out_of_date ? <strong className="block text-caution-700">The geometry has changed since; check the span again and sign it off anew.</strong> : null}
              </p>
            ) : null}
            {s.missing.length > 0 ? (
              <details className="mt-2 text-sm">
                <summary className="cursor-pointer font-semibold text-brand-700">What is missing ({s.missing.length})</summary>
                <ul className="mt-1 max-h-48 space-y-0.5 overflow-y-auto text-concrete-700">
                  {s.missing.map((m) => (
                    <li key={`${m.girder}-${m.point}-${m.measure}`}>
                      <span className="tabular font-semibold">
                        {m.girder} pt {m.point}
                      </span>{' '}
                      ({stationText(m.station, units)}) {m.measure}: {m.reason}
                    </li>
                  ))}
                </ul>
              </details>
            ) : null}
            {canSign && !current && s.ready ? (
              <button type="button" className="btn-primary mt-3" disabled={busy !== null} onClick={() => void sign(s.span)}>
                {busy === s.span ? 'Signing off…' : `Sign off span ${s.span}`}
              </button>
            ) : null}
            {canSign && !current && !s.ready ? <p className="mt-3 text-sm text-concrete-600">Sign-off opens when every bracket of the span has a passing latest check.</p> : null}
            {errors[s.span] ? (
              <p role="alert" className="field-error">
                {errors[s.span]}
              </p>
            ) : null}
          </article>
        );
      })}
    </div>
  );
}
