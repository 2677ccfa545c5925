import { lengthText, stationsAlong, stationText, type Units } from '@/lib/units';
import type { ImportedAlignment } from '@/lib/import/landxml';

type Element = ImportedAlignment['alignment']['elements'][number];

const KIND = { line: 'Tangent (Line)', arc: 'Arc (Curve)', spiral: 'Spiral (clothoid)' } as const;

/** Radius text: the arc's radius, or a spiral's start → end radius ("tangent" for an infinite end). */
function radiusText(e: Element, units: Units): string {
  if (e.type === 'arc') return lengthText(e.radius, units, false);
  if (e.type === 'line') return '—';
  const r = (v: number | null) => (v === null ? 'tangent' : lengthText(v, units, false));
  return `${r(e.radius_start)} → ${r(e.radius_end)}`;
}

/** What a LandXML alignment holds, before it replaces the editor's alignment and profile. */
export default function LandXmlPreview({ item, units }: { item: ImportedAlignment; units: Units }) {
  const al = item.alignment;
  // The "no profile" note is said in the box above; the others are listed at the end.
  const notes = item.notes.filter((n) => !(item.profile === null && n.startsWith('No profile came')));
  const ends = stationsAlong(
    al.start_station,
    al.elements.map((e) => e.length),
  );
  const rows = al.elements.map((e, i) => ({ i, e, from: ends[i], to: ends[i + 1] }));
  const station = ends[ends.length - 1];
  return (
    <div className="space-y-3" data-testid="landxml-preview">
      <p className="text-sm text-concrete-700">
        Starts at station <span className="tabular font-semibold">{stationText(al.start_station, units)}</span>, easting <span className="tabular">{lengthText(al.start_x, units)}</span>, northing{' '}
        <span className="tabular">{lengthText(al.start_y, units)}</span>, bearing <span className="tabular">{al.start_bearing_deg.toFixed(6)}°</span>; ends at{' '}
        <span className="tabular font-semibold">{stationText(station, units)}</span>.
      </p>
      <div className="overflow-x-auto">
        <table className="w-full text-sm">
          <caption className="mb-1 text-left font-bold text-concrete-800">Alignment elements</caption>
          <thead>
            <tr className="border-b border-concrete-200 text-left text-xs text-concrete-600">
              <th className="py-1 pr-2 font-semibold">#</th>
              <th className="py-1 pr-2 font-semibold">Element</th>
              <th className="py-1 pr-2 font-semibold">From</th>
              <th className="py-1 pr-2 font-semibold">To</th>
              <th className="py-1 pr-2 text-right font-semibold">Length ({units})</th>
              <th className="py-1 pr-2 text-right font-semibold">Radius ({units})</th>
              <th className="py-1 font-semibold">Turns</th>
            </tr>
          </thead>
          <tbody>
            {rows.map(({ i, e, from, to }) => (
              <tr key={i} className="border-b border-concrete-100">
                <td className="py-1 pr-2">{i + 1}</td>
                <td className="py-1 pr-2">{KIND[e.type]}</td>
                <td className="py-1 pr-2 tabular">{stationText(from, units)}</td>
                <td className="py-1 pr-2 tabular">{stationText(to, units)}</td>
                <td className="py-1 pr-2 text-right">{lengthText(e.length, units, false)}</td>
                <td className="py-1 pr-2 text-right whitespace-nowrap">{radiusText(e, units)}</td>
                <td className="py-1">{e.type === 'line' ? '—' : e.direction === 'right' ? 'Right (cw)' : 'Left (ccw)'}</td>
              </tr>
            ))}
          </tbody>
        </table>
      </div>
      {item.profile ? (
        <div className="overflow-x-auto">
          <table className="w-full text-sm">
            <caption className="mb-1 text-left font-bold text-concrete-800">Profile{item.profile_name ? `: ${item.profile_name}` : ''}</caption>
            <thead>
              <tr className="border-b border-concrete-200 text-left text-xs text-concrete-600">
                <th className="py-1 pr-2 font-semibold">PVI</th>
                <th className="py-1 pr-2 font-semibold">Station</th>
                <th className="py-1 pr-2 text-right font-semibold">Elevation ({units})</th>
                <th className="py-1 text-right font-semibold">Vertical curve ({units})</th>
              </tr>
            </thead>
            <tbody>
              {item.profile.pvis.map((p, i) => (
                <tr key={i} className="border-b border-concrete-100">
                  <td className="py-1 pr-2">{i + 1}</td>
                  <td className="py-1 pr-2 tabular">{stationText(p.station, units)}</td>
                  <td className="py-1 pr-2 text-right">{lengthText(p.elevation, units, false)}</td>
                  <td className="py-1 text-right">{p.curve_length ? lengthText(p.curve_length, units, false) : '—'}</td>
                </tr>
              ))}
            </tbody>
          </table>
        </div>
      ) : (
        <div className="rounded-md border border-caution-500 bg-caution-100 p-3 text-sm text-caution-700" data-testid="landxml-no-profile">
          <p className="font-semibold">No profile comes with this alignment; the editor will ask for one.</p>
          {item.profile_left_out && item.profile_left_out.length > 0 ? (
            <ul className="mt-1 list-disc pl-5">
              {item.profile_left_out.map((p) => (
                <li key={p}>{p}</li>
              ))}
            </ul>
          ) : null}
        </div>
      )}
      {notes.length > 0 ? (
        <ul className="list-disc pl-5 text-sm text-concrete-700">
          {notes.map((n) => (
            <li key={n}>{n}</li>
          ))}
        </ul>
      ) : null}
    </div>
  );
}
