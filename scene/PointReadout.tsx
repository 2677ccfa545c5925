import type { OffsetPoint } from '@/lib/geometry';
import { lengthText, offsetText, stationText, type Units } from '@/lib/units';

/** The numbers of one girder point, as the offset table has them, with units. */
export default function PointReadout({ row, units }: { row: OffsetPoint | null; units: Units }) {
  if (!row) {
    return <p className="text-sm text-concrete-600">Click a dark dot on an outside girder, or pick a point from the list, to see its numbers.</p>;
  }
  const len = (v: number | null) => (v === null ? '—' : lengthText(v, units));
  const items: Array<[string, string]> = [
    ['Station', stationText(row.station, units)],
    ['Offset', offsetText(row.offset, units)],
    ['Edge width', len(row.edge_width)],
    ['Edge drop', len(row.edge_drop)],
    ['Form target', len(row.form_target)],
    ['Top of girder', row.top_of_girder === null ? 'not surveyed' : len(row.top_of_girder)],
    ['Buildup', row.buildup === null ? 'needs top of girder' : len(row.buildup)],
    ['Drop from girder top', row.drop_from_girder_top === null ? 'needs top of girder' : len(row.drop_from_girder_top)],
  ];
  return (
    <div data-testid="point-readout">
      <div className="text-sm font-semibold text-concrete-800">
        Span {row.span}, girder {row.girder} ({row.side === 'left' ? 'left' : 'right'} overhang), point {row.point}
      </div>
      <dl className="mt-2 grid grid-cols-2 gap-x-4 gap-y-1 text-sm tabular sm:grid-cols-4">
        {items.map(([k, v]) => (
          <div key={k}>
            <dt className="text-concrete-600">{k}</dt>
            <dd className="text-base font-semibold text-concrete-900">{v}</dd>
          </div>
        ))}
      </dl>
    </div>
  );
}
