'use client';

import PlanSketch from '@/components/editor/PlanSketch';
import PlanSketchSpanTable from '@/components/editor/PlanSketchSpanTable';
import type { DraftCheck } from '@/lib/editor/check-draft';
import type { BridgeDescription } from '@/lib/geometry';
import { fieldLabel } from '@/lib/services/revision-field-labels';

/** A person's name for a field, using the bent and girder names as typed so far. */
function labelOf(path: string, check: DraftCheck): string {
  try {
    return fieldLabel(path, check.bridge ?? (check.description as unknown as BridgeDescription));
  } catch {
    return fieldLabel(path, null);
  }
}

/** Scrolls to the first field or row marked in red and puts the cursor in it when it is a field. */
function goToFirstProblem() {
  const field = document.querySelector<HTMLElement>('[aria-invalid="true"]');
  const note = document.querySelector<HTMLElement>('ul[role="alert"].text-fail-600');
  const target = field ?? note;
  if (!target) return;
  target.scrollIntoView({ block: 'center', behavior: 'smooth' });
  if (field) field.focus({ preventScroll: true });
}

/** The editor's live preview: the plan sketch and the edge-width range per span, or what stops them. */
export default function EditorPreview({ check, stale }: { check: DraftCheck; stale: boolean }) {
  const { bridge, table, problemCount } = check;
  return (
    <div className={`card p-4 transition-opacity ${stale ? 'opacity-70' : ''}`} aria-busy={stale}>
      <div className="mb-2 flex items-center justify-between gap-2">
        <h2 className="text-lg font-bold text-concrete-900">Preview</h2>
        {problemCount === 0 ? (
          <span className="rounded bg-pass-100 px-2 py-0.5 text-xs font-semibold text-pass-700">Computes cleanly</span>
        ) : (
          <span className="rounded bg-caution-100 px-2 py-0.5 text-xs font-semibold text-caution-700" data-testid="problem-count">
            {problemCount} {problemCount === 1 ? 'problem' : 'problems'} to fix
          </span>
        )}
      </div>
      {problemCount > 0 ? (
        <div className="mb-3 rounded-md border border-caution-500 bg-caution-100 p-3 text-sm text-caution-700" data-testid="problem-list">
          <ul className="space-y-1">
            {Object.entries(check.messages)
              .flatMap(([path, list]) => list.map((m) => ({ path, m })))
              .slice(0, 5)
              .map(({ path, m }) => {
                const label = path === '_' ? '' : labelOf(path, check);
                return (
                  <li key={`${path}:${m}`}>
                    {label && !m.includes(label) ? <strong>{label}: </strong> : null}
                    {m}
                  </li>
                );
              })}
          </ul>
          {problemCount > 5 ? <p className="mt-1">…and {problemCount - 5} more, marked in red below.</p> : null}
          <button type="button" className="btn-secondary mt-2" onClick={goToFirstProblem}>
            Go to the first problem
          </button>
        </div>
      ) : null}
      {bridge ? <PlanSketch bridge={bridge} table={table} /> : <p className="rounded-md bg-concrete-100 p-4 text-sm text-concrete-700">Fix the fields marked in red to see the plan.</p>}
      {table ? (
        <div className="mt-3">
          <PlanSketchSpanTable summaries={table.span_summaries} units={table.units} />
        </div>
      ) : bridge ? (
        <p className="mt-3 text-sm text-concrete-700">The edge widths show once the geometry computes; the problems are marked beside their rows.</p>
      ) : null}
    </div>
  );
}
