import Link from 'next/link';
import { roleAllows, type Role } from '@/lib/auth/roles';

type Action = { href: string; label: string; hint: string; download?: boolean; primary?: boolean };
type Group = { title: string; actions: Action[] };

/** The bridge's pages grouped by what they are for; a role only sees what it may do. */
export function actionGroups(id: number, role: Role): Group[] {
  const b = `/bridges/${id}`;
  const engineer = roleAllows(role, ['engineer']);
  const surveyor = roleAllows(role, ['engineer', 'inspector']);
  return [
    {
      title: 'Setting out',
      actions: [
        { href: `${b}/offsets`, label: 'Offset table', hint: 'Edge widths, drops and chord offsets at every girder point', primary: true },
        { href: `${b}/sheet`, label: 'Field sheet', hint: 'Printable targets for the crew, by span' },
        { href: `${b}/field`, label: 'Field mode', hint: 'Phone screen for reading and recording at the bracket' },
        { href: `/api/bridges/${id}/offsets.pdf`, label: 'Offset table as PDF', hint: 'To print or file', download: true },
        { href: `/api/bridges/${id}/field-sheet.pdf`, label: 'Field sheet as PDF', hint: 'Every span, with the sign-off lines', download: true },
        { href: `/api/bridges/${id}/offsets.csv`, label: 'Offsets as CSV', hint: 'One row per girder point', download: true },
      ],
    },
    {
      title: 'Checking',
      actions: [{ href: `${b}/checks`, label: 'Checks and sign-off', hint: 'Measurements, photos, tolerances and span sign-off' }],
    },
    {
      title: 'Geometry',
      actions: [
        ...(engineer ? [{ href: `${b}/edit`, label: 'Edit geometry', hint: 'The form editor; saves a new revision' }] : []),
        { href: `${b}/history`, label: 'History', hint: 'Revisions and what changed between them' },
        ...(surveyor ? [{ href: `${b}/survey`, label: 'Survey import', hint: 'Top-of-girder elevations from a CSV' }] : []),
        { href: `/api/bridges/${id}/plan.dxf`, label: 'Plan as DXF', hint: 'Alignment, deck edges, girders and bents for CAD', download: true },
        { href: `/api/bridges/${id}/alignment.xml`, label: 'Alignment as LandXML', hint: 'Alignment and profile of this revision', download: true },
      ],
    },
    {
      title: '3D view',
      actions: [{ href: `${b}/view`, label: '3D view', hint: 'Deck, girders and brackets to turn and inspect' }],
    },
  ];
}

/** The actions grouped by purpose (setting out, checking, geometry, 3D) instead of one row of buttons. */
export default function BridgeActions({ id, role }: { id: number; role: Role }) {
  return (
    <nav aria-label="Work on this bridge" className="grid items-start gap-3 sm:grid-cols-2 xl:grid-cols-4" data-testid="bridge-actions">
      {actionGroups(id, role).map((g) => (
        <section key={g.title} aria-labelledby={`actions-${g.title}`} className="card p-4">
          <h2 id={`actions-${g.title}`} className="text-sm font-bold uppercase tracking-wide text-concrete-600">
            {g.title}
          </h2>
          <ul className="mt-2 space-y-2">
            {g.actions.map((a) => (
              <li key={a.href}>
                {a.download ? (
                  <a href={a.href} download className="font-semibold text-brand-700 underline-offset-2 hover:underline">
                    {a.label}
                  </a>
                ) : (
                  <Link href={a.href} className={a.primary ? 'btn-primary' : 'font-semibold text-brand-700 underline-offset-2 hover:underline'}>
                    {a.label}
                  </Link>
                )}
                <p className="text-xs text-concrete-600">{a.hint}</p>
              </li>
            ))}
          </ul>
        </section>
      ))}
    </nav>
  );
}
