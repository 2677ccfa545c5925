import type { BracketRow } from '@/components/checks/check-types';
import { stationText, type Units } from '@/lib/units';
import FieldTargets from './FieldTargets';

/** The bracket being checked: its point and station, then the numbers to set there. */
export default function FieldTargetCard({
  headingId,
  row,
  lastPoint,
  units,
  deflections = false,
}: {
  headingId: string;
  row: BracketRow;
  lastPoint: number;
  units: Units;
  /** The bridge has a deflection table: show the deflection and screed grade at the point. */
  deflections?: boolean;
}) {
  return (
    <section aria-labelledby={headingId} className="mt-3">
      <h2 id={headingId} className="flex items-baseline justify-between">
        <span className="text-2xl font-bold text-concrete-900">
          Point <span className="tabular">{row.point}</span>
          <span className="text-base font-semibold text-concrete-500"> / {lastPoint}</span>
        </span>
        <span className="tabular text-2xl font-semibold text-concrete-700">{stationText(row.station, units)}</span>
      </h2>
      <FieldTargets row={row} units={units} deflections={deflections} />
    </section>
  );
}
