import type { BridgeDescription } from '@/lib/geometry';
import SummaryTable from '@/components/offsets/SummaryTable';
import { enteredLengthText, lengthText, offsetText, slopeText, stationsAlong, stationText, type Units } from '@/lib/units';

/** Plain-language summary of a stored description: alignment, profile, section, bents, spans, girders. */
export default function GeometrySummary({ description }: { description: BridgeDescription }) {
  const units = description.units as Units;
  const len = (v: number | undefined) => lengthText(v, units);
  const entered = (v: number | undefined) => enteredLengthText(v, units);
  const sta = (v: number) => stationText(v, units);
  // A flared edge is a station/offset list: show each row.
  const edgeText = (e: BridgeDescription['deck']['left_edge_offset']) =>
    typeof e === 'number' ? offsetText(e, units, true) : `flared: ${e.map((r) => `${sta(r.station)} ${offsetText(r.offset, units, true)}`).join(' · ')}`;

  const ends = stationsAlong(
    description.alignment.start_station,
    description.alignment.elements.map((el) => el.length),
  );
  const elements = description.alignment.elements.map((el, i) => {
    const kind = el.type === 'arc' ? `Curve ${el.direction}` : 'Tangent';
    return [String(i + 1), kind, sta(ends[i]), sta(ends[i + 1]), len(el.length), el.type === 'arc' ? len(el.radius) : '—'];
  });

  const bents = description.bents.map((b) => [b.name, sta(b.station), `${b.skew_deg.toFixed(2)}°`]);
  const spans = description.bents.slice(0, -1).map((b, j) => {
    const next = description.bents[j + 1];
    return [`Span ${j + 1}`, `${b.name} to ${next.name}`, sta(b.station), sta(next.station), len(next.station - b.station)];
  });
  const girders = description.girders.map((g) => [g.name, g.layout === 'chord' ? 'Straight (chord)' : 'Curved', g.offsets.map((o) => offsetText(o, units)).join(' · ')]);
  const deck = description.deck;
  const settlement = deck.form_settlement ?? (units === 'm' ? 0.005 : 0.02);
  const section: React.ReactNode[][] = [
    ['Left deck edge', edgeText(deck.left_edge_offset)],
    ['Right deck edge', edgeText(deck.right_edge_offset)],
    ['Slab thickness over girders', entered(deck.slab_thickness)],
    ['Edge thickness', entered(deck.edge_thickness)],
    ['Left barrier width', entered(deck.left_barrier_width)],
    ['Right barrier width', entered(deck.right_barrier_width)],
    [`Form settlement allowance${deck.form_settlement === undefined ? ' (default)' : ''}`, entered(settlement)],
    ['Girder points per span', `${description.points_per_span ?? 10} divisions (${(description.points_per_span ?? 10) + 1} points)`],
    ['Chord offset spaces per span', `${description.chord_spaces ?? 20} spaces`],
  ];
  const pvis = description.profile.pvis.map((p) => [sta(p.station), len(p.elevation), p.curve_length ? len(p.curve_length) : '—']);
  const slopes = description.cross_slopes.map((c) => [sta(c.station), slopeText(c.left), slopeText(c.right)]);

  return (
    <div className="grid gap-4 lg:grid-cols-2">
      <div className="lg:col-span-2">
        <SummaryTable
          title={`Alignment: from station ${sta(description.alignment.start_station)}, bearing ${description.alignment.start_bearing_deg.toFixed(4)}°`}
          headers={['#', 'Element', 'From station', 'To station', `Length (${units})`, `Radius (${units})`]}
          rows={elements}
          numericFrom={2}
        />
      </div>
      <SummaryTable title="Bents" headers={['Bent', 'Station', 'Skew']} rows={bents} />
      <SummaryTable title="Spans (lengths along the alignment)" headers={['Span', 'Between', 'From', 'To', `Length (${units})`]} rows={spans} numericFrom={2} />
      <div className="lg:col-span-2">
        <SummaryTable title="Girders (offset at each bent, in order)" headers={['Girder', 'Layout', `Offsets (${units})`]} rows={girders} numericFrom={2} />
      </div>
      <SummaryTable title="Deck section" headers={['Value', 'Amount']} rows={section} />
      <div className="space-y-4">
        <SummaryTable title="Profile grade: vertical intersection points" headers={['Station', `Elevation (${units})`, `Vertical curve (${units})`]} rows={pvis} numericFrom={0} />
        <SummaryTable title="Cross slopes (outward from the alignment)" headers={['Station', 'Left', 'Right']} rows={slopes} numericFrom={0} />
      </div>
    </div>
  );
}
