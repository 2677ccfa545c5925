'use client';

import { useMemo, useState } from 'react';
import type { DisplayStyle, SpanSummary } from '@/lib/geometry';
import type { OffsetPointRow } from '@/components/offsets/offset-table-types';
import { elevationCell, lengthCell, lengthUnit, lengthWithUnit, offsetCell, stationText, type Units } from '@/lib/units';
import OffsetSortHeader, { type SortDirection } from '@/components/offsets/OffsetSortHeader';

const SIDE_NAME = { left: 'Left', right: 'Right' } as const;

type Key = 'point' | 'station' | 'offset' | 'edge_width' | 'edge_drop' | 'form_target' | 'top_of_girder' | 'buildup' | 'drop_from_girder_top' | 'deflection' | 'screed_grade';
type Column = { key: Key; label: string; kind: 'count' | 'station' | 'offset' | 'length' | 'elevation'; strong?: boolean };

/** Shown only when the bridge has deflections: the sag still to come, and the grade the screed strikes. */
const DEFLECTION_COLUMNS: Column[] = [
  { key: 'deflection', label: 'Deflection', kind: 'length' },
  { key: 'screed_grade', label: 'Screed grade', kind: 'elevation' },
];

const COLUMNS: Column[] = [
  { key: 'point', label: 'Point', kind: 'count' },
  { key: 'station', label: 'Station', kind: 'station' },
  { key: 'offset', label: 'Offset', kind: 'offset' },
  { key: 'edge_width', label: 'Edge width', kind: 'length', strong: true },
  { key: 'edge_drop', label: 'Edge drop', kind: 'length' },
  { key: 'form_target', label: 'Form target', kind: 'elevation' },
  { key: 'top_of_girder', label: 'Top of girder', kind: 'elevation' },
  { key: 'buildup', label: 'Buildup', kind: 'length' },
  { key: 'drop_from_girder_top', label: 'Drop from girder top', kind: 'length', strong: true },
];

/**
 * One exterior girder's setting numbers along one span: a row per girder point, sortable by any
 * column, with the two points between which the edge width changes fastest marked.
 */
export default function GirderPointTable({
  span,
  side,
  rows,
  units,
  style,
  summary,
  deflections = false,
}: {
  span: number;
  side: 'left' | 'right';
  rows: OffsetPointRow[];
  units: Units;
  style: DisplayStyle;
  summary?: SpanSummary;
  /** The bridge has a deflection table: add the deflection and screed-grade columns. */
  deflections?: boolean;
}) {
  const columns = deflections ? [...COLUMNS.slice(0, 6), ...DEFLECTION_COLUMNS, ...COLUMNS.slice(6)] : COLUMNS;
  const [sort, setSort] = useState<{ key: Key; direction: SortDirection }>({ key: 'point', direction: 'ascending' });
  const girder = rows[0]?.girder ?? summary?.girder ?? '';
  const fast = summary?.fastest_change ?? null;
  const isFast = (point: number) => fast !== null && (point === fast.from_point || point === fast.to_point);

  const sorted = useMemo(() => {
    const sign = sort.direction === 'ascending' ? 1 : -1;
    // Missing values (no survey) always sink to the bottom, whichever way the column is sorted.
    return [...rows].sort((a, b) => {
      const x = a[sort.key] as number | null;
      const y = b[sort.key] as number | null;
      if (x === null && y === null) return a.point - b.point;
      if (x === null) return 1;
      if (y === null) return -1;
      return (x - y) * sign || a.point - b.point;
    });
  }, [rows, sort]);

  const unitOf = (kind: string) => (kind === 'length' || kind === 'offset' ? lengthUnit(units, style) : kind === 'elevation' ? units : undefined);
  const cell = (p: OffsetPointRow, key: Key, kind: string) => {
    if (kind === 'count') return String(p.point);
    if (kind === 'station') return stationText(p.station, units);
    if (kind === 'offset') return offsetCell(p.offset, units, style);
    if (kind === 'elevation') return elevationCell(p[key] as number | null, units);
    return lengthCell(p[key] as number | null, units, style);
  };
  const onSort = (key: Key) => setSort((s) => (s.key === key ? { key, direction: s.direction === 'ascending' ? 'descending' : 'ascending' } : { key, direction: 'ascending' }));

  return (
    <div className="card overflow-x-auto print:overflow-visible">
      <table className="w-full text-sm">
        <caption className="border-b border-concrete-200 bg-concrete-100 px-4 py-2 text-left text-concrete-800">
          <span className="font-bold">
            Span {span}, {SIDE_NAME[side].toLowerCase()} overhang: exterior girder {girder}
          </span>
          {summary ? (
            <span className="block text-xs font-normal text-concrete-700 sm:inline sm:before:content-['_·_']">
              Edge width {lengthCell(summary.min_edge_width, units, style)} to {lengthWithUnit(summary.max_edge_width, units, style)}
              {fast ? (
                <>
                  {' '}
                  · changes fastest between points {fast.from_point} and {fast.to_point} ({lengthWithUnit(Math.abs(fast.width_change), units, style)})
                </>
              ) : null}
            </span>
          ) : null}
        </caption>
        <thead className="bg-concrete-100">
          <tr className="align-bottom">
            {columns.map((c, i) => (
              <OffsetSortHeader key={c.key} label={c.label} unit={unitOf(c.kind)} active={sort.key === c.key} direction={sort.direction} onSort={() => onSort(c.key)} sticky={i === 0} />
            ))}
          </tr>
        </thead>
        <tbody>
          {sorted.map((p) => {
            const marked = isFast(p.point);
            return (
              <tr key={p.point} data-point={p.point} className={`border-t border-concrete-100 ${marked ? 'bg-caution-100' : 'bg-white even:bg-concrete-50'} break-inside-avoid`}>
                {columns.map((c, i) =>
                  i === 0 ? (
                    <th
                      key={c.key}
                      scope="row"
                      className={`sticky left-0 px-3 py-1.5 text-right font-semibold whitespace-nowrap text-concrete-800 print:static print:px-1.5 print:py-0.5 ${
                        marked ? 'border-l-4 border-caution-500 bg-caution-100' : 'bg-inherit'
                      }`}
                    >
                      {marked ? (
                        <span className="mr-1 text-xs font-bold text-caution-700" title="The edge width changes fastest here">
                          fastest
                        </span>
                      ) : null}
                      {p.point}
                    </th>
                  ) : (
                    <td key={c.key} className={`px-2.5 py-1.5 text-right whitespace-nowrap print:px-1.5 print:py-0.5 ${c.strong ? 'font-semibold' : ''}`}>
                      {cell(p, c.key, c.kind)}
                    </td>
                  ),
                )}
              </tr>
            );
          })}
        </tbody>
      </table>
    </div>
  );
}
