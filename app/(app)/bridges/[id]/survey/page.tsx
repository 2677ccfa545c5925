import type { Metadata } from 'next';
import Link from 'next/link';
import SurveyImportForm from '@/components/survey/SurveyImportForm';
import SurveyImportLog from '@/components/survey/SurveyImportLog';
import SurveyValuesTable from '@/components/survey/SurveyValuesTable';
import { requireUser } from '@/lib/auth/server-session';
import { roleAllows } from '@/lib/auth/roles';
import { getBridge } from '@/lib/services/bridges';
import { framingOf, listSurvey } from '@/lib/services/survey';
import BridgeBreadcrumb from '@/components/BridgeBreadcrumb';
import { orNotFound } from '../load-bridge';
import type { Units } from '@/lib/units';

type Params = Promise<{ id: string }>;

export const metadata: Metadata = { title: 'Top-of-girder survey' };

async function load(id: string) {
  const [bridge, listing] = await orNotFound(Promise.all([getBridge(id), listSurvey(id)]));
  return { bridge, listing };
}

export default async function SurveyPage({ params }: { params: Params }) {
  const { id } = await params;
  const user = await requireUser(`/bridges/${id}/survey`);
  const { bridge, listing } = await load(id);
  const framing = framingOf(bridge.description);
  const canImport = roleAllows(user.role, ['engineer', 'inspector']);
  // A template with every girder point of the current revision and the elevation left to fill in.
  const template = ['girder,span,point,elevation'];
  for (let span = 1; span <= framing.spanCount; span++) for (const g of framing.girders) for (let k = 0; k <= framing.pointsPerSpan; k++) template.push(`${g},${span},${k},`);
  const templateHref = `data:text/csv;charset=utf-8,${encodeURIComponent(template.join('\n') + '\n')}`;

  return (
    <>
      <BridgeBreadcrumb bridge={bridge} here="Top-of-girder survey" />
      <div className="mb-4 flex flex-wrap items-end justify-between gap-4">
        <div>
          <h1 className="text-2xl font-bold text-concrete-900">Top-of-girder survey: {bridge.name}</h1>
          <p className="mt-1 max-w-3xl text-concrete-600">
            Revision <span className="tabular font-semibold text-concrete-800">{bridge.revision}</span> · {framing.girders.length} girders, {framing.spanCount}{' '}
            {framing.spanCount === 1 ? 'span' : 'spans'}, points 0 to {framing.pointsPerSpan} · elevations in {bridge.units}
          </p>
        </div>
        <div className="flex flex-wrap gap-2">
          <Link href={`/bridges/${bridge.id}/offsets`} className="btn-secondary min-h-11">
            Offset table
          </Link>
          <a href={templateHref} download={`${bridge.name.replace(/[^A-Za-z0-9._-]+/g, '-')}-survey-template.csv`} className="btn-secondary min-h-11">
            Download a template
          </a>
        </div>
      </div>
      <p className="mb-6 max-w-3xl text-sm text-concrete-700">
        The buildup over each girder point is the bottom of slab minus the surveyed top of girder, and the level-bar reading (drop from girder top) is measured from that same girder top. Survey the
        girders after erection and set every deck grade from the buildup, not from another form.
      </p>
      <div className="space-y-6">
        {canImport ? (
          <SurveyImportForm bridgeId={bridge.id} units={bridge.units as Units} />
        ) : (
          <p className="card p-4 text-sm text-concrete-700">Your role ({user.role}) can read the stored survey. Engineers and inspectors import survey files.</p>
        )}
        <SurveyValuesTable listing={listing} />
        <SurveyImportLog imports={listing.imports} />
      </div>
    </>
  );
}
