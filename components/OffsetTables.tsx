'use client';

import useSWR from 'swr';
import { fetcher, type ApiError } from './api-client';
import ChordOffsetTable from './ChordOffsetTable';
import GeometryProblem from './GeometryProblem';
import GirderPointTable from './GirderPointTable';
import type { ChordOffsetSetRow, OffsetPointRow, OffsetTableJson } from './offset-table-types';
import type { Units } from './station-text';

type SpanGroup = { span: number; sides: { side: 'left' | 'right'; rows: OffsetPointRow[] }[]; chords: ChordOffsetSetRow[] };

function groupBySpan(table: OffsetTableJson): SpanGroup[] {
  const spans = new Map<number, SpanGroup>();
  const group = (span: number) => {
    let g = spans.get(span);
    if (!g) spans.set(span, (g = { span, sides: [], chords: [] }));
    return g;
  };
  for (const side of ['left', 'right'] as const) {
    for (const p of table.points) {
      if (p.side !== side) continue;
      const g = group(p.span);
      let entry = g.sides.find((s) => s.side === side);
      if (!entry) g.sides.push((entry = { side, rows: [] }));
      entry.rows.push(p);
    }
  }
  for (const c of table.chord_offsets) group(c.span).chords.push(c);
  for (const g of spans.values()) {
    g.sides.sort((a, b) => (a.side === b.side ? 0 : a.side === 'left' ? -1 : 1));
    for (const s of g.sides) s.rows.sort((a, b) => a.point - b.point);
    g.chords.sort((a, b) => (a.side === b.side ? 0 : a.side === 'left' ? -1 : 1));
  }
  return [...spans.values()].sort((a, b) => a.span - b.span);
}

/** The latest revision's overhang table from GET /api/bridges/[id]/offsets, span by span. */
export default function OffsetTables({ bridgeId }: { bridgeId: number }) {
  const { data, error, isLoading, mutate } = useSWR<OffsetTableJson, ApiError>(`/api/bridges/${bridgeId}/offsets`, fetcher, {
    revalidateOnFocus: false,
  });

  if (error) {
    if (error.status === 422) return <GeometryProblem message={error.message} title="The offset table cannot be computed for this revision" />;
    return (
      <div role="alert" className="card p-6">
        <p className="text-fail-600">{error.message}</p>
        <button type="button" className="btn-secondary mt-3" onClick={() => void mutate()}>
          Try again
        </button>
      </div>
    );
  }
  if (isLoading || !data) {
    return (
      <p role="status" className="text-concrete-600">
        Computing the offset table…
      </p>
    );
  }
  const units = data.units as Units;
  const spans = groupBySpan(data);
  if (spans.length === 0) {
    return <p className="card p-6 text-concrete-700">This revision has no exterior girder points. Check the girders and bents in its description.</p>;
  }
  return (
    <div className="space-y-10">
      <nav aria-label="Spans" className="no-print flex flex-wrap gap-2 text-sm">
        {spans.map((g) => (
          <a key={g.span} href={`#span-${g.span}`} className="rounded-md border border-concrete-300 bg-white px-3 py-1 font-semibold text-brand-700 hover:bg-brand-50">
            Span {g.span}
          </a>
        ))}
      </nav>
      {spans.map((g) => (
        <section key={g.span} id={`span-${g.span}`} aria-labelledby={`span-${g.span}-title`} className="scroll-mt-4 space-y-4">
          <h2 id={`span-${g.span}-title`} className="text-xl font-bold text-concrete-900">
            Span {g.span}
          </h2>
          {g.sides.map((s) => (
            <GirderPointTable key={s.side} span={g.span} side={s.side} rows={s.rows} units={units} />
          ))}
          {g.chords.length > 0 ? (
            <div className="grid gap-4 md:grid-cols-2">
              {g.chords.map((c) => (
                <ChordOffsetTable key={c.side} set={c} units={units} />
              ))}
            </div>
          ) : null}
        </section>
      ))}
    </div>
  );
}
