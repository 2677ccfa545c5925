import type { Metadata } from 'next';
import Link from 'next/link';
import FieldMode from '@/components/field/FieldMode';
import GeometryProblem from '@/components/editor/GeometryProblem';
import { requireUser } from '@/lib/auth/server-session';
import { roleAllows } from '@/lib/auth/roles';
import { loadFieldView } from '@/lib/services/field-view';
import { orNotFound } from '../load-bridge';

export const metadata: Metadata = { title: 'Field mode' };

type Params = Promise<{ id: string }>;

export default async function FieldPage({ params }: { params: Params }) {
  const { id } = await params;
  const user = await requireUser(`/bridges/${id}/field`);
  const view = await orNotFound(loadFieldView(id));
  if (!view.ok || view.groups.length === 0) {
    return (
      <div className="max-w-xl">
        <h1 className="mb-3 text-2xl font-bold text-concrete-900">Field mode: {view.bridge.name}</h1>
        {view.ok ? (
          <p className="card p-4 text-concrete-700">This bridge has no exterior girder points to check. Add girders to the geometry first.</p>
        ) : (
          <GeometryProblem message={view.problem} title="The targets cannot be computed for this revision" />
        )}
        <Link href={`/bridges/${view.bridge.id}`} className="btn-secondary mt-4">
          Back to the bridge
        </Link>
      </div>
    );
  }
  return (
    <FieldMode
      bridge={view.bridge}
      units={view.settings.units}
      groups={view.groups}
      tolerances={{ width: view.settings.width_tolerance, reading: view.settings.reading_tolerance, base_rod_length: view.settings.base_rod_length }}
      canRecord={roleAllows(user.role, ['inspector'])}
      user={{ id: user.id, email: user.email }}
      renderedAt={new Date().toISOString()}
    />
  );
}
