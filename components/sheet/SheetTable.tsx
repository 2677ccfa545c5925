import type { BracketGroup } from '@/components/checks/check-types';
import { lengthText, stationText, type Units } from '@/lib/units';

/** One printed table of the field sheet: one span and exterior girder, one row per bracket, blanks to fill in. */
export default function SheetTable({ group, units, deflections }: { group: BracketGroup; units: Units; deflections?: boolean }) {
  // With a deflection table the crew also sees the sag still to come and the screed grade at each point.
  const withDeflections = deflections ?? group.rows.some((r) => r.deflection !== 0);
  const num = (v: number | null) => (v === null ? '—' : lengthText(v, units).replace(/ (ft|m)$/, ''));
  return (
    <section className="sheet-group mb-8 break-inside-avoid print:mb-4" aria-labelledby={`sheet-${group.span}-${group.girder}`}>
      <h2 id={`sheet-${group.span}-${group.girder}`} className="mb-2 text-lg font-bold text-concrete-900">
        Span {group.span} · {group.girder} · {group.side === 'left' ? 'left (LT)' : 'right (RT)'} overhang
      </h2>
      <div className="overflow-x-auto">
        <table className="w-full border-collapse text-sm print:text-[10pt]">
          <thead>
            <tr className="bg-concrete-100 text-left align-bottom text-xs font-semibold uppercase tracking-wide text-concrete-700 print:bg-white">
              <th scope="col" className="border border-concrete-300 px-2 py-1">
                Pt
              </th>
              <th scope="col" className="border border-concrete-300 px-2 py-1">
                Station
              </th>
              <th scope="col" className="border border-concrete-300 px-2 py-1">
                Edge width{units === 'ft' ? ' (ft-in)' : ' (m)'}
              </th>
              {units === 'ft' ? (
                <th scope="col" className="border border-concrete-300 px-2 py-1">
                  Edge width (ft)
                </th>
              ) : null}
              <th scope="col" className="border border-concrete-300 px-2 py-1">
                Level-bar reading ({units})
              </th>
              <th scope="col" className="border border-concrete-300 px-2 py-1">
                Girder rod ({units})
              </th>
              <th scope="col" className="border border-concrete-300 px-2 py-1">
                Form rod ({units})
              </th>
              <th scope="col" className="border border-concrete-300 px-2 py-1">
                Extra on both ({units})
              </th>
              <th scope="col" className="border border-concrete-300 px-2 py-1">
                Form target elev. ({units})
              </th>
              {withDeflections ? (
                <>
                  <th scope="col" className="border border-concrete-300 px-2 py-1">
                    Deflection ({units})
                  </th>
                  <th scope="col" className="border border-concrete-300 px-2 py-1">
                    Screed grade ({units})
                  </th>
                </>
              ) : null}
              <th scope="col" className="border border-concrete-300 px-2 py-1 bg-white">
                Measured width
              </th>
              <th scope="col" className="border border-concrete-300 px-2 py-1 bg-white">
                Measured reading
              </th>
              <th scope="col" className="border border-concrete-300 px-2 py-1 bg-white">
                OK / initials
              </th>
            </tr>
          </thead>
          <tbody className="tabular">
            {group.rows.map((r) => (
              <tr key={r.point} className="even:bg-concrete-50 print:even:bg-white">
                <td className="border border-concrete-300 px-2 py-1 text-right">{r.point}</td>
                <td className="border border-concrete-300 px-2 py-1 whitespace-nowrap">{stationText(r.station, units)}</td>
                <td className="border border-concrete-300 px-2 py-1 text-right font-semibold whitespace-nowrap">{r.edge_width_text.replace(/ m$/, '')}</td>
                {units === 'ft' ? <td className="border border-concrete-300 px-2 py-1 text-right">{num(r.edge_width)}</td> : null}
                <td className="border border-concrete-300 px-2 py-1 text-right font-semibold">
                  {r.reading === null ? <span className="font-normal text-concrete-500">not surveyed</span> : num(r.reading)}
                </td>
                <td className="border border-concrete-300 px-2 py-1 text-right">{num(r.girder_rod)}</td>
                <td className="border border-concrete-300 px-2 py-1 text-right">{num(r.form_rod)}</td>
                <td className={`border border-concrete-300 px-2 py-1 text-right ${r.extra_rod ? 'font-semibold text-caution-700' : ''}`}>{r.extra_rod === null ? '—' : num(r.extra_rod)}</td>
                <td className="border border-concrete-300 px-2 py-1 text-right">{num(r.form_target)}</td>
                {withDeflections ? (
                  <>
                    <td className="border border-concrete-300 px-2 py-1 text-right">{num(r.deflection)}</td>
                    <td className="border border-concrete-300 px-2 py-1 text-right">{num(r.screed_grade)}</td>
                  </>
                ) : null}
                <td className="min-w-24 border border-concrete-300 bg-white px-2 py-1" />
                <td className="min-w-24 border border-concrete-300 bg-white px-2 py-1" />
                <td className="min-w-20 border border-concrete-300 bg-white px-2 py-1" />
              </tr>
            ))}
          </tbody>
        </table>
      </div>
    </section>
  );
}
