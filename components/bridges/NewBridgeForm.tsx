'use client';

import Link from 'next/link';
import { useRouter } from 'next/navigation';
import { useId, useState } from 'react';
import { ApiError, sendJson } from '@/lib/client/api-client';
import FieldErrorList from '@/components/FieldErrorList';
import GeometryProblem from '@/components/editor/GeometryProblem';
import { starterBridge } from '@/lib/demo/starter-bridge';
import type { Units } from '@/lib/units';

type Source = 'starter' | 'file' | 'edited';

const MAX_FILE_BYTES = 1024 * 1024;

function pretty(value: unknown): string {
  return JSON.stringify(value, null, 2);
}

/**
 * Creates a bridge: a name, its units and its description, which starts from the built-in starter
 * bridge, a loaded JSON file, or JSON pasted into the box. The server validates everything again.
 */
export default function NewBridgeForm() {
  const router = useRouter();
  const ids = useId();
  const [name, setName] = useState('');
  const [units, setUnits] = useState<Units>('ft');
  const [text, setText] = useState(() => pretty(starterBridge('ft')));
  const [source, setSource] = useState<Source>('starter');
  const [sourceNote, setSourceNote] = useState('Starter bridge in feet: two 100 ft spans of straight girders on a 1000 ft radius curve.');
  const [busy, setBusy] = useState(false);
  const [fields, setFields] = useState<Record<string, string[]>>({});
  const [formError, setFormError] = useState<string | null>(null);
  const [geometryError, setGeometryError] = useState<string | null>(null);
  const [jsonError, setJsonError] = useState<string | null>(null);

  function clearErrors() {
    setFields({});
    setFormError(null);
    setGeometryError(null);
    setJsonError(null);
  }

  function loadStarter(nextUnits: Units) {
    setText(pretty(starterBridge(nextUnits, name.trim() || undefined)));
    setSource('starter');
    setSourceNote(
      nextUnits === 'm'
        ? 'Starter bridge in metres: two 30 m spans of straight girders on a 300 m radius curve.'
        : 'Starter bridge in feet: two 100 ft spans of straight girders on a 1000 ft radius curve.',
    );
    setJsonError(null);
  }

  function changeUnits(next: Units) {
    setUnits(next);
    if (source === 'starter') loadStarter(next);
  }

  /** Takes in a description from a file or the box: pretty-prints it and adopts its units and name. */
  function adopt(raw: string, from: Source, note: string) {
    try {
      const parsed = JSON.parse(raw) as unknown;
      setText(pretty(parsed));
      setJsonError(null);
      if (parsed && typeof parsed === 'object' && !Array.isArray(parsed)) {
        const d = parsed as { units?: unknown; name?: unknown };
        if (d.units === 'ft' || d.units === 'm') setUnits(d.units);
        if (!name.trim() && typeof d.name === 'string') setName(d.name);
      }
    } catch (err) {
      setText(raw);
      setJsonError(`This is not valid JSON: ${(err as Error).message}`);
    }
    setSource(from);
    setSourceNote(note);
  }

  function onFile(event: React.ChangeEvent<HTMLInputElement>) {
    const file = event.target.files?.[0];
    event.target.value = '';
    if (!file) return;
    if (file.size > MAX_FILE_BYTES) {
      setJsonError(`${file.name} is ${(file.size / 1024).toFixed(0)} KB; a bridge description may be at most 1024 KB.`);
      return;
    }
    const reader = new FileReader();
    reader.onload = () => adopt(String(reader.result ?? ''), 'file', `Loaded from ${file.name}.`);
    reader.onerror = () => setJsonError(`${file.name} could not be read. Choose the file again.`);
    reader.readAsText(file);
  }

  async function onSubmit(event: React.FormEvent<HTMLFormElement>) {
    event.preventDefault();
    clearErrors();
    let description: unknown;
    try {
      description = JSON.parse(text);
    } catch (err) {
      setJsonError(`The description is not valid JSON: ${(err as Error).message}`);
      return;
    }
    if (!description || typeof description !== 'object' || Array.isArray(description)) {
      setJsonError('The description must be one JSON object, like the starter bridge.');
      return;
    }
    const d = description as { units?: unknown; name?: unknown };
    if ((d.units === 'ft' || d.units === 'm') && d.units !== units) {
      setFields({ 'description.units': [`The description is in ${d.units}. Choose ${d.units} above, or load a description in ${units}.`] });
      return;
    }
    const body = { name, description: { ...d, name: name.trim() || d.name } };
    setBusy(true);
    try {
      const created = await sendJson<{ id: number }>('/api/bridges', 'POST', body);
      router.push(`/bridges/${created.id}`);
      router.refresh();
      return;
    } catch (err) {
      const e = err instanceof ApiError ? err : new ApiError(0, 'The bridge could not be saved. Try again.');
      if (e.status === 422) setGeometryError(e.message);
      else {
        setFormError(e.message);
        setFields(e.fields);
      }
    }
    setBusy(false);
  }

  const nameErrors = fields.name;
  const unitErrors = fields['description.units'];
  const nameErrorId = `${ids}-name-error`;
  const unitErrorId = `${ids}-units-error`;
  const jsonErrorId = `${ids}-json-error`;

  return (
    <form onSubmit={onSubmit} noValidate className="space-y-6">
      <div className="card space-y-5 p-6">
        <div>
          <label htmlFor={`${ids}-name`} className="field-label">
            Bridge name
          </label>
          <input
            id={`${ids}-name`}
            value={name}
            onChange={(e) => setName(e.target.value)}
            maxLength={200}
            required
            aria-invalid={nameErrors ? true : undefined}
            aria-describedby={nameErrors ? nameErrorId : `${ids}-name-hint`}
            className="field-input max-w-lg"
          />
          {nameErrors ? (
            <p id={nameErrorId} className="field-error">
              {nameErrors.join(' ')}
            </p>
          ) : (
            <p id={`${ids}-name-hint`} className="mt-1 text-sm text-concrete-600">
              Also written into the description&apos;s name.
            </p>
          )}
        </div>

        <fieldset aria-describedby={unitErrors ? unitErrorId : undefined}>
          <legend className="field-label">Units</legend>
          <div className="mt-2 flex gap-6">
            {(['ft', 'm'] as const).map((u) => (
              <label key={u} className="inline-flex items-center gap-2">
                <input type="radio" name="units" value={u} checked={units === u} onChange={() => changeUnits(u)} className="h-4 w-4 accent-brand-600" />
                {u === 'ft' ? 'Feet (ft)' : 'Metres (m)'}
              </label>
            ))}
          </div>
          {unitErrors ? (
            <p id={unitErrorId} className="field-error">
              {unitErrors.join(' ')}
            </p>
          ) : null}
        </fieldset>
      </div>

      <fieldset className="card space-y-4 p-6">
        <legend className="sr-only">Bridge description</legend>
        <div>
          <h2 className="text-lg font-bold text-concrete-900">Description</h2>
          <p className="text-sm text-concrete-600">
            The alignment, profile, cross slopes, deck section, bents and girders as JSON. Start from the starter bridge, load a file, or
            paste a description into the box and edit it. Once the bridge is created, Edit geometry gives a form with every field, units
            and checks beside each row, and imports LandXML.
          </p>
        </div>
        <div className="flex flex-wrap items-center gap-3">
          <button type="button" className="btn-secondary" onClick={() => loadStarter(units)}>
            Start from the starter bridge
          </button>
          <label className="btn-secondary cursor-pointer focus-within:outline-2 focus-within:outline-offset-2 focus-within:outline-brand-500">
            Load a JSON file
            <input type="file" accept=".json,application/json" onChange={onFile} className="sr-only" />
          </label>
          <span className="text-sm text-concrete-600" aria-live="polite">
            {sourceNote}
          </span>
        </div>
        <div>
          <label htmlFor={`${ids}-json`} className="field-label">
            Description JSON
          </label>
          <textarea
            id={`${ids}-json`}
            value={text}
            onChange={(e) => {
              setText(e.target.value);
              if (source !== 'edited') {
                setSource('edited');
                setSourceNote('Edited by hand.');
              }
            }}
            onPaste={(e) => {
              const pasted = e.clipboardData.getData('text');
              const el = e.currentTarget;
              if (el.selectionStart === 0 && el.selectionEnd === el.value.length && pasted.trim()) {
                e.preventDefault();
                adopt(pasted, 'edited', 'Pasted JSON.');
              }
            }}
            onBlur={() => {
              try {
                setText(pretty(JSON.parse(text)));
                setJsonError(null);
              } catch {
                /* left as typed; the error shows on submit */
              }
            }}
            spellCheck={false}
            rows={22}
            aria-invalid={jsonError ? true : undefined}
            aria-describedby={jsonError ? jsonErrorId : undefined}
            className="field-input font-mono text-xs leading-5"
          />
          {jsonError ? (
            <p id={jsonErrorId} className="field-error">
              {jsonError}
            </p>
          ) : null}
        </div>
      </fieldset>

      {geometryError ? <GeometryProblem message={geometryError} /> : null}
      {formError && Object.keys(fields).length === 0 ? (
        <p role="alert" className="rounded-md border border-fail-600 bg-fail-100 px-3 py-2 text-sm text-fail-600">
          {formError}
        </p>
      ) : null}
      <FieldErrorList fields={fields} />

      <div className="flex flex-wrap gap-3">
        <button type="submit" className="btn-primary" disabled={busy}>
          {busy ? 'Creating…' : 'Create bridge'}
        </button>
        <Link href="/bridges" className="btn-secondary">
          Cancel
        </Link>
      </div>
    </form>
  );
}
