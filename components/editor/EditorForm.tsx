'use client';

import { useCallback, useDeferredValue, useEffect, useMemo, useState } from 'react';
import { ApiError, sendJson } from '@/lib/client/api-client';
import EditorAlignmentSection from '@/components/editor/AlignmentSection';
import EditorBentSection from '@/components/editor/BentSection';
import EditorCrossSlopeSection from '@/components/editor/CrossSlopeSection';
import EditorDeckSection from '@/components/editor/DeckSection';
import EditorDeflectionSection from '@/components/editor/DeflectionSection';
import EditorGirderSection from '@/components/editor/GirderSection';
import EditorMessages from '@/components/editor/EditorMessages';
import EditorPointsSection from '@/components/editor/PointsSection';
import EditorPreview from '@/components/editor/EditorPreview';
import EditorProfileSection from '@/components/editor/ProfileSection';
import EditorSaveBar, { type SaveState } from '@/components/editor/SaveBar';
import LandXmlImport from '@/components/bridges/LandXmlImport';
import { checkDraft, type DraftCheck } from '@/lib/editor/check-draft';
import { alignmentToDraft, pvisToDraft, toDraft, type Draft } from '@/lib/editor/draft';
import type { BridgeDescription } from '@/lib/geometry';
import type { ImportedAlignment } from '@/lib/import/landxml';

const SECTIONS = [
  { id: 'alignment', title: 'Alignment', prefixes: ['alignment'] },
  { id: 'profile', title: 'Profile', prefixes: ['profile'] },
  { id: 'cross-slopes', title: 'Cross slopes', prefixes: ['cross_slopes'] },
  { id: 'deck', title: 'Deck', prefixes: ['deck'] },
  { id: 'bents', title: 'Bents', prefixes: ['bents'] },
  { id: 'girders', title: 'Girders', prefixes: ['girders'] },
  { id: 'deflections', title: 'Deflections', prefixes: ['deflections'] },
  { id: 'points', title: 'Points', prefixes: ['points_per_span', 'chord_spaces'] },
];
const under = (path: string, prefix: string) => path === prefix || path.startsWith(`${prefix}.`);

type EditorProps =
  | { bridgeId: number; revision: number; description: BridgeDescription; initialDraft?: undefined; footer?: undefined }
  /** A bridge not stored yet (the new-bridge page): `footer` gets the checked draft and does the saving. */
  | { bridgeId?: undefined; revision?: undefined; description?: BridgeDescription; initialDraft?: Draft; footer: (check: DraftCheck) => React.ReactNode };

/**
 * The geometry editor: every part of the bridge description as rows that can be added, removed and
 * reordered, checked as the user types against the shared schema and the engine's geometric checks,
 * with a live plan preview, and saved as a new revision on top of the one it was opened on (or, for
 * a new bridge, handed to the page's own footer to create it).
 */
