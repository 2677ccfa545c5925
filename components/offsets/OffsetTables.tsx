'use client';

import { useMemo, useState, useSyncExternalStore } from 'react';
import useSWR from 'swr';
import type { DisplayStyle, SpanSummary } from '@/lib/geometry';
import { fetcher, type ApiError } from '@/lib/client/api-client';
import { LoadFailed, Loading } from '@/components/LoadState';
import ChartOverhangStrips from '@/components/offsets/ChartOverhangStrips';
import type { ChartBent } from '@/components/offsets/ChartStrip';
import ChordOffsetTable from '@/components/offsets/ChordOffsetTable';
import GeometryProblem from '@/components/editor/GeometryProblem';
import GirderPointTable from '@/components/offsets/GirderPointTable';
import { hasDeflections, type ChordOffsetSetRow, type OffsetPointRow, type OffsetTableJson } from '@/components/offsets/offset-table-types';
import SlabElevationTable from '@/components/offsets/SlabElevationTable';
import OffsetTableToolbar, { NEAR_STATION, type OffsetFilter } from '@/components/offsets/OffsetTableToolbar';
import { parseStation, stationText, type Units } from '@/lib/units';

type TableJson = OffsetTableJson & { span_summaries?: SpanSummary[] };
type SpanGroup = { span: number; sides: { side: 'left' | 'right'; rows: OffsetPointRow[] }[]; chords: ChordOffsetSetRow[] };

const STYLE_KEY = 'chordline.offsetStyle';

/** The display style saved in this browser, or null. */
function savedStyle(): DisplayStyle | null {
  const saved = window.localStorage.getItem(STYLE_KEY);
  return saved === 'decimal-feet' || saved === 'feet-inches' ? saved : null;
}

/** Nothing to listen to: the saved style is read once the page is in the browser. */
const noSubscription = () => () => {};

function groupBySpan(points: OffsetPointRow[], chords: ChordOffsetSetRow[]): SpanGroup[] {
  const spans = new Map<number, SpanGroup>();
  const group = (span: number) => {
    let g = spans.get(span);
    if (!g) spans.set(span, (g = { span, sides: [], chords: [] }));
    return g;
  };
  for (const side of ['left', 'right'] as const) {
    for (const p of points) {
      if (p.side !== side) continue;
      const g = group(p.span);
      let entry = g.sides.find((s) => s.side === side);
      if (!entry) g.sides.push((entry = { side, rows: [] }));
      entry.rows.push(p);
    }
  }
  for (const c of chords) group(c.span).chords.push(c);
  for (const g of spans.values()) {
    g.sides.sort((a, b) => (a.side === b.side ? 0 : a.side === 'left' ? -1 : 1));
    g.chords.sort((a, b) => (a.side === b.side ? 0 : a.side === 'left' ? -1 : 1));
  }
  return [...spans.values()].sort((a, b) => a.span - b.span);
}

/**
 * The search box: a whole number is a point number; a station with its "+" ("12+45") finds the points
 * within {@link NEAR_STATION} of it; any other text matches the printed station.
 */
function matchesText(p: OffsetPointRow, units: Units, text: string): boolean {
  const q = text.trim().toLowerCase();
  if (!q) return true;
  if (/^\d+$/.test(q) && Number(q) === p.point) return true;
  if (q.includes('+')) {
    const s = parseStation(q, units);
    if (s.ok) return Math.abs(p.station - s.value) <= NEAR_STATION[units];
  }
  const station = stationText(p.station, units);
  return station.includes(q) || station.replace('+', '').includes(q.replace('+', ''));
}

/**
 * The latest revision's overhang numbers from GET /api/bridges/[id]/offsets: controls, the plan and
 * elevation strips, and per span the exterior girders' point tables and the edge chord offsets.
 */
