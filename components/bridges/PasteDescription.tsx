'use client';

import { useRouter } from 'next/navigation';
import { useId, useState } from 'react';
import FieldErrorList from '@/components/FieldErrorList';
import GeometryProblem from '@/components/editor/GeometryProblem';
import { ApiError, sendJson } from '@/lib/client/api-client';
import { toDraft, type Draft } from '@/lib/editor/draft';
import { bridgeDescriptionSchema, type BridgeDescription } from '@/lib/geometry';

const MAX_BYTES = 1024 * 1024;

/**
 * For integrators, folded away: a bridge description pasted (or loaded) as JSON, either opened in the
 * form editor or created as it is. The server checks everything again.
 */
export default function PasteDescription({ onOpen }: { onOpen: (draft: Draft) => void }) {
  const router = useRouter();
  const ids = useId();
  const [text, setText] = useState('');
  const [error, setError] = useState<string | null>(null);
  const [fields, setFields] = useState<Record<string, string[]>>({});
  const [geometry, setGeometry] = useState<string | null>(null);
  const [busy, setBusy] = useState(false);

  function parse(): Record<string, unknown> | null {
    setError(null);
    setFields({});
    setGeometry(null);
    if (new Blob([text]).size > MAX_BYTES) {
      setError('A bridge description may be at most 1024 KB.');
      return null;
    }
    try {
      const v = JSON.parse(text) as unknown;
      if (v && typeof v === 'object' && !Array.isArray(v)) return v as Record<string, unknown>;
      setError('The description must be one JSON object.');
    } catch (err) {
      setError(`This is not valid JSON: ${(err as Error).message}`);
    }
    return null;
  }

  function open() {
    const v = parse();
    if (!v) return;
    const checked = bridgeDescriptionSchema.safeParse(v);
    if (!checked.success) {
      const f: Record<string, string[]> = {};
      for (const i of checked.error.issues) (f[i.path.map(String).join('.') || '_'] ??= []).push(i.message);
      setError('The form editor can only open a description that fits the bridge format. Fix these fields, or create it directly to see the server’s answer.');
      setFields(f);
      return;
    }
    onOpen(toDraft(checked.data as BridgeDescription));
  }

  async function create() {
    const v = parse();
    if (!v) return;
    setBusy(true);
    try {
      const created = await sendJson<{ id: number }>('/api/bridges', 'POST', { name: typeof v.name === 'string' ? v.name : '', description: v });
      router.push(`/bridges/${created.id}`);
      router.refresh();
      return;
    } catch (err) {
      const e = err instanceof ApiError ? err : new ApiError(0, 'The bridge could not be created. Try again.');
      if (e.status === 422) setGeometry(e.message);
      else {
        setError(e.message);
        setFields(e.fields);
      }
    }
    setBusy(false);
  }

  function onFile(event: React.ChangeEvent<HTMLInputElement>) {
    const file = event.target.files?.[0];
    event.target.value = '';
    if (!file) return;
    if (file.size > MAX_BYTES) {
      setError(`${file.name} is ${(file.size / 1024).toFixed(0)} KB; a bridge description may be at most 1024 KB.`);
      return;
    }
    file.text().then(setText, () => setError(`${file.name} could not be read. Choose the file again.`));
  }

  return (
    <details className="card p-4" data-testid="paste-json">
      <summary className="cursor-pointer font-semibold text-concrete-800">Paste a bridge description as JSON (for integrations)</summary>
      <p className="mt-2 text-sm text-concrete-600">
        The JSON of the shared bridge format, with <code>name</code> and <code>units</code> inside. Open it in the form editor to check and finish it, or create the bridge from it as it is.
      </p>
      <label htmlFor={`${ids}-json`} className="field-label mt-3">
        Description JSON
      </label>
      <textarea
        id={`${ids}-json`}
        value={text}
        onChange={(e) => setText(e.target.value)}
        spellCheck={false}
        rows={12}
        className="field-input font-mono text-xs leading-5"
        aria-invalid={error ? true : undefined}
      />
      <div className="mt-3 flex flex-wrap items-center gap-2">
        <button type="button" className="btn-secondary" onClick={open} disabled={busy || !text.trim()}>
          Open in the form editor
        </button>
        <button type="button" className="btn-secondary" onClick={create} disabled={busy || !text.trim()}>
          {busy ? 'Creating…' : 'Create directly'}
        </button>
        <label className="btn-secondary cursor-pointer focus-within:outline-2 focus-within:outline-offset-2 focus-within:outline-brand-500">
          Load a JSON file
          <input type="file" accept=".json,application/json" onChange={onFile} className="sr-only" />
        </label>
      </div>
      {error ? (
        <p role="alert" className="mt-3 rounded-md border border-fail-600 bg-fail-100 px-3 py-2 text-sm text-fail-600">
          {error}
        </p>
      ) : null}
      {geometry ? <GeometryProblem message={geometry} /> : null}
      <FieldErrorList fields={fields} />
    </details>
  );
}
