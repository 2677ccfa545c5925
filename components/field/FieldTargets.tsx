import type { BracketRow } from '@/components/checks/check-types';
import { lengthText, readingLength, type Units } from '@/lib/units';

/** The numbers to set at one bracket, large enough to read at arm's length. */
export default function FieldTargets({ row, units }: { row: BracketRow; units: Units }) {
  return (
    <dl className="mt-2 grid grid-cols-2 gap-2">
      <div className="col-span-2 rounded-lg border border-brand-300 bg-white p-3">
        <dt className="text-sm font-semibold text-concrete-600">Edge width, square to the girder</dt>
        <dd className="tabular text-4xl font-bold text-brand-800" data-testid="target-width">
          {row.edge_width_text}
        </dd>
        {units === 'ft' ? <dd className="tabular text-2xl text-concrete-700">{row.edge_width_decimal_text}</dd> : null}
      </div>
      <div className="rounded-lg border border-concrete-200 bg-white p-3">
        <dt className="text-sm font-semibold text-concrete-600">Level-bar reading</dt>
        {row.reading === null ? (
          <dd className="mt-1 text-base font-semibold text-caution-700">Not surveyed here</dd>
        ) : (
          <dd className="tabular text-2xl font-bold text-concrete-900" data-testid="target-reading">
            {readingLength(row.reading, units)}
          </dd>
        )}
      </div>
      <div className="rounded-lg border border-concrete-200 bg-white p-3">
        <dt className="text-sm font-semibold text-concrete-600">Form target elev.</dt>
        <dd className="tabular text-2xl font-bold text-concrete-900">{lengthText(row.form_target, units)}</dd>
      </div>
      {row.girder_rod !== null && row.form_rod !== null ? (
        <div className="col-span-2 rounded-lg border border-concrete-200 bg-white p-3">
          <dt className="text-sm font-semibold text-concrete-600">Level-bar rods (girder end / form end)</dt>
          <dd className="tabular text-2xl font-bold text-concrete-900">
            {readingLength(row.girder_rod, units)} / {readingLength(row.form_rod, units)}
          </dd>
          {row.extra_rod ? <dd className="text-sm text-caution-700">Both rods include {readingLength(row.extra_rod, units)} extra: the form edge sits above the girder top.</dd> : null}
        </div>
      ) : null}
    </dl>
  );
}
