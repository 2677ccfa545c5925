'use client';

import Link from 'next/link';
import { useId } from 'react';
import FieldErrorList from '@/components/FieldErrorList';

export type SaveState =
  { kind: 'idle' } | { kind: 'saving' } | { kind: 'saved'; revision: number } | { kind: 'stale'; message: string } | { kind: 'error'; message: string; fields: Record<string, string[]> };

/**
 * The save step: a note for the revision history and the save button, and what came of the last
 * save (a new revision, a stale base with a way to reload, or the server's own message).
 */
export default function EditorSaveBar({
  bridgeId,
  base,
  note,
  onNote,
  onSave,
  state,
  problemCount,
  dirty,
}: {
  bridgeId: number;
  base: number;
  note: string;
  onNote: (note: string) => void;
  onSave: () => void;
  state: SaveState;
  problemCount: number;
  dirty: boolean;
}) {
  const id = useId();
  const noNote = note.trim() === '';
  const blocked = problemCount > 0 || !dirty || noNote || state.kind === 'saving' || state.kind === 'stale';
  return (
    <section aria-labelledby={`${id}-title`} className="card border-brand-300 p-4">
      <h2 id={`${id}-title`} className="text-lg font-bold text-concrete-900">
        Save as a new revision
      </h2>
      <p className="mt-0.5 text-sm text-concrete-600">
        Editing on top of revision <span className="tabular font-semibold">{base}</span>. Saving never changes a stored revision; it adds the next one.
      </p>
      <label htmlFor={`${id}-note`} className="field-label mt-3">
        Note for the history (what changed and why; needed to save)
      </label>
      <textarea
        id={`${id}-note`}
        className="field-input min-h-16"
        maxLength={500}
        value={note}
        onChange={(e) => onNote(e.target.value)}
        placeholder="e.g. G1 moved 0.25 ft inboard at Pier 2 per shop drawings"
      />
      <div className="mt-3 flex flex-wrap items-center gap-3">
        <button type="button" className="btn-primary" onClick={onSave} disabled={blocked}>
          {state.kind === 'saving' ? 'Saving…' : 'Save revision'}
        </button>
        <span className="text-sm text-concrete-600" aria-live="polite">
          {problemCount > 0
            ? `Fix the ${problemCount} ${problemCount === 1 ? 'problem' : 'problems'} marked in red first.`
            : !dirty
              ? state.kind === 'saved'
                ? ''
                : 'No changes to save yet.'
              : noNote
                ? 'Unsaved changes. Write a note for the history to save them.'
                : 'Unsaved changes.'}
        </span>
      </div>
      {state.kind === 'saved' ? (
        <div role="status" className="mt-3 rounded-md border border-pass-600 bg-pass-100 p-3 text-sm text-pass-700" data-testid="save-result">
          Saved as revision <span className="tabular font-semibold">{state.revision}</span>.{' '}
          <Link className="font-semibold underline" href={`/bridges/${bridgeId}/history?from=${state.revision - 1}&to=${state.revision}`}>
            See what changed
          </Link>{' '}
          ·{' '}
          <Link className="font-semibold underline" href={`/bridges/${bridgeId}`}>
            Back to the bridge
          </Link>
        </div>
      ) : null}
      {state.kind === 'stale' ? (
        <div role="alert" className="mt-3 rounded-md border border-caution-500 bg-caution-100 p-3 text-sm text-caution-700" data-testid="stale-revision">
          <p className="font-semibold">Someone saved a newer revision while you were editing.</p>
          <p className="mt-1">{state.message} Your changes here are not saved; reloading shows the newest revision and discards them.</p>
          <div className="mt-2 flex flex-wrap gap-2">
            <button type="button" className="btn-primary" onClick={() => window.location.reload()}>
              Reload the latest revision
            </button>
            <Link className="btn-secondary" href={`/bridges/${bridgeId}/history`} target="_blank">
              Open the history in a new tab
            </Link>
          </div>
        </div>
      ) : null}
      {state.kind === 'error' ? (
        <div className="mt-3 space-y-2">
          <p role="alert" className="rounded-md border border-fail-600 bg-fail-100 p-3 text-sm text-fail-600">
            {state.message}
          </p>
          <FieldErrorList fields={state.fields} title="The server found these problems" />
        </div>
      ) : null}
    </section>
  );
}
