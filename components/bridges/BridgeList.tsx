'use client';

import Link from 'next/link';
import useSWR from 'swr';
import { fetcher, type ApiError } from '@/lib/client/api-client';
import { LoadFailed, Loading } from '@/components/LoadState';
import { dateTimeText, type Units } from '@/lib/units';

type BridgeSummary = { id: number; name: string; units: Units; revision: number; updatedAt: string };

const UNIT_NAMES: Record<string, string> = { ft: 'feet (ft)', m: 'metres (m)' };

/** The bridges table, read from GET /api/bridges; the empty state tells each role what comes next. */
export default function BridgeList({ canCreate }: { canCreate: boolean }) {
  const { data, error, isLoading, mutate } = useSWR<BridgeSummary[], ApiError>('/api/bridges', fetcher);

  if (error) {
    return <LoadFailed error={error} retry={() => void mutate()} />;
  }
  if (isLoading || !data) {
    return <Loading>Loading bridges…</Loading>;
  }
  if (data.length === 0) {
    return (
      <div className="card p-8 text-center">
        <h2 className="text-lg font-bold text-concrete-900">No bridges yet</h2>
        {canCreate ? (
          <>
            <p className="mt-2 text-concrete-700">
              Create the first bridge: start from the two-span starter bridge or load a bridge description you already have.
            </p>
            <Link href="/bridges/new" className="btn-primary mt-4">
              Create the first bridge
            </Link>
          </>
        ) : (
          <p className="mt-2 text-concrete-700">
            An engineer has to add a bridge before its offsets can be shown here. Ask the engineer on your project to create it.
          </p>
        )}
      </div>
    );
  }
  return (
    <div className="card overflow-x-auto">
      <table className="w-full text-left text-sm">
        <caption className="sr-only">Bridges</caption>
        <thead className="border-b border-concrete-200 bg-concrete-100 text-concrete-700">
          <tr>
            <th scope="col" className="px-4 py-3 font-semibold">
              Name
            </th>
            <th scope="col" className="px-4 py-3 font-semibold">
              Units
            </th>
            <th scope="col" className="px-4 py-3 text-right font-semibold">
              Revision
            </th>
            <th scope="col" className="px-4 py-3 font-semibold">
              Updated
            </th>
          </tr>
        </thead>
        <tbody>
          {data.map((b) => (
            <tr key={b.id} className="border-b border-concrete-100 last:border-0 hover:bg-brand-50">
              <td className="px-4 py-3">
                <Link href={`/bridges/${b.id}`} className="font-semibold text-brand-700 underline-offset-2 hover:underline">
                  {b.name}
                </Link>
              </td>
              <td className="px-4 py-3">{UNIT_NAMES[b.units] ?? b.units}</td>
              <td className="px-4 py-3 text-right">{b.revision}</td>
              <td className="px-4 py-3 text-concrete-600">{dateTimeText(b.updatedAt)}</td>
            </tr>
          ))}
        </tbody>
      </table>
    </div>
  );
}
