import type { SurveyImportSummary } from '@/lib/services/survey';
import { dateTimeText } from '@/lib/units';

/** Every committed survey file of a bridge, newest first: who, when, against which revision. */
export default function SurveyImportLog({ imports }: { imports: SurveyImportSummary[] }) {
  if (imports.length === 0) return null;
  return (
    <div className="card overflow-x-auto">
      <table className="w-full text-sm">
        <caption className="border-b border-concrete-200 bg-concrete-100 px-4 py-2 text-left font-bold text-concrete-800">Survey imports</caption>
        <thead className="text-concrete-600">
          <tr>
            <th scope="col" className="px-3 py-2 text-left font-semibold">
              When
            </th>
            <th scope="col" className="px-3 py-2 text-left font-semibold">
              Who
            </th>
            <th scope="col" className="px-3 py-2 text-left font-semibold">
              File
            </th>
            <th scope="col" className="px-3 py-2 text-right font-semibold">
              Revision
            </th>
            <th scope="col" className="px-3 py-2 text-right font-semibold">
              Points
            </th>
            <th scope="col" className="px-3 py-2 text-right font-semibold">
              Replaced
            </th>
          </tr>
        </thead>
        <tbody>
          {imports.map((i) => (
            <tr key={i.id} className="border-t border-concrete-100">
              <td className="px-3 py-1.5 whitespace-nowrap">{dateTimeText(i.imported_at)}</td>
              <td className="px-3 py-1.5">{i.imported_by ?? 'a removed user'}</td>
              <td className="px-3 py-1.5 break-all">{i.filename || '—'}</td>
              <td className="px-3 py-1.5 text-right">{i.revision}</td>
              <td className="px-3 py-1.5 text-right">{i.rows}</td>
              <td className="px-3 py-1.5 text-right">{i.replaced}</td>
            </tr>
          ))}
        </tbody>
      </table>
    </div>
  );
}