export default function OffsetTables({ bridgeId, bents }: { bridgeId: number; bents: ChartBent[] }) {
  const { data, error, isLoading, mutate } = useSWR<TableJson, ApiError>(`/api/bridges/${bridgeId}/offsets`, fetcher, {
    revalidateOnFocus: false,
  });
  // The style chosen on this page, else the one saved in this browser (read after hydration), else decimal feet.
  const [chosen, setChosen] = useState<DisplayStyle | null>(null);
  const saved = useSyncExternalStore(noSubscription, savedStyle, () => null);
  const style: DisplayStyle = chosen ?? saved ?? 'decimal-feet';
  const [filter, setFilter] = useState<OffsetFilter>({ span: 'all', side: 'both', text: '' });
  const chooseStyle = (s: DisplayStyle) => {
    setChosen(s);
    window.localStorage.setItem(STYLE_KEY, s);
  };

  const units = (data?.units ?? 'ft') as Units;
  const exterior = useMemo(() => (data ? data.points.filter((p) => p.side !== 'interior') : []), [data]);
  const visible = useMemo(
    () => exterior.filter((p) => (filter.span === 'all' || p.span === filter.span) && (filter.side === 'both' || p.side === filter.side) && matchesText(p, units, filter.text)),
    [exterior, filter, units],
  );
  const chords = useMemo(
    () => (data?.chord_offsets ?? []).filter((c) => (filter.span === 'all' || c.span === filter.span) && (filter.side === 'both' || c.side === filter.side) && !filter.text.trim()),
    [data, filter],
  );

  if (error) {
    if (error.status === 422) return <GeometryProblem message={error.message} title="The offset table cannot be computed for this revision" />;
    return <LoadFailed error={error} retry={() => void mutate()} />;
  }
  if (isLoading || !data) {
    return <Loading>Computing the offset table…</Loading>;
  }
  if (exterior.length === 0) {
    return <p className="card p-6 text-concrete-700">This revision has no exterior girder points. Check the girders and bents in its description.</p>;
  }
  const summaries = data.span_summaries ?? [];
  const allSpans = [...new Set(exterior.map((p) => p.span))].sort((a, b) => a - b);
  const groups = groupBySpan(visible, chords);
  const deflections = hasDeflections(data.points);
  const shownStyle: DisplayStyle = units === 'm' ? 'metric' : style;

  return (
    <div className="space-y-8">
      <OffsetTableToolbar
        bridgeId={bridgeId}
        units={units}
        style={shownStyle}
        onStyle={chooseStyle}
        spans={allSpans}
        filter={filter}
        onFilter={setFilter}
        shown={visible.length}
        total={exterior.length}
      />

      {deflections ? (
        <p className="rounded-md border border-brand-300 bg-brand-50 p-3 text-sm text-brand-800" data-testid="deflection-note">
          This bridge has a dead-load deflection table: form targets, buildups and drops from the girder top include the deflection still to come, and the screed grade is the top of deck plus that
          deflection (set high so the deck ends at grade after the pour).
        </p>
      ) : null}

      <section aria-labelledby="charts-title" className="space-y-3">
        <h2 id="charts-title" className="text-xl font-bold text-concrete-900">
          Along the bridge
        </h2>
        <ChartOverhangStrips points={exterior} summaries={summaries} bents={bents} units={units} style={shownStyle} />
      </section>

      <nav aria-label="Spans" className="no-print flex flex-wrap gap-2 text-sm">
        {groups.map((g) => (
          <a key={g.span} href={`#span-${g.span}`} className="inline-flex min-h-11 items-center rounded-md border border-concrete-300 bg-white px-4 font-semibold text-brand-700 hover:bg-brand-50">
            Span {g.span}
          </a>
        ))}
      </nav>

      {groups.length === 0 ? (
        <div className="card p-6 text-concrete-700">
          <p>No girder point matches these filters.</p>
          <button type="button" className="btn-secondary mt-3 min-h-11" onClick={() => setFilter({ span: 'all', side: 'both', text: '' })}>
            Clear the filters
          </button>
        </div>
      ) : null}

      {groups.map((g) => (
        <section key={g.span} id={`span-${g.span}`} aria-labelledby={`span-${g.span}-title`} className="scroll-mt-4 space-y-4">
          <h2 id={`span-${g.span}-title`} className="text-xl font-bold text-concrete-900 print:break-after-avoid">
            Span {g.span}
          </h2>
          {g.sides.map((s) => (
            <GirderPointTable
              key={s.side}
              span={g.span}
              side={s.side}
              rows={s.rows}
              units={units}
              style={shownStyle}
              summary={summaries.find((x) => x.span === g.span && x.side === s.side)}
              deflections={deflections}
            />
          ))}
          {g.chords.length > 0 ? (
            <div className="grid gap-4 md:grid-cols-2 print:grid-cols-2">
              {g.chords.map((c) => (
                <ChordOffsetTable key={c.side} set={c} units={units} style={shownStyle} />
              ))}
            </div>
          ) : null}
          <SlabElevationTable span={g.span} points={data.points.filter((p) => p.span === g.span)} units={units} />
          {deflections ? <SlabElevationTable span={g.span} points={data.points.filter((p) => p.span === g.span)} units={units} field="screed_grade" /> : null}
        </section>
      ))}
    </div>
  );
}
