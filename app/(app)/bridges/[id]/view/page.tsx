import type { Metadata } from 'next';
import Link from 'next/link';
import BridgeBreadcrumb from '@/components/BridgeBreadcrumb';
import PageHeader from '@/components/PageHeader';
import SafetyCaution from '@/components/SafetyCaution';
import { requireUser } from '@/lib/auth/server-session';
import { sceneDataForBridge } from '@/lib/scene-data/bridge';
import LazyBridgeViewer from '@/scene/LazyBridgeViewer';
import EdgeWidthSummary from '@/scene/EdgeWidthSummary';
import { orNotFound } from '../load-bridge';

export const metadata: Metadata = { title: '3D view' };

export default async function BridgeViewPage({ params, searchParams }: { params: Promise<{ id: string }>; searchParams: Promise<{ stats?: string; shadows?: string }> }) {
  const { id } = await params;
  await requireUser(`/bridges/${id}/view`);
  const { stats, shadows } = await searchParams;
  const data = await orNotFound(sceneDataForBridge(id));
  const offsetsHref = `/bridges/${data.id}/offsets`;
  return (
    <>
      <BridgeBreadcrumb bridge={{ id: data.id, name: data.name }} here="3D view" />
      <PageHeader
        title={`${data.name}: 3D view`}
        subtitle={`Revision ${data.revision} · drag to turn, scroll or pinch to zoom, right-drag or two-finger drag to pan · lengths in ${data.table.units === 'm' ? 'metres' : 'feet'}`}
        actions={
          <>
            <Link href={`/bridges/${data.id}`} className="btn-secondary">
              Bridge details
            </Link>
            <Link href={offsetsHref} className="btn-secondary">
              Offset table
            </Link>
          </>
        }
      />
      <div className="space-y-6">
        <LazyBridgeViewer description={data.description} table={data.table} name={data.name} revision={data.revision} showStats={stats === '1'} noShadows={shadows === '0'} offsetsHref={offsetsHref} />
        <EdgeWidthSummary table={data.table} />
        <SafetyCaution />
      </div>
    </>
  );
}
