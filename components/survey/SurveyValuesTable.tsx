import type { SurveyListing } from '@/lib/services/survey';
import { dateTimeText, elevationCell } from '@/lib/units';

/** The stored top-of-girder values of a bridge with who imported each and when, and earlier values. */
export default function SurveyValuesTable({ listing }: { listing: SurveyListing }) {
  const elev = (v: number) => elevationCell(v, listing.units);
  if (listing.values.length === 0) {
    return (
      <p className="card p-6 text-concrete-700">
        No surveyed points are stored yet. The offset table shows buildups only where the description itself lists a top of girder; import a survey file to add the rest.
      </p>
    );
  }
  return (
    <div className="card overflow-x-auto">
      <table className="w-full text-sm">
        <caption className="border-b border-concrete-200 bg-concrete-100 px-4 py-2 text-left font-bold text-concrete-800">Stored top-of-girder elevations ({listing.values.length} points)</caption>
        <thead className="text-concrete-600">
          <tr>
            <th scope="col" className="sticky left-0 bg-white px-3 py-2 text-left font-semibold">
              Girder point
            </th>
            <th scope="col" className="px-3 py-2 text-right font-semibold">
              Top of girder ({listing.units})
            </th>
            <th scope="col" className="px-3 py-2 text-left font-semibold">
              Imported
            </th>
            <th scope="col" className="px-3 py-2 text-left font-semibold">
              Earlier values
            </th>
          </tr>
        </thead>
        <tbody>
          {listing.values.map((v) => (
            <tr key={`${v.girder}-${v.span}-${v.point}`} className="border-t border-concrete-100 align-top">
              <th scope="row" className="sticky left-0 bg-white px-3 py-1.5 text-left font-semibold whitespace-nowrap text-concrete-800">
                {v.girder} · span {v.span} · pt {v.point}
                {v.points_per_span !== listing.points_per_span ? <span className="font-normal text-concrete-600"> of {v.points_per_span}</span> : null}
                {v.point_on_current_revision === null ? (
                  <span className="ml-2 rounded bg-caution-100 px-1.5 py-0.5 text-xs font-semibold text-caution-700">not a girder point of revision {listing.revision}</span>
                ) : v.point_on_current_revision !== v.point ? (
                  <span className="ml-2 rounded bg-concrete-100 px-1.5 py-0.5 text-xs font-semibold text-concrete-700">now point {v.point_on_current_revision}</span>
                ) : null}
              </th>
              <td className="px-3 py-1.5 text-right font-semibold">{elev(v.elevation)}</td>
              <td className="px-3 py-1.5 whitespace-nowrap text-concrete-700">
                {v.imported_by ?? 'a removed user'}, {dateTimeText(v.imported_at)}
              </td>
              <td className="px-3 py-1.5 text-concrete-600">
                {v.history.length === 0 ? '—' : v.history.map((h) => `${elev(h.elevation)} (${h.imported_by ?? 'a removed user'}, ${dateTimeText(h.imported_at)})`).join('; ')}
              </td>
            </tr>
          ))}
        </tbody>
      </table>
    </div>
  );
}
