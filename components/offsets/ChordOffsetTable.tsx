'use client';

import { useMemo, useState } from 'react';
import type { DisplayStyle } from '@/lib/geometry';
import type { ChordOffsetSetRow } from '@/components/offsets/offset-table-types';
import { lengthCell, lengthUnit, lengthWithUnit, type Units } from '@/lib/units';
import OffsetSortHeader, { type SortDirection } from '@/components/offsets/OffsetSortHeader';

type Key = 'i' | 'distance' | 'offset';

/** Offsets from the chord between the deck edge's points on the two bent lines to the edge line. */
export default function ChordOffsetTable({ set, units, style }: { set: ChordOffsetSetRow; units: Units; style: DisplayStyle }) {
  const [sort, setSort] = useState<{ key: Key; direction: SortDirection }>({ key: 'i', direction: 'ascending' });
  const sorted = useMemo(() => {
    const sign = sort.direction === 'ascending' ? 1 : -1;
    return [...set.offsets].sort((a, b) => (a[sort.key] - b[sort.key]) * sign || a.i - b.i);
  }, [set.offsets, sort]);
  const onSort = (key: Key) => setSort((s) => (s.key === key ? { key, direction: s.direction === 'ascending' ? 'descending' : 'ascending' } : { key, direction: 'ascending' }));
  const unit = lengthUnit(units, style);
  return (
    <div className="card overflow-x-auto print:overflow-visible">
      <table className="w-full text-sm">
        <caption className="border-b border-concrete-200 bg-concrete-100 px-4 py-2 text-left font-bold text-concrete-800">
          Span {set.span}, {set.side} edge chord: {lengthWithUnit(set.chord_length, units, style)} in {set.spaces} spaces
          <span className="block text-xs font-normal text-concrete-700">Offset square to the chord; positive where the edge lies outward of the chord.</span>
        </caption>
        <thead className="bg-concrete-100">
          <tr className="align-bottom">
            <OffsetSortHeader label="Division" active={sort.key === 'i'} direction={sort.direction} onSort={() => onSort('i')} sticky />
            <OffsetSortHeader label="Along chord" unit={unit} active={sort.key === 'distance'} direction={sort.direction} onSort={() => onSort('distance')} />
            <OffsetSortHeader label="Chord offset" unit={unit} active={sort.key === 'offset'} direction={sort.direction} onSort={() => onSort('offset')} />
          </tr>
        </thead>
        <tbody>
          {sorted.map((o) => (
            <tr key={o.i} className="break-inside-avoid border-t border-concrete-100 bg-white even:bg-concrete-50">
              <th scope="row" className="sticky left-0 bg-inherit px-3 py-1.5 text-right font-semibold text-concrete-800 print:static print:py-0.5">
                {o.i}
              </th>
              <td className="px-3 py-1.5 text-right whitespace-nowrap print:py-0.5">{lengthCell(o.distance, units, style)}</td>
              <td className="px-3 py-1.5 text-right font-semibold whitespace-nowrap print:py-0.5">{lengthCell(o.offset, units, style)}</td>
            </tr>
          ))}
        </tbody>
      </table>
    </div>
  );
}
