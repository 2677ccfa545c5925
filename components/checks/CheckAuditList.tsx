import { dateTimeText } from '@/lib/units';

type AuditRow = { id: number; action: string; label: string; by: string | null; detail: Record<string, unknown>; created_at: string };

function describe(e: AuditRow): string {
  const d = e.detail;
  switch (e.action) {
    case 'check.create':
      return `#${d.check}: span ${d.span}, ${d.girder} point ${d.point}, revision ${d.revision}, ${d.pass ? 'pass' : 'fail'}${d.supersedes ? `, corrects #${d.supersedes}` : ''}`;
    case 'attachment.create':
      return `${d.name ?? 'file'}${d.check ? ` for check #${d.check}` : ''}`;
    case 'sheet.send':
      return `${d.span ? `span ${d.span}` : 'all spans'} to ${Array.isArray(d.to) ? d.to.join(', ') : ''} (${d.via === 'smtp' ? 'mail server' : 'local outbox'})`;
    case 'signoff.create':
      return `span ${d.span} at revision ${d.revision}`;
    case 'revision.create':
      return `revision ${d.revision}`;
    case 'bridge.rename':
      return `${d.from} → ${d.to}`;
    case 'bridge.create':
      return String(d.name ?? '');
    case 'tolerances.update':
      return 'tolerances or base rod length';
    default:
      return '';
  }
}

/** The bridge's audit log: every check, photo, e-mail, sign-off and geometry change, newest first. */
export default function CheckAuditList({ events }: { events: AuditRow[] }) {
  if (events.length === 0) return <p className="text-concrete-600">Nothing recorded yet.</p>;
  return (
    <ol className="card divide-y divide-concrete-200 text-sm">
      {events.map((e) => (
        <li key={e.id} className="flex flex-wrap items-baseline gap-x-3 px-4 py-2">
          <span className="tabular w-44 shrink-0 text-concrete-600">{dateTimeText(e.created_at)}</span>
          <span className="font-semibold text-concrete-900">{e.label}</span>
          <span className="text-concrete-700">{describe(e)}</span>
          <span className="ml-auto text-concrete-600">{e.by ?? 'system'}</span>
        </li>
      ))}
    </ol>
  );
}
