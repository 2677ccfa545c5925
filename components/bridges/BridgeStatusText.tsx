import Link from 'next/link';
import { STAGE_LABELS } from '@/lib/services/bridge-record';
import type { BridgeRow } from '@/lib/services/bridge-list';
import { dateTimeText } from '@/lib/units/date-text';

const plural = (n: number, one: string, many: string) => `${n} ${n === 1 ? one : many}`;

/** Sentences that say where a bridge stands, from its stage and status counters. */
export function statusSentences(row: BridgeRow): string[] {
  const out: string[] = [];
  const stage = STAGE_LABELS[row.stage];
  if (row.bracketsTotal === 0) out.push(`${stage}. The geometry of revision ${row.revision} gives no brackets to check yet.`);
  else if (row.bracketsPassing === 0 && !row.lastFieldAt) out.push(`${stage}. No field checks yet: all ${row.bracketsTotal} brackets are waiting to be checked.`);
  else if (row.bracketsPassing === row.bracketsTotal) out.push(`${stage}. Every one of the ${row.bracketsTotal} brackets passes its latest checks.`);
  else out.push(`${stage}. ${row.bracketsPassing} of ${row.bracketsTotal} brackets pass their latest checks; ${row.bracketsTotal - row.bracketsPassing} still need a check or a recheck.`);
  if (row.openFailures > 0) out.push(`${plural(row.openFailures, 'bracket is', 'brackets are')} out of tolerance and must be reset and checked again.`);
  if (row.spansTotal > 0) {
    const signed = row.spansSignedOff === row.spansTotal ? `All ${row.spansTotal} spans are signed off` : `${row.spansSignedOff} of ${row.spansTotal} spans signed off`;
    const ready = row.spansAwaitingSignoff > 0 ? `; ${plural(row.spansAwaitingSignoff, 'span is', 'spans are')} ready for sign-off` : '';
    out.push(`${signed}${ready}.`);
  }
  out.push(row.lastFieldAt ? `Last field activity ${dateTimeText(row.lastFieldAt)}.` : 'No field activity recorded yet.');
  return out;
}

/** The bridge's status in words, with the way to the checks when something needs attention. */
export default function BridgeStatusText({ row }: { row: BridgeRow }) {
  const attention = row.openFailures > 0 || row.spansAwaitingSignoff > 0;
  return (
    <section aria-labelledby="bridge-status-title" className={`card p-4 ${row.openFailures > 0 ? 'border-fail-600' : ''}`} data-testid="bridge-status">
      <h2 id="bridge-status-title" className="text-lg font-bold text-concrete-900">
        Status
      </h2>
      <div className="mt-1 space-y-1 text-concrete-800">
        {statusSentences(row).map((s) => (
          <p key={s}>{s}</p>
        ))}
      </div>
      {attention ? (
        <Link href={`/bridges/${row.id}/checks`} className="mt-3 inline-block font-semibold text-brand-700 underline-offset-2 hover:underline">
          {row.openFailures > 0 ? 'See the out-of-tolerance checks' : 'Go to sign-off'}
        </Link>
      ) : null}
    </section>
  );
}
