import type { Metadata } from 'next';
import Link from 'next/link';
import EditorForm from '@/components/editor/EditorForm';
import RoleNotice from '@/components/RoleNotice';
import { requireUser } from '@/lib/auth/server-session';
import { roleAllows } from '@/lib/auth/roles';
import { loadBridge } from '../load-bridge';
import BridgeBreadcrumb from '@/components/BridgeBreadcrumb';

type Params = Promise<{ id: string }>;

export async function generateMetadata({ params }: { params: Params }): Promise<Metadata> {
  const { id } = await params;
  // The session first: a signed-out request gets the sign-in redirect, never the bridge's name.
  await requireUser(`/bridges/${id}/edit`);
  try {
    const { bridge } = await loadBridge(id);
    return { title: `Edit geometry · ${bridge.name}` };
  } catch {
    return { title: 'Edit geometry' };
  }
}

export default async function EditGeometryPage({ params }: { params: Params }) {
  const { id } = await params;
  const user = await requireUser(`/bridges/${id}/edit`);
  if (!roleAllows(user.role, ['engineer'])) {
    return <RoleNotice title="Editing needs an engineer" message="Only engineers and administrators change a bridge's geometry. You can still read the bridge, its offset table and its history." />;
  }
  const { bridge } = await loadBridge(id);
  return (
    <>
      <BridgeBreadcrumb bridge={bridge} here="Edit geometry" />
      <div className="mb-4 flex flex-wrap items-end justify-between gap-3">
        <div>
          <h1 className="text-2xl font-bold text-concrete-900">Edit geometry</h1>
          <p className="mt-1 text-concrete-600">
            {bridge.name} · opened at revision <span className="tabular font-semibold text-concrete-800">{bridge.revision}</span> · lengths in {bridge.units === 'm' ? 'metres (m)' : 'feet (ft)'} ·
            stations as {bridge.units === 'm' ? '1+234.567' : '12+34.56'} or plain numbers
          </p>
        </div>
        <Link href={`/bridges/${bridge.id}/history`} className="btn-secondary">
          History
        </Link>
      </div>
      <EditorForm key={bridge.revision} bridgeId={bridge.id} revision={bridge.revision} description={bridge.description} />
    </>
  );
}
