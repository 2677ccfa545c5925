import StageBadge from '@/components/bridges/StageBadge';
import type { BridgeRecord } from '@/lib/services/bridge-record';

/** The bridge record as a short definition list; fields not filed say so. */
export default function BridgeRecordList({ record }: { record: BridgeRecord }) {
  const items: [string, string | null][] = [
    ['Structure number', record.structureNumber],
    ['Route or road', record.route],
    ['Feature crossed', record.featureCrossed],
    ['County or district', record.district],
    ['Contractor', record.contractor],
  ];
  return (
    <dl className="grid grid-cols-1 gap-x-6 gap-y-2 text-sm sm:grid-cols-2" data-testid="bridge-record">
      <div>
        <dt className="text-concrete-600">Stage</dt>
        <dd className="mt-0.5">
          <StageBadge stage={record.stage} />
        </dd>
      </div>
      {items.map(([label, value]) => (
        <div key={label}>
          <dt className="text-concrete-600">{label}</dt>
          <dd className={value ? 'font-semibold text-concrete-900' : 'text-concrete-500'}>{value ?? 'Not filed'}</dd>
        </div>
      ))}
    </dl>
  );
}
