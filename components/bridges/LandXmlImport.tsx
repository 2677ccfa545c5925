'use client';

import { useId, useRef, useState } from 'react';
import LandXmlPreview from '@/components/bridges/LandXmlPreview';
import LandXmlProblems, { problemGroupsOf } from '@/components/bridges/LandXmlProblems';
import type { ImportedAlignment, SkippedAlignment } from '@/lib/import/landxml';
import type { Units } from '@/lib/units';

type ImportAnswer = { alignments: ImportedAlignment[]; skipped: SkippedAlignment[]; linear_unit: string };

const MAX_BYTES = 5 * 1024 * 1024;

/**
 * Reads a LandXML 1.2 file on the server (nothing is stored), lets the user pick one of its
 * alignments, shows its elements and PVIs, and hands the chosen alignment and profile to the editor.
 */
export default function LandXmlImport({ units, onApply }: { units: Units; onApply: (item: ImportedAlignment, fileName: string) => void }) {
  const ids = useId();
  const input = useRef<HTMLInputElement>(null);
  const [open, setOpen] = useState(false);
  const [busy, setBusy] = useState(false);
  const [error, setError] = useState<string | null>(null);
  const [failed, setFailed] = useState<{ name: string; problems: string[] }[]>([]);
  const [answer, setAnswer] = useState<ImportAnswer | null>(null);
  const [fileName, setFileName] = useState('');
  const [chosen, setChosen] = useState(0);

  function reset() {
    setAnswer(null);
    setError(null);
    setFailed([]);
    setChosen(0);
    if (input.current) input.current.value = '';
  }

  async function read() {
    const file = input.current?.files?.[0];
    setError(null);
    setFailed([]);
    setAnswer(null);
    if (!file) {
      setError('Choose a LandXML file first.');
      return;
    }
    if (file.size > MAX_BYTES) {
      setError(`${file.name} is ${(file.size / 1024 / 1024).toFixed(1)} MB; the limit is 5 MB.`);
      return;
    }
    const form = new FormData();
    form.append('file', file);
    form.append('units', units);
    setBusy(true);
    try {
      const res = await fetch('/api/import/landxml', { method: 'POST', body: form });
      const body = (await res.json().catch(() => null)) as (ImportAnswer & { error?: string; fields?: Record<string, string[]> }) | null;
      if (!res.ok || !body) {
        setError(body?.error ?? `The server answered ${res.status}. Try again.`);
        setFailed(problemGroupsOf(body?.fields));
        return;
      }
      setFileName(file.name);
      setChosen(0);
      setAnswer(body);
    } catch {
      setError('The server could not be reached. Check the connection and try again.');
    } finally {
      setBusy(false);
    }
  }

  if (!open) {
    return (
      <div className="card flex flex-wrap items-center justify-between gap-3 p-4">
        <p className="text-sm text-concrete-700">Have the road design as a LandXML 1.2 file? Read its alignment and profile into this editor.</p>
        <button type="button" className="btn-secondary" onClick={() => setOpen(true)}>
          Import from LandXML
        </button>
      </div>
    );
  }

  const item = answer?.alignments[chosen];
  return (
    <section className="card p-4" aria-labelledby={`${ids}-title`}>
      <div className="flex items-start justify-between gap-2">
        <h2 id={`${ids}-title`} className="text-lg font-bold text-concrete-900">
          Import from LandXML
        </h2>
        <button
          type="button"
          className="text-sm text-brand-700 hover:underline"
          onClick={() => {
            reset();
            setOpen(false);
          }}
        >
          Close
        </button>
      </div>
      <p className="mt-0.5 text-sm text-concrete-600">
        Reads Line, Curve and clothoid Spiral elements and the design profile (PVI, ParaCurve; CircCurve as the matching parabola) of a LandXML 1.2 file in {units === 'm' ? 'metres' : 'feet'}. Nothing
        is saved until you save a revision.
      </p>
      <div className="mt-3 flex flex-wrap items-end gap-3">
        <div>
          <label htmlFor={`${ids}-file`} className="field-label">
            LandXML file (.xml, up to 5 MB)
          </label>
          <input id={`${ids}-file`} ref={input} type="file" accept=".xml,.landxml,application/xml,text/xml" className="mt-1 block text-sm" onChange={() => setAnswer(null)} />
        </div>
        <button type="button" className="btn-primary" onClick={read} disabled={busy}>
          {busy ? 'Reading…' : 'Read file'}
        </button>
      </div>
      {error ? (
        <p role="alert" className="mt-3 rounded-md border border-fail-600 bg-fail-100 p-3 text-sm text-fail-600" data-testid="landxml-error">
          {error}
        </p>
      ) : null}
      {failed.length > 0 ? (
        <div className="mt-2">
          <LandXmlProblems groups={failed} tone="fail" />
        </div>
      ) : null}
      {answer && item ? (
        <div className="mt-4 space-y-3">
          {answer.alignments.length > 1 ? (
            <fieldset>
              <legend className="field-label">The file holds {answer.alignments.length} alignments; choose one</legend>
              <div className="mt-1 flex flex-wrap gap-x-4 gap-y-1">
                {answer.alignments.map((a, i) => (
                  <label key={`${a.name}-${i}`} className="flex items-center gap-2 text-sm">
                    <input type="radio" name={`${ids}-alignment`} checked={chosen === i} onChange={() => setChosen(i)} />
                    {a.name}
                  </label>
                ))}
              </div>
            </fieldset>
          ) : (
            <p className="text-sm font-semibold text-concrete-800">Alignment “{item.name}”</p>
          )}
          <LandXmlProblems groups={answer.skipped} tone="caution" />
          <LandXmlPreview item={item} units={units} />
          <div className="flex flex-wrap gap-2">
            <button
              type="button"
              className="btn-primary"
              onClick={() => {
                onApply(item, fileName);
                reset();
                setOpen(false);
              }}
            >
              {item.profile ? 'Use this alignment and profile' : 'Use this alignment'}
            </button>
            <button type="button" className="btn-secondary" onClick={reset}>
              Cancel
            </button>
          </div>
        </div>
      ) : null}
    </section>
  );
}
