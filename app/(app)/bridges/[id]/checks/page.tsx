import type { Metadata } from 'next';
import Link from 'next/link';
import CheckAuditList from '@/components/checks/CheckAuditList';
import CheckHistoryTable from '@/components/checks/CheckHistoryTable';
import FieldTolerancesForm from '@/components/checks/TolerancesForm';
import GeometryProblem from '@/components/editor/GeometryProblem';
import PhotoGallery from '@/components/checks/PhotoGallery';
import PhotoUploadForm from '@/components/checks/PhotoUploadForm';
import SignOffPanel from '@/components/checks/SignOffPanel';
import { requireUser } from '@/lib/auth/server-session';
import { UnprocessableError } from '@/lib/errors';
import { roleAllows } from '@/lib/auth/roles';
import { listAttachments } from '@/lib/services/attachments';
import { listChecks } from '@/lib/services/checks';
import { bridgeAudit } from '@/lib/services/field-audit';
import { signOffOverview } from '@/lib/services/signoff';
import { requireBridge } from '@/lib/services/require-bridge';
import { fieldSettingsOf } from '@/lib/services/tolerances';
import BridgeBreadcrumb from '@/components/BridgeBreadcrumb';
import { orNotFound } from '../load-bridge';

export const metadata: Metadata = { title: 'Checks and sign-off' };

type Params = Promise<{ id: string }>;

function load(id: string) {
  return orNotFound(requireBridge(id));
}

export default async function ChecksPage({ params }: { params: Params }) {
  const { id } = await params;
  const user = await requireUser(`/bridges/${id}/checks`);
  const bridge = await load(id);
  const settings = fieldSettingsOf(bridge);
  const units = settings.units;
  const [checks, attachments, events, overview] = await Promise.all([
    listChecks(bridge.id),
    listAttachments(String(bridge.id)),
    bridgeAudit(String(bridge.id), 300, user.role),
    signOffOverview(String(bridge.id)).catch((err) => {
      if (err instanceof UnprocessableError) return { problem: err.message };
      throw err;
    }),
  ]);
  const canInspect = roleAllows(user.role, ['inspector']);
  const passed = checks.filter((c) => !c.superseded_by && c.pass).length;
  const failed = checks.filter((c) => !c.superseded_by && !c.pass).length;

  return (
    <>
      <BridgeBreadcrumb bridge={bridge} here="Checks" />
      <div className="mb-6 flex flex-wrap items-end justify-between gap-4">
        <div>
          <h1 className="text-2xl font-bold text-concrete-900">Checks and sign-off: {bridge.name}</h1>
          <p className="mt-1 text-concrete-600">
            Revision <span className="tabular font-semibold text-concrete-800">{bridge.currentRevision}</span> · {checks.length} checks recorded ·{' '}
            <span className="text-pass-700">{passed} passing</span> and <span className="text-fail-600">{failed} out of tolerance</span> as the latest at their bracket
          </p>
        </div>
        <div className="flex flex-wrap gap-2">
          <Link href={`/bridges/${bridge.id}/field`} className="btn-primary">
            Field mode
          </Link>
          <Link href={`/bridges/${bridge.id}/sheet`} className="btn-secondary">
            Field sheet
          </Link>
        </div>
      </div>

      <section aria-labelledby="signoff-title" className="mb-8">
        <h2 id="signoff-title" className="mb-3 text-lg font-bold text-concrete-900">
          Sign-off by span
        </h2>
        {'problem' in overview ? (
          <GeometryProblem message={overview.problem} title="Sign-off needs geometry that can be computed" />
        ) : (
          <SignOffPanel bridgeId={bridge.id} units={units} spans={overview.spans} canSign={canInspect} />
        )}
        <p className="mt-2 max-w-3xl text-sm text-concrete-600">
          A span can be signed off when every girder point of both exterior girders has a passing latest edge-width check, and a passing level-bar check where the top of girder was surveyed, all
          against the current revision.
        </p>
      </section>

      <section aria-labelledby="tolerance-title" className="mb-8">
        <h2 id="tolerance-title" className="mb-3 text-lg font-bold text-concrete-900">
          Tolerances
        </h2>
        <FieldTolerancesForm bridgeId={bridge.id} settings={settings} canEdit={roleAllows(user.role, ['engineer'])} />
      </section>

      <section aria-labelledby="history-title" className="mb-8">
        <h2 id="history-title" className="mb-3 text-lg font-bold text-concrete-900">
          Check history
        </h2>
        <CheckHistoryTable checks={checks} units={units} currentRevision={bridge.currentRevision} />
      </section>

      <section aria-labelledby="photos-title" className="mb-8">
        <h2 id="photos-title" className="mb-3 text-lg font-bold text-concrete-900">
          Photos and files
        </h2>
        {canInspect ? (
          <div className="mb-4">
            <PhotoUploadForm
              bridgeId={bridge.id}
              checks={checks.slice(0, 200).map((c) => ({ id: c.id, label: `#${c.id} · span ${c.span} ${c.girder} pt ${c.point} · ${c.pass ? 'pass' : 'fail'}` }))}
            />
          </div>
        ) : null}
        <PhotoGallery items={attachments} />
      </section>

      <section aria-labelledby="audit-title" className="mb-8">
        <h2 id="audit-title" className="mb-3 text-lg font-bold text-concrete-900">
          Audit log
        </h2>
        <CheckAuditList events={events} />
      </section>
    </>
  );
}
