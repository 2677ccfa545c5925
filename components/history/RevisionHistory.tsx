import SummaryTable from '@/components/offsets/SummaryTable';
import { dateTimeText } from '@/lib/units';

type Revision = { revision: number; author: string | null; note: string; createdAt: string };

/** The bridge's geometry revisions, newest first. */
export default function RevisionHistory({ revisions, current }: { revisions: Revision[]; current: number }) {
  return (
    <SummaryTable
      title="Revision history"
      headers={['Revision', 'Author', 'Note', 'Saved']}
      numericFrom={9}
      rows={revisions.map((r) => [
        <span key="rev" className="tabular font-semibold">
          {r.revision}
          {r.revision === current ? <span className="ml-2 rounded bg-brand-50 px-1.5 py-0.5 text-xs font-semibold text-brand-700">current</span> : null}
        </span>,
        r.author ?? 'Removed user',
        <span key="note" className="whitespace-normal">
          {r.note || '—'}
        </span>,
        dateTimeText(r.createdAt),
      ])}
      empty="No revisions are stored for this bridge."
    />
  );
}
