import type { CheckRow } from '@/components/checks/check-types';
import { dateTimeText, deviationText, lengthText, stationText, type Units } from '@/lib/units';

function Verdict({ pass }: { pass: boolean | null }) {
  if (pass === null) return null;
  return <span className={`ml-1 rounded px-1.5 text-xs font-bold ${pass ? 'bg-pass-100 text-pass-700' : 'bg-fail-100 text-fail-600'}`}>{pass ? 'OK' : 'OUT'}</span>;
}

/** Every check, newest first, with what it measured, the computed value, the deviation, photos and corrections. */
export default function CheckHistoryTable({ checks, units, currentRevision }: { checks: CheckRow[]; units: Units; currentRevision: number }) {
  if (checks.length === 0) {
    return <p className="card p-4 text-concrete-700">No checks recorded yet. Open field mode on a phone at the deck edge and record the first bracket.</p>;
  }
  return (
    <div className="card overflow-x-auto">
      <table className="w-full text-sm">
        <thead className="bg-concrete-100 text-left text-xs font-semibold uppercase tracking-wide text-concrete-700">
          <tr>
            <th scope="col" className="px-3 py-2">
              #
            </th>
            <th scope="col" className="px-3 py-2">
              When / who
            </th>
            <th scope="col" className="px-3 py-2">
              Bracket
            </th>
            <th scope="col" className="px-3 py-2 text-right">
              Edge width: measured / computed
            </th>
            <th scope="col" className="px-3 py-2 text-right">
              Reading: measured / computed
            </th>
            <th scope="col" className="px-3 py-2">
              Result
            </th>
            <th scope="col" className="px-3 py-2">
              Photos
            </th>
          </tr>
        </thead>
        <tbody className="tabular divide-y divide-concrete-200">
          {checks.map((c) => (
            <tr key={c.id} className={c.superseded_by ? 'bg-concrete-50 text-concrete-500' : ''}>
              <td className="px-3 py-2 align-top font-semibold">{c.id}</td>
              <td className="px-3 py-2 align-top whitespace-nowrap">
                {dateTimeText(c.created_at)}
                <div className="text-xs text-concrete-600">{c.by ?? 'removed user'}</div>
              </td>
              <td className="px-3 py-2 align-top whitespace-nowrap">
                Span {c.span} · {c.girder} · pt {c.point}
                <div className="text-xs text-concrete-600">
                  {stationText(c.station, units)} · rev {c.revision}
                  {c.revision !== currentRevision ? <span className="ml-1 font-semibold text-caution-700">(older revision)</span> : null}
                </div>
              </td>
              <td className="px-3 py-2 text-right align-top whitespace-nowrap">
                {c.measured_edge_width === null ? (
                  '—'
                ) : (
                  <>
                    {lengthText(c.measured_edge_width, units)} / {lengthText(c.computed_edge_width, units)}
                    <div className="text-xs">
                      {deviationText(c.width_deviation, units)}
                      <Verdict pass={c.width_pass} />
                    </div>
                  </>
                )}
              </td>
              <td className="px-3 py-2 text-right align-top whitespace-nowrap">
                {c.measured_drop_from_girder_top === null ? (
                  '—'
                ) : (
                  <>
                    {lengthText(c.measured_drop_from_girder_top, units)} / {lengthText(c.computed_drop_from_girder_top, units)}
                    <div className="text-xs">
                      {deviationText(c.reading_deviation, units, 'reading')}
                      <Verdict pass={c.reading_pass} />
                    </div>
                  </>
                )}
              </td>
              <td className="px-3 py-2 align-top">
                <span className={`rounded px-2 py-0.5 text-xs font-bold ${c.pass ? 'bg-pass-100 text-pass-700' : 'bg-fail-100 text-fail-600'}`}>{c.pass ? 'PASS' : 'FAIL'}</span>
                {c.superseded_by ? <div className="mt-1 text-xs">corrected by #{c.superseded_by}</div> : null}
                {c.supersedes_id ? <div className="mt-1 text-xs text-concrete-600">corrects #{c.supersedes_id}</div> : null}
                {c.note ? <div className="mt-1 max-w-48 text-xs text-concrete-700">“{c.note}”</div> : null}
              </td>
              <td className="px-3 py-2 align-top">
                <div className="flex gap-1">
                  {c.photos.map((p) =>
                    p.content_type.startsWith('image/') ? (
                      <a key={p.id} href={p.url} target="_blank" rel="noopener" title={p.name}>
                        {/* eslint-disable-next-line @next/next/no-img-element -- a small served thumbnail behind the session; next/image's optimiser would fetch it without the cookie */}
                        <img src={p.thumbnail_url ?? p.url} alt={`Photo ${p.name} of check ${c.id}`} loading="lazy" className="h-12 w-16 rounded border border-concrete-300 object-cover" />
                      </a>
                    ) : (
                      <a key={p.id} href={p.url} className="text-xs text-brand-700 underline">
                        {p.name}
                      </a>
                    ),
                  )}
                </div>
              </td>
            </tr>
          ))}
        </tbody>
      </table>
    </div>
  );
}
