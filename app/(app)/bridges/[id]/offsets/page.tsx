import type { Metadata } from 'next';
import Link from 'next/link';
import OffsetTables from '@/components/offsets/OffsetTables';
import CadDownloads from '@/components/offsets/CadDownloads';
import SafetyCaution from '@/components/SafetyCaution';
import { requireUser } from '@/lib/auth/server-session';
import { roleAllows } from '@/lib/auth/roles';
import { getBridge } from '@/lib/services/bridges';
import OffsetPrintStamp from '@/components/offsets/OffsetPrintStamp';
import styles from './offsets-print.module.css';
import BridgeBreadcrumb from '@/components/BridgeBreadcrumb';
import { orNotFound } from '../load-bridge';

type Params = Promise<{ id: string }>;

export const metadata: Metadata = { title: 'Offset table' };

function load(id: string) {
  return orNotFound(getBridge(id));
}

export default async function OffsetsPage({ params }: { params: Params }) {
  const { id } = await params;
  const user = await requireUser(`/bridges/${id}/offsets`);
  const bridge = await load(id);
  const decimals = bridge.units === 'm' ? '0.001 m' : '0.01 ft';
  const bents = bridge.description.bents.map((b) => ({ name: b.name, station: b.station }));
  return (
    <div className={styles.sheet}>
      <div className={styles.printHeader} aria-hidden="true">
        <span>
          <strong>Chordline offset table</strong> · {bridge.name} · revision {bridge.revision}
        </span>
        <OffsetPrintStamp initial={new Date().toISOString()} />
      </div>
      <BridgeBreadcrumb bridge={bridge} here="Offset table" />
      <div className="mb-4 flex flex-wrap items-end justify-between gap-4">
        <div>
          <h1 className="text-2xl font-bold text-concrete-900 print:text-lg">Offset table: {bridge.name}</h1>
          <p className="mt-1 text-concrete-600 print:text-xs">
            Revision <span className="tabular font-semibold text-concrete-800">{bridge.revision}</span> · lengths and elevations in {bridge.units}, shown to {decimals} (feet-inches to the nearest
            1/8&quot; when chosen; elevations stay decimal) · offsets left (LT) or right (RT) of the alignment
          </p>
        </div>
        {roleAllows(user.role, ['engineer', 'inspector']) ? (
          <Link href={`/bridges/${bridge.id}/survey`} className="btn-secondary no-print min-h-11">
            Import top-of-girder survey
          </Link>
        ) : null}
      </div>
      <SafetyCaution className="mb-6 break-inside-avoid print:mb-3" />
      <p className="mb-6 max-w-3xl text-sm text-concrete-700 print:mb-3 print:max-w-none print:text-xs">
        Edge width is the horizontal distance from the girder centreline to the deck edge, square to the girder; on straight girders measure it from a string line between the girder&apos;s end
        centres, not from the girder. Edge drop runs from the bottom of slab over the girder to the bottom outside edge of the overhang. The form target includes the form settlement allowance. Buildup
        and drop from girder top appear where the top of girder has been surveyed; set the form from the girder, not from the deck forms.
      </p>
      <CadDownloads bridgeId={bridge.id} revision={bridge.revision} />
      <div className="mt-6">
        <OffsetTables bridgeId={bridge.id} bents={bents} />
      </div>
    </div>
  );
}
