'use client';

import { useRouter } from 'next/navigation';
import Link from 'next/link';
import { useId, useState, useSyncExternalStore } from 'react';
import { mutate } from 'swr';
import { ApiError, sendJson } from '@/lib/client/api-client';
import SurveyPreviewTable, { type SurveyPreviewJson } from '@/components/survey/SurveyPreviewTable';
import type { Units } from '@/lib/units';

/** Largest file read in the browser; the server refuses anything over its own limit too. */
const MAX_FILE_BYTES = 900_000;

type Stored = { import_id: number; stored: number; replaced: number; revision: number; delimiter: string };

/**
 * Top-of-girder survey upload: the file is checked row by row first (POST …/survey/preview writes
 * nothing); only a file without problems can then be stored (POST …/survey).
 */
/** Nothing to listen to: the snapshot only tells the server's render from the browser's. */
const noSubscription = () => () => {};

export default function SurveyImportForm({ bridgeId, units }: { bridgeId: number; units: Units }) {
  const router = useRouter();
  const id = useId();
  const [file, setFile] = useState<{ name: string; text: string } | null>(null);
  const [preview, setPreview] = useState<SurveyPreviewJson | null>(null);
  const [error, setError] = useState<string | null>(null);
  const [stored, setStored] = useState<Stored | null>(null);
  const [busy, setBusy] = useState<'checking' | 'storing' | null>(null);
  // The file input works only once the page is interactive (hydrated); until then it is shown disabled.
  const ready = useSyncExternalStore(
    noSubscription,
    () => true,
    () => false,
  );

  async function check(name: string, text: string) {
    setBusy('checking');
    setError(null);
    setPreview(null);
    try {
      setPreview(await sendJson<SurveyPreviewJson>(`/api/bridges/${bridgeId}/survey/preview`, 'POST', { csv: text, filename: name }));
    } catch (err) {
      const e = err as ApiError;
      const detail = Object.values(e.fields ?? {}).flat()[0];
      setError(detail ? `${e.message} ${detail}` : e.message);
    }
    setBusy(null);
  }

  async function onFile(event: React.ChangeEvent<HTMLInputElement>) {
    const chosen = event.target.files?.[0];
    setStored(null);
    setPreview(null);
    setError(null);
    if (!chosen) {
      setFile(null);
      return;
    }
    if (chosen.size > MAX_FILE_BYTES) {
      setFile(null);
      setError(`${chosen.name} is ${Math.round(chosen.size / 1000)} kB; the limit is ${MAX_FILE_BYTES / 1000} kB. Split the survey into smaller files.`);
      return;
    }
    const text = await chosen.text();
    setFile({ name: chosen.name, text });
    await check(chosen.name, text);
  }

  async function onStore() {
    if (!file || !preview) return;
    setBusy('storing');
    setError(null);
    try {
      const result = await sendJson<Stored>(`/api/bridges/${bridgeId}/survey`, 'POST', { csv: file.text, filename: file.name, revision: preview.revision });
      setStored(result);
      setPreview(null);
      setFile(null);
      await mutate(`/api/bridges/${bridgeId}/offsets`);
      router.refresh();
    } catch (err) {
      const e = err as ApiError;
      setError(e.message);
    }
    setBusy(null);
  }

  const canStore = preview !== null && preview.summary.bad === 0 && preview.file_problems.length === 0 && preview.summary.rows > 0;

  return (
    <section aria-labelledby={`${id}-title`} className="card p-4 sm:p-6">
      <h2 id={`${id}-title`} className="text-lg font-bold text-concrete-900">
        Import a survey file
      </h2>
      <p className="mt-1 max-w-3xl text-sm text-concrete-700">
        A CSV with one surveyed point per line: girder, span, point, elevation ({units}). A first line of column names is optional. Every line is checked against the current revision before anything
        is stored; a point already surveyed gets the new value and the old one is kept in its history.
      </p>
      <div className="mt-4">
        <label htmlFor={`${id}-file`} className="field-label">
          Survey CSV file
        </label>
        <input
          id={`${id}-file`}
          type="file"
          accept=".csv,text/csv,text/plain"
          onChange={(e) => void onFile(e)}
          disabled={!ready || busy !== null}
          className="mt-1 block w-full max-w-md text-sm file:mr-3 file:min-h-11 file:rounded-md file:border file:border-concrete-300 file:bg-white file:px-4 file:py-2 file:font-semibold file:text-concrete-800 hover:file:bg-concrete-100"
        />
      </div>

      {busy === 'checking' ? (
        <p role="status" className="mt-4 text-concrete-600">
          Checking {file?.name ?? 'the file'}…
        </p>
      ) : null}
      {error ? (
        <p role="alert" className="mt-4 rounded-md border border-fail-600 bg-fail-100 p-3 text-sm text-fail-600">
          {error}
        </p>
      ) : null}
      {stored ? (
        <div role="status" className="mt-4 rounded-md border border-pass-600 bg-pass-100 p-3 text-sm text-pass-700">
          Stored {stored.stored} surveyed {stored.stored === 1 ? 'point' : 'points'}
          {stored.replaced > 0 ? ` (${stored.replaced} replaced an earlier value)` : ''}, read with cells separated by {stored.delimiter}. The buildups and drops from girder top now use them.{' '}
          <Link href={`/bridges/${bridgeId}/offsets`} className="font-semibold underline">
            Open the offset table
          </Link>
        </div>
      ) : null}

      {preview && file ? (
        <div className="mt-6 space-y-4">
          <SurveyPreviewTable preview={preview} filename={file.name} />
          <div className="flex flex-wrap items-center gap-3">
            <button type="button" className="btn-primary min-h-11" disabled={!canStore || busy !== null} onClick={() => void onStore()}>
              {busy === 'storing' ? 'Storing…' : canStore ? `Store ${preview.summary.rows} surveyed ${preview.summary.rows === 1 ? 'point' : 'points'}` : 'Nothing to store yet'}
            </button>
            <button type="button" className="btn-secondary min-h-11" disabled={busy !== null} onClick={() => void check(file.name, file.text)}>
              Check again
            </button>
            {!canStore ? <p className="text-sm text-fail-600">Nothing can be stored until every line is correct. Fix the file and choose it again.</p> : null}
          </div>
        </div>
      ) : null}
    </section>
  );
}
