import type { Metadata } from 'next';
import Link from 'next/link';
import DeleteBridgeButton from '@/components/bridges/DeleteBridgeButton';
import GeometrySummary from '@/components/bridges/GeometrySummary';
import RenameBridgeForm from '@/components/bridges/RenameBridgeForm';
import RevisionHistory from '@/components/history/RevisionHistory';
import { requireUser } from '@/lib/auth/server-session';
import { dateTimeText } from '@/lib/units';
import { roleAllows } from '@/lib/auth/roles';
import { loadBridge } from './load-bridge';
import BridgeBreadcrumb from '@/components/BridgeBreadcrumb';

type Params = Promise<{ id: string }>;

export async function generateMetadata({ params }: { params: Params }): Promise<Metadata> {
  const { id } = await params;
  // The session first: a signed-out request gets the sign-in redirect, never the bridge's name.
  await requireUser(`/bridges/${id}`);
  try {
    const { bridge } = await loadBridge(id);
    return { title: bridge.name };
  } catch {
    return { title: 'Bridge' };
  }
}

export default async function BridgePage({ params }: { params: Params }) {
  const { id } = await params;
  const user = await requireUser(`/bridges/${id}`);
  const { bridge, revisions } = await loadBridge(id);
  const unitName = bridge.units === 'm' ? 'metres (m)' : 'feet (ft)';

  return (
    <>
      <BridgeBreadcrumb bridge={bridge} />
      <div className="mb-6 flex flex-wrap items-start justify-between gap-4">
        <div>
          <h1 className="text-2xl font-bold text-concrete-900">{bridge.name}</h1>
          <p className="mt-1 text-concrete-600">
            Units: {unitName} · Current revision <span className="tabular font-semibold text-concrete-800">{bridge.revision}</span> · Updated{' '}
            {dateTimeText(bridge.updatedAt)}
          </p>
        </div>
        <div className="flex flex-wrap items-start gap-2">
          <Link href={`/bridges/${bridge.id}/offsets`} className="btn-primary">
            Offset table
          </Link>
          <Link href={`/bridges/${bridge.id}/field`} className="btn-secondary">
            Field mode
          </Link>
          <Link href={`/bridges/${bridge.id}/checks`} className="btn-secondary">
            Checks
          </Link>
          <Link href={`/bridges/${bridge.id}/sheet`} className="btn-secondary">
            Field sheet
          </Link>
          <Link href={`/bridges/${bridge.id}/view`} className="btn-secondary">
            3D view
          </Link>
          <a href={`/api/bridges/${bridge.id}/offsets.csv`} className="btn-secondary" download>
            Download CSV
          </a>
          {roleAllows(user.role, ['engineer', 'inspector']) ? (
            <Link href={`/bridges/${bridge.id}/survey`} className="btn-secondary">
              Top-of-girder survey
            </Link>
          ) : null}
          {roleAllows(user.role, ['engineer']) ? (
            <Link href={`/bridges/${bridge.id}/edit`} className="btn-secondary">
              Edit geometry
            </Link>
          ) : null}
          <Link href={`/bridges/${bridge.id}/history`} className="btn-secondary">
            History
          </Link>
          {roleAllows(user.role, ['engineer']) ? <RenameBridgeForm bridgeId={bridge.id} name={bridge.name} /> : null}
          {user.role === 'admin' ? <DeleteBridgeButton bridgeId={bridge.id} name={bridge.name} /> : null}
        </div>
      </div>

      <h2 className="mb-3 text-lg font-bold text-concrete-900">Geometry of revision {bridge.revision}</h2>
      <GeometrySummary description={bridge.description} />

      <div className="mt-8">
        <RevisionHistory revisions={revisions} current={bridge.revision} />
      </div>
    </>
  );
}
