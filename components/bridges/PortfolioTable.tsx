import Link from 'next/link';
import PortfolioProgress from '@/components/bridges/PortfolioProgress';
import StageBadge from '@/components/bridges/StageBadge';
import type { BridgeRow } from '@/lib/services/bridge-list';
import { dateTimeText } from '@/lib/units/date-text';

function Failures({ count }: { count: number }) {
  if (count === 0) return <span className="text-concrete-600">None</span>;
  return (
    <span className="inline-flex items-center gap-1 rounded-full border border-fail-600 bg-fail-100 px-2 py-0.5 text-xs font-semibold text-fail-600">
      <span className="tabular">{count}</span> out of tolerance
    </span>
  );
}

function Spans({ row }: { row: BridgeRow }) {
  return (
    <span>
      <span className="tabular font-semibold">{row.spansSignedOff}</span> of <span className="tabular">{row.spansTotal}</span> signed off
      {row.spansAwaitingSignoff > 0 ? (
        <span className="mt-0.5 block text-xs font-semibold text-caution-700">
          {row.spansAwaitingSignoff} {row.spansAwaitingSignoff === 1 ? 'span' : 'spans'} ready to sign off
        </span>
      ) : null}
    </span>
  );
}

function Identity({ row }: { row: BridgeRow }) {
  const place = [row.route, row.featureCrossed ? `over ${row.featureCrossed}` : null].filter(Boolean).join(' ');
  return (
    <div className="min-w-0">
      <Link href={`/bridges/${row.id}`} className="font-semibold text-brand-700 underline-offset-2 hover:underline">
        {row.name}
      </Link>
      <p className="text-xs text-concrete-600">
        {row.structureNumber ? <span className="tabular mr-2 font-semibold text-concrete-800">{row.structureNumber}</span> : null}
        {place}
        {row.district ? <span className="block">{row.district}</span> : null}
      </p>
    </div>
  );
}

const lastField = (row: BridgeRow) => (row.lastFieldAt ? dateTimeText(row.lastFieldAt) : 'No field work yet');

/**
 * One page of the portfolio: each bridge with its record, stage, check progress, spans signed off,
 * open failures and last field activity. A table on wide screens, a card per bridge on a phone.
 */
export default function PortfolioTable({ rows }: { rows: BridgeRow[] }) {
  return (
    <>
      <div className="card hidden overflow-x-auto md:block">
        <table className="w-full text-left text-sm" data-testid="portfolio-table">
          <caption className="sr-only">Bridges with their check progress</caption>
          <thead className="border-b border-concrete-200 bg-concrete-100 text-concrete-700">
            <tr>
              <th scope="col" className="px-4 py-3 font-semibold">
                Bridge
              </th>
              <th scope="col" className="px-4 py-3 font-semibold">
                Stage
              </th>
              <th scope="col" className="px-4 py-3 font-semibold">
                Check progress
              </th>
              <th scope="col" className="px-4 py-3 font-semibold">
                Spans
              </th>
              <th scope="col" className="px-4 py-3 font-semibold">
                Open failures
              </th>
              <th scope="col" className="px-4 py-3 font-semibold">
                Last field activity
              </th>
            </tr>
          </thead>
          <tbody>
            {rows.map((row) => (
              <tr key={row.id} className="border-b border-concrete-100 align-top last:border-0 hover:bg-brand-50" data-bridge-id={row.id}>
                <td className="max-w-72 px-4 py-3">
                  <Identity row={row} />
                </td>
                <td className="px-4 py-3">
                  <StageBadge stage={row.stage} />
                </td>
                <td className="px-4 py-3">
                  <PortfolioProgress passing={row.bracketsPassing} total={row.bracketsTotal} />
                </td>
                <td className="px-4 py-3">
                  <Spans row={row} />
                </td>
                <td className="px-4 py-3">
                  <Failures count={row.openFailures} />
                </td>
                <td className="px-4 py-3 text-concrete-700">{lastField(row)}</td>
              </tr>
            ))}
          </tbody>
        </table>
      </div>
      <ul className="space-y-3 md:hidden" aria-label="Bridges with their check progress">
        {rows.map((row) => (
          <li key={row.id} className="card p-4" data-bridge-id={row.id}>
            <div className="flex items-start justify-between gap-3">
              <Identity row={row} />
              <StageBadge stage={row.stage} />
            </div>
            <div className="mt-3">
              <PortfolioProgress passing={row.bracketsPassing} total={row.bracketsTotal} />
            </div>
            <dl className="mt-3 grid grid-cols-2 gap-x-3 gap-y-2 text-sm">
              <div>
                <dt className="text-xs text-concrete-600">Spans</dt>
                <dd>
                  <Spans row={row} />
                </dd>
              </div>
              <div>
                <dt className="text-xs text-concrete-600">Open failures</dt>
                <dd>
                  <Failures count={row.openFailures} />
                </dd>
              </div>
              <div className="col-span-2">
                <dt className="text-xs text-concrete-600">Last field activity</dt>
                <dd className="text-concrete-700">{lastField(row)}</dd>
              </div>
            </dl>
          </li>
        ))}
      </ul>
    </>
  );
}
