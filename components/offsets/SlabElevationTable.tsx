import type { OffsetPointRow } from '@/components/offsets/offset-table-types';
import { elevationCell, stationText, type Units } from '@/lib/units';

/** What the table shows: the bottom of slab, or (with deflections) the screed grade, over each girder. */
const WHAT = {
  bottom_of_slab: { title: 'Bottom of slab', caption: 'bottom-of-slab elevation' },
  screed_grade: { title: 'Screed grade (top of deck + deflection)', caption: 'screed grade (top of deck plus the deflection still to come)' },
} as const;

/**
 * Bottom-of-slab elevation (or screed grade) over every girder's centreline (interior girders too) at
 * each girder point of one span: the construction elevations a designer puts on the plans. Folded by default.
 */
export default function SlabElevationTable({ span, points, units, field = 'bottom_of_slab' }: { span: number; points: OffsetPointRow[]; units: Units; field?: keyof typeof WHAT }) {
  const girders = [...new Set(points.map((p) => p.girder))];
  const byKey = new Map(points.map((p) => [`${p.girder}\u0000${p.point}`, p]));
  const pointNumbers = [...new Set(points.map((p) => p.point))].sort((a, b) => a - b);
  if (girders.length === 0) return null;
  return (
    <details className="card overflow-hidden">
      <summary className="cursor-pointer select-none px-4 py-3 font-semibold text-brand-700">
        {WHAT[field].title} over every girder, span {span} ({girders.length} girders, elevations in {units === 'm' ? 'm' : 'ft'})
      </summary>
      <div className="overflow-x-auto">
        <table className="w-full text-sm">
          <caption className="sr-only">
            Span {span}: {WHAT[field].caption} over each girder centreline at each girder point
          </caption>
          <thead className="bg-concrete-100 text-concrete-700">
            <tr>
              <th scope="col" className="sticky left-0 bg-concrete-100 px-3 py-2 text-right font-semibold">
                Point
              </th>
              {girders.map((g) => (
                <th key={g} scope="col" className="px-3 py-2 text-right font-semibold">
                  {g}
                </th>
              ))}
            </tr>
          </thead>
          <tbody>
            {pointNumbers.map((k) => (
              <tr key={k} className="border-t border-concrete-100 bg-white even:bg-concrete-50">
                <th scope="row" className="sticky left-0 bg-inherit px-3 py-1.5 text-right font-semibold text-concrete-800">
                  {k}
                </th>
                {girders.map((g) => {
                  const p = byKey.get(`${g}\u0000${k}`);
                  return (
                    <td key={g} className="px-3 py-1.5 text-right tabular" title={p ? `${g} at ${stationText(p.station, units)}` : undefined}>
                      {p ? elevationCell(p[field], units) : '—'}
                    </td>
                  );
                })}
              </tr>
            ))}
          </tbody>
        </table>
      </div>
    </details>
  );
}
