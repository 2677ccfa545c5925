import type { ChordOffsetSetRow } from './offset-table-types';
import { lengthText, type Units } from './station-text';

/** Offsets from the chord between the deck edge's points on the two bent lines to the edge line. */
export default function ChordOffsetTable({ set, units }: { set: ChordOffsetSetRow; units: Units }) {
  return (
    <div className="card overflow-x-auto">
      <table className="w-full text-sm">
        <caption className="border-b border-concrete-200 bg-concrete-100 px-4 py-2 text-left font-bold text-concrete-800">
          Span {set.span}, {set.side} edge chord: {lengthText(set.chord_length, units)} in {set.spaces} spaces
        </caption>
        <thead className="text-concrete-600">
          <tr>
            <th scope="col" className="px-3 py-2 text-right font-semibold">
              Division
            </th>
            <th scope="col" className="px-3 py-2 text-right font-semibold">
              Along chord ({units})
            </th>
            <th scope="col" className="px-3 py-2 text-right font-semibold">
              Chord offset ({units})
            </th>
          </tr>
        </thead>
        <tbody>
          {set.offsets.map((o) => (
            <tr key={o.i} className="border-t border-concrete-100 even:bg-concrete-50">
              <th scope="row" className="px-3 py-1.5 text-right font-semibold text-concrete-800">
                {o.i}
              </th>
              <td className="px-3 py-1.5 text-right">{lengthText(o.distance, units, false)}</td>
              <td className="px-3 py-1.5 text-right">{lengthText(o.offset, units, false)}</td>
            </tr>
          ))}
        </tbody>
      </table>
    </div>
  );
}
