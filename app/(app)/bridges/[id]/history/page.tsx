import type { Metadata } from 'next';
import Link from 'next/link';
import HistoryCompareForm from '@/components/history/HistoryCompareForm';
import HistoryEdgeWidthChanges from '@/components/history/HistoryEdgeWidthChanges';
import HistoryFieldChanges from '@/components/history/HistoryFieldChanges';
import HistoryRevisionList from '@/components/history/HistoryRevisionList';
import { requireUser } from '@/lib/auth/server-session';
import { roleAllows } from '@/lib/auth/roles';
import { getRevision } from '@/lib/services/bridges';
import { diffRevisions } from '@/lib/services/revision-diff';
import { loadBridge } from '../load-bridge';
import BridgeBreadcrumb from '@/components/BridgeBreadcrumb';

type Params = Promise<{ id: string }>;
type Search = Promise<{ from?: string | string[]; to?: string | string[] }>;

export const metadata: Metadata = { title: 'Revision history' };

function pick(value: string | string[] | undefined, known: Set<number>): number | null {
  const n = Number(Array.isArray(value) ? value[0] : value);
  return Number.isInteger(n) && known.has(n) ? n : null;
}

export default async function HistoryPage({ params, searchParams }: { params: Params; searchParams: Search }) {
  const { id } = await params;
  const user = await requireUser(`/bridges/${id}/history`);
  const search = await searchParams;
  const { bridge, revisions } = await loadBridge(id);
  const known = new Set(revisions.map((r) => r.revision));
  const to = pick(search.to, known) ?? bridge.revision;
  const from = pick(search.from, known) ?? (known.has(to - 1) ? to - 1 : null);
  const compared = from !== null && from !== to ? await Promise.all([getRevision(id, from), getRevision(id, to)]) : null;
  const diff = compared ? diffRevisions(compared[0].description, compared[1].description) : null;

  return (
    <>
      <BridgeBreadcrumb bridge={bridge} here="History" />
      <div className="mb-4 flex flex-wrap items-end justify-between gap-3">
        <div>
          <h1 className="text-2xl font-bold text-concrete-900">Revision history</h1>
          <p className="mt-1 text-concrete-600">
            {bridge.name} · {revisions.length} {revisions.length === 1 ? 'revision' : 'revisions'} · current revision <span className="tabular font-semibold text-concrete-800">{bridge.revision}</span>
          </p>
        </div>
        {roleAllows(user.role, ['engineer']) ? (
          <Link href={`/bridges/${bridge.id}/edit`} className="btn-primary">
            Edit geometry
          </Link>
        ) : null}
      </div>

      <div className="space-y-6">
        <HistoryRevisionList bridgeId={bridge.id} revisions={revisions} current={bridge.revision} from={from} to={to} />
        {revisions.length < 2 ? (
          <p className="card p-4 text-concrete-700">This bridge has one revision so far. Each save in the geometry editor adds a revision; then this page shows what changed between any two.</p>
        ) : (
          <>
            <HistoryCompareForm bridgeId={bridge.id} revisions={revisions} from={from ?? to} to={to} />
            {compared && diff ? (
              <section aria-labelledby="changes-title" className="space-y-4">
                <h2 id="changes-title" className="text-xl font-bold text-concrete-900">
                  Revision {from} → revision {to}
                </h2>
                <HistoryFieldChanges changes={diff.fields} before={compared[0].description} after={compared[1].description} from={from as number} to={to} />
                <HistoryEdgeWidthChanges diff={diff} from={from as number} to={to} />
              </section>
            ) : (
              <p className="card p-4 text-concrete-700">Choose two different revisions to see what changed between them.</p>
            )}
          </>
        )}
      </div>
    </>
  );
}
