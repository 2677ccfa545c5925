import type { OffsetPointRow } from './offset-table-types';
import { lengthText, offsetText, stationText, type Units } from './station-text';

const SIDE_NAME = { left: 'Left', right: 'Right' } as const;

/** One exterior girder's setting numbers along one span: a row per girder point. */
export default function GirderPointTable({ span, side, rows, units }: { span: number; side: 'left' | 'right'; rows: OffsetPointRow[]; units: Units }) {
  const num = (v: number | null) => lengthText(v, units, false);
  const girder = rows[0]?.girder ?? '';
  const u = `(${units})`;
  return (
    <div className="card overflow-x-auto">
      <table className="w-full text-sm">
        <caption className="border-b border-concrete-200 bg-concrete-100 px-4 py-2 text-left font-bold text-concrete-800">
          Span {span}, {SIDE_NAME[side].toLowerCase()} overhang: exterior girder {girder}
        </caption>
        <thead className="text-concrete-600">
          <tr className="align-bottom">
            <th scope="col" className="px-3 py-2 text-right font-semibold">
              Point
            </th>
            <th scope="col" className="px-3 py-2 text-right font-semibold">
              Station
            </th>
            <th scope="col" className="px-3 py-2 text-right font-semibold">
              Offset {u}
            </th>
            <th scope="col" className="px-3 py-2 text-right font-semibold">
              Edge width {u}
            </th>
            <th scope="col" className="px-3 py-2 text-right font-semibold">
              Edge drop {u}
            </th>
            <th scope="col" className="px-3 py-2 text-right font-semibold">
              Form target {u}
            </th>
            <th scope="col" className="px-3 py-2 text-right font-semibold">
              Top of girder {u}
            </th>
            <th scope="col" className="px-3 py-2 text-right font-semibold">
              Buildup {u}
            </th>
            <th scope="col" className="px-3 py-2 text-right font-semibold">
              Drop from girder top {u}
            </th>
          </tr>
        </thead>
        <tbody>
          {rows.map((p) => (
            <tr key={p.point} className="border-t border-concrete-100 even:bg-concrete-50">
              <th scope="row" className="px-3 py-1.5 text-right font-semibold text-concrete-800">
                {p.point}
              </th>
              <td className="px-3 py-1.5 text-right">{stationText(p.station, units)}</td>
              <td className="px-3 py-1.5 text-right">{offsetText(p.offset, units)}</td>
              <td className="px-3 py-1.5 text-right font-semibold">{num(p.edge_width)}</td>
              <td className="px-3 py-1.5 text-right">{num(p.edge_drop)}</td>
              <td className="px-3 py-1.5 text-right">{num(p.form_target)}</td>
              <td className="px-3 py-1.5 text-right">{num(p.top_of_girder)}</td>
              <td className="px-3 py-1.5 text-right">{num(p.buildup)}</td>
              <td className="px-3 py-1.5 text-right font-semibold">{num(p.drop_from_girder_top)}</td>
            </tr>
          ))}
        </tbody>
      </table>
    </div>
  );
}
