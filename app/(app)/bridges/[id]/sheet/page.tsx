import type { Metadata } from 'next';
import Link from 'next/link';
import GeometryProblem from '@/components/editor/GeometryProblem';
import SafetyCaution from '@/components/SafetyCaution';
import SheetPrintButton from '@/components/sheet/SheetPrintButton';
import SheetPdfDownload from '@/components/sheet/SheetPdfDownload';
import SheetSendForm from '@/components/sheet/SheetSendForm';
import SheetTable from '@/components/sheet/SheetTable';
import { dateTimeText, lengthText } from '@/lib/units';
import { requireUser } from '@/lib/auth/server-session';
import { roleAllows } from '@/lib/auth/roles';
import { loadFieldView } from '@/lib/services/field-view';
import { orNotFound } from '../load-bridge';
import { DEFLECTION_DEFINITION, ROD_DEFINITION } from '@/lib/services/field-sheet';
import BridgeBreadcrumb from '@/components/BridgeBreadcrumb';
import { bracketsHaveDeflections } from '@/components/field/has-deflections';

export const metadata: Metadata = { title: 'Field sheet' };

type Params = Promise<{ id: string }>;
type Search = Promise<{ span?: string }>;

export default async function SheetPage({ params, searchParams }: { params: Params; searchParams: Search }) {
  const { id } = await params;
  const user = await requireUser(`/bridges/${id}/sheet`);
  const { span: spanText } = await searchParams;
  const view = await orNotFound(loadFieldView(id));
  const crumbs = <BridgeBreadcrumb bridge={view.bridge} here="Field sheet" />;
  if (!view.ok) {
    return (
      <>
        {crumbs}
        <h1 className="mb-3 text-2xl font-bold text-concrete-900">Field sheet: {view.bridge.name}</h1>
        <GeometryProblem message={view.problem} title="The sheet cannot be computed for this revision" />
      </>
    );
  }
  const spans = [...new Set(view.groups.map((g) => g.span))];
  const wanted = Number(spanText);
  const span = Number.isInteger(wanted) && spans.includes(wanted) ? wanted : null;
  const groups = span === null ? view.groups : view.groups.filter((g) => g.span === span);
  const units = view.settings.units;
  const csvHref = `/api/bridges/${view.bridge.id}/field-sheet.csv${span ? `?span=${span}` : ''}`;
  const printedAt = dateTimeText(new Date().toISOString());
  // Judged over the whole bridge, so every table has the same columns.
  const deflections = bracketsHaveDeflections(view.groups);

  return (
    <>
      {crumbs}
      <header className="mb-4 flex flex-wrap items-end justify-between gap-4">
        <div>
          <h1 className="text-2xl font-bold text-concrete-900 print:text-xl">Field sheet: {view.bridge.name}</h1>
          <p className="mt-1 text-concrete-700">
            {span ? `Span ${span}` : `All spans (${spans.join(', ')})`} · computed from geometry revision <span className="tabular font-semibold">{view.bridge.revision}</span> · printed {printedAt}
          </p>
          <p className="text-sm text-concrete-600">
            Lengths and elevations in {units === 'm' ? 'metres' : 'feet'}; base rod {lengthText(view.settings.base_rod_length, units)}
            {view.settings.is_default.base_rod_length ? ' (default)' : ''}.
          </p>
        </div>
        <div className="no-print flex flex-wrap gap-2">
          <SheetPrintButton />
          <a href={csvHref} className="btn-secondary" download>
            Download CSV
          </a>
          <SheetPdfDownload bridgeId={view.bridge.id} units={units} span={span} />
          <Link href={`/bridges/${view.bridge.id}/field`} className="btn-secondary">
            Field mode
          </Link>
          {roleAllows(user.role, ['inspector']) ? (
            <a href="#send-sheet" className="btn-secondary">
              Send by e-mail
            </a>
          ) : null}
        </div>
      </header>

      <nav aria-label="Spans" className="no-print mb-4 flex flex-wrap gap-2 text-sm">
        <Link href={`/bridges/${view.bridge.id}/sheet`} aria-current={span === null ? 'page' : undefined} className={span === null ? 'btn-primary' : 'btn-secondary'}>
          All spans
        </Link>
        {spans.map((s) => (
          <Link key={s} href={`/bridges/${view.bridge.id}/sheet?span=${s}`} aria-current={span === s ? 'page' : undefined} className={span === s ? 'btn-primary' : 'btn-secondary'}>
            Span {s}
          </Link>
        ))}
      </nav>

      <SafetyCaution className="mb-4 break-inside-avoid" />
      <div className="mb-6 max-w-4xl break-inside-avoid text-sm text-concrete-700">
        <p>
          <strong>Edge width</strong>: girder centreline to deck edge, horizontal and square to the girder; measure it from a string line between the girder&apos;s end centres, not from the girder.{' '}
          <strong>Form target</strong>: elevation of the form&apos;s bottom outside edge, settlement allowance included.
        </p>
        <p className="mt-1">
          <strong>Level-bar reading</strong>: top of girder minus form target, shown only where the top of girder was surveyed. {ROD_DEFINITION}
        </p>
        {deflections ? (
          <p className="mt-1" data-testid="sheet-deflection-note">
            {DEFLECTION_DEFINITION}
          </p>
        ) : null}
      </div>

      {groups.map((g) => (
        <SheetTable key={`${g.span}-${g.girder}`} group={g} units={units} deflections={deflections} />
      ))}

      <p className="mb-6 hidden text-xs text-concrete-600 print:block">
        {view.bridge.name} · revision {view.bridge.revision} · Chordline field sheet · geometry only: check every number against the plans before use.
      </p>

      {roleAllows(user.role, ['inspector']) ? <SheetSendForm bridgeId={view.bridge.id} span={span} /> : null}
    </>
  );
}
