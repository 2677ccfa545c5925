import type { Metadata } from 'next';
import BridgeActions from '@/components/bridges/BridgeActions';
import BridgePlan from '@/components/bridges/BridgePlan';
import BridgeRecordForm from '@/components/bridges/BridgeRecordForm';
import BridgeRecordList from '@/components/bridges/BridgeRecordList';
import BridgeStatusText from '@/components/bridges/BridgeStatusText';
import DeleteBridgeButton from '@/components/bridges/DeleteBridgeButton';
import GeometrySummary from '@/components/bridges/GeometrySummary';
import RevisionHistory from '@/components/history/RevisionHistory';
import { requireUser } from '@/lib/auth/server-session';
import { dateTimeText } from '@/lib/units/date-text';
import { roleAllows } from '@/lib/auth/roles';
import { bridgeRow } from '@/lib/services/bridge-list';
import { loadBridge, orNotFound } from './load-bridge';
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

/**
 * A bridge's overview: its record, its status in words, a plan sketch of the current revision, and
 * its pages grouped by purpose (setting out, checking, geometry, 3D view).
 */
export default async function BridgePage({ params }: { params: Params }) {
  const { id } = await params;
  const user = await requireUser(`/bridges/${id}`);
  const [{ bridge, revisions }, row] = await Promise.all([loadBridge(id), orNotFound(bridgeRow(id))]);
  const unitName = bridge.units === 'm' ? 'metres (m)' : 'feet (ft)';
  const place = [bridge.structureNumber, bridge.route, bridge.featureCrossed ? `over ${bridge.featureCrossed}` : null].filter(Boolean).join(' · ');

  return (
    <>
      <BridgeBreadcrumb bridge={bridge} />
      <div className="mb-6 flex flex-wrap items-start justify-between gap-4">
        <div className="min-w-0">
          <h1 className="text-2xl font-bold text-concrete-900">{bridge.name}</h1>
          {place ? <p className="mt-0.5 font-semibold text-concrete-700">{place}</p> : null}
          <p className="mt-1 text-sm text-concrete-600">
            Units: {unitName} · Current revision <span className="tabular font-semibold text-concrete-800">{bridge.revision}</span> · Updated {dateTimeText(bridge.updatedAt)}
          </p>
        </div>
        {user.role === 'admin' ? <DeleteBridgeButton bridgeId={bridge.id} name={bridge.name} /> : null}
      </div>

      <BridgeStatusText row={row} />
      <div className="mt-6">
        <BridgeActions id={bridge.id} role={user.role} />
      </div>

      <div className="mt-6 grid gap-6 lg:grid-cols-[minmax(0,3fr)_minmax(0,2fr)]">
        <div className="min-w-0 space-y-6">
          <section aria-labelledby="plan-title" className="card p-4">
            <h2 id="plan-title" className="mb-2 text-lg font-bold text-concrete-900">
              Plan of revision {bridge.revision}
            </h2>
            <BridgePlan id={bridge.id} description={bridge.description} />
          </section>
        </div>
        <div className="min-w-0 space-y-6">
          <section aria-labelledby="record-title" className="card space-y-3 p-4">
            <h2 id="record-title" className="text-lg font-bold text-concrete-900">
              Record
            </h2>
            <BridgeRecordList record={bridge} />
            {roleAllows(user.role, ['engineer']) ? <BridgeRecordForm bridgeId={bridge.id} name={bridge.name} record={bridge} /> : null}
          </section>
        </div>
      </div>

      <h2 className="mb-3 mt-8 text-lg font-bold text-concrete-900">Geometry of revision {bridge.revision}</h2>
      {/* Grid items of the summary may shrink below their tables' width (the tables scroll), so a phone never scrolls sideways. */}
      <div className="[&>.grid>*]:min-w-0">
        <GeometrySummary description={bridge.description} />
      </div>

      <div className="mt-8">
        <RevisionHistory revisions={revisions} current={bridge.revision} />
      </div>
    </>
  );
}
