'use client';

import PlanSketch from './PlanSketch';
import PlanSketchSpanTable from './PlanSketchSpanTable';
import type { DraftCheck } from '@/lib/editor/check-draft';

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
