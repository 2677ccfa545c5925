import Link from 'next/link';
import { dateTimeText } from '@/lib/units';

type Revision = { revision: number; author: string | null; note: string; createdAt: string };

/** Every revision, newest first, with author, time and note, and a link to what each one changed. */
export default function HistoryRevisionList({ bridgeId, revisions, current, from, to }: { bridgeId: number; revisions: Revision[]; current: number; from: number | null; to: number | null }) {
  return (
    <div className="card overflow-x-auto">
      <table className="w-full text-sm">
        <caption className="px-4 pt-3 text-left text-lg font-bold text-concrete-900">Revisions</caption>
        <thead>
          <tr className="border-b border-concrete-200 text-left text-xs text-concrete-600">
            <th className="px-4 py-2 font-semibold">Revision</th>
            <th className="px-2 py-2 font-semibold">Author</th>
            <th className="px-2 py-2 font-semibold">Saved</th>
            <th className="px-2 py-2 font-semibold">Note</th>
            <th className="px-4 py-2 font-semibold">
              <span className="sr-only">Changes</span>
            </th>
          </tr>
        </thead>
        <tbody>
          {revisions.map((r) => {
            const picked = r.revision === from || r.revision === to;
            return (
              <tr key={r.revision} className={`border-b border-concrete-100 ${picked ? 'bg-brand-50' : ''}`}>
                <td className="px-4 py-2 tabular font-semibold whitespace-nowrap">
                  {r.revision}
                  {r.revision === current ? <span className="ml-2 rounded bg-brand-100 px-1.5 py-0.5 text-xs font-semibold text-brand-700">current</span> : null}
                </td>
                <td className="px-2 py-2 whitespace-nowrap">{r.author ?? 'Removed user'}</td>
                <td className="px-2 py-2 whitespace-nowrap">{dateTimeText(r.createdAt)}</td>
                <td className="px-2 py-2">{r.note || '—'}</td>
                <td className="px-4 py-2 text-right whitespace-nowrap">
                  {r.revision > 1 ? (
                    <Link href={`/bridges/${bridgeId}/history?from=${r.revision - 1}&to=${r.revision}`} className="text-brand-700 hover:underline">
                      What changed
                    </Link>
                  ) : (
                    <span className="text-concrete-500">First revision</span>
                  )}
                </td>
              </tr>
            );
          })}
        </tbody>
      </table>
    </div>
  );
}