export default function EditorForm({ bridgeId, revision, description, initialDraft, footer }: EditorProps) {
  const [draft, setDraft] = useState<Draft>(() => initialDraft ?? toDraft(description!));
  const [base, setBase] = useState(revision ?? 0);
  const [dirty, setDirty] = useState(false);
  const [note, setNote] = useState('');
  const [save, setSave] = useState<SaveState>({ kind: 'idle' });
  const [imported, setImported] = useState<string | null>(null);
  const [profileRequest, setProfileRequest] = useState<string[] | null>(null);
  const deferred = useDeferredValue(draft);
  const check = useMemo(() => checkDraft(deferred), [deferred]);
  const current = useMemo(() => (deferred === draft ? check : checkDraft(draft)), [check, deferred, draft]);

  const update = useCallback((change: (d: Draft) => Draft) => {
    setDraft(change);
    setDirty(true);
    setSave((s) => (s.kind === 'saved' || s.kind === 'error' ? { kind: 'idle' } : s));
  }, []);

  // Warn before leaving with unsaved changes, except after a stale save: then reloading is the way on.
  const guard = dirty && save.kind !== 'stale' && !footer;
  useEffect(() => {
    if (!guard) return;
    const warn = (e: BeforeUnloadEvent) => e.preventDefault();
    window.addEventListener('beforeunload', warn);
    return () => window.removeEventListener('beforeunload', warn);
  }, [guard]);

  function applyImport(item: ImportedAlignment, fileName: string) {
    update((d) => ({ ...d, alignment: { ...alignmentToDraft(item.alignment, d.units), rest: d.alignment.rest }, pvis: item.profile ? pvisToDraft(item.profile.pvis, d.units) : d.pvis }));
    setImported(
      `The alignment${item.profile ? ' and profile' : ''} of “${item.name}” from ${fileName} replaced the ones in the editor. ${item.profile ? '' : 'The file gave no usable profile: enter it in the Profile section. '}Check the bents and cross slopes against the new stations, then save a revision.`,
    );
    setProfileRequest(
      item.profile ? null : [`“${item.name}” from ${fileName} came without a profile; the PVIs below are the ones the editor had. Enter the profile from the plans.`, ...(item.profile_left_out ?? [])],
    );
  }

  async function onSave() {
    if (current.problemCount > 0 || bridgeId === undefined) return;
    setSave({ kind: 'saving' });
    try {
      const res = await sendJson<{ revision: number }>(`/api/bridges/${bridgeId}/revisions`, 'POST', { base_revision: base, description: current.description, note });
      setBase(res.revision);
      setDirty(false);
      setNote('');
      setImported(null);
      setProfileRequest(null);
      setSave({ kind: 'saved', revision: res.revision });
    } catch (err) {
      if (err instanceof ApiError && err.status === 409) setSave({ kind: 'stale', message: err.message });
      else if (err instanceof ApiError) setSave({ kind: 'error', message: err.message, fields: err.fields });
      else setSave({ kind: 'error', message: 'The revision could not be saved. Try again.', fields: {} });
    }
  }

  const other = Object.entries(current.messages)
    .filter(([path]) => !SECTIONS.some((s) => s.prefixes.some((p) => under(path, p))))
    .flatMap(([, list]) => list);
  const props = { draft, update, check: current };

  return (
    <div className="grid gap-6 lg:grid-cols-[minmax(0,1fr)_minmax(0,26rem)]">
      <div className="min-w-0 space-y-4">
        <nav aria-label="Editor sections" className="flex flex-wrap gap-1.5 text-sm">
          {SECTIONS.map((s) => {
            const n = Object.entries(current.messages)
              .filter(([path]) => s.prefixes.some((p) => under(path, p)))
              .reduce((sum, [, l]) => sum + l.length, 0);
            return (
              <a
                key={s.id}
                href={`#${s.id}`}
                className={`rounded-full border px-3 py-1 ${n > 0 ? 'border-fail-600 bg-fail-100 text-fail-600' : 'border-concrete-300 bg-white text-concrete-700 hover:bg-concrete-100'}`}
              >
                {s.title}
                {n > 0 ? <span className="ml-1 font-semibold">({n})</span> : null}
              </a>
            );
          })}
          <a href="#preview" className="rounded-full border border-brand-300 bg-brand-50 px-3 py-1 text-brand-700 lg:hidden">
            Preview ↓
          </a>
        </nav>
        <LandXmlImport units={draft.units} onApply={applyImport} />
        {imported ? (
          <p role="status" className="rounded-md border border-brand-300 bg-brand-50 p-3 text-sm text-brand-800">
            {imported}
          </p>
        ) : null}
        {other.length > 0 ? (
          <div className="card border-fail-600 p-3">
            <EditorMessages messages={other} />
          </div>
        ) : null}
        <EditorAlignmentSection {...props} />
        <EditorProfileSection {...props} request={profileRequest} />
        <EditorCrossSlopeSection {...props} />
        <EditorDeckSection {...props} />
        <EditorBentSection {...props} />
        <EditorGirderSection {...props} />
        <EditorDeflectionSection {...props} />
        <EditorPointsSection {...props} />
        {footer ? footer(current) : <EditorSaveBar bridgeId={bridgeId} base={base} note={note} onNote={setNote} onSave={onSave} state={save} problemCount={current.problemCount} dirty={dirty} />}
      </div>
      <aside id="preview" className="min-w-0 scroll-mt-4 lg:sticky lg:top-4 lg:self-start" aria-label="Live preview">
        <EditorPreview check={check} stale={deferred !== draft} />
      </aside>
    </div>
  );
}
