import type { BracketRow } from '@/components/checks/check-types';
import { lengthText, readingLength, type Units } from '@/lib/units';

/**
 * The numbers to set at one bracket, large enough to read at arm's length. `deflections`: the bridge
 * has a dead-load deflection table, so the card also shows the sag still to come at this point and the
 * screed grade over the girder (domain.md, "Dead-load deflection" and "Screed grade").
 */
export default function FieldTargets({ row, units, deflections = false }: { row: BracketRow; units: Units; deflections?: boolean }) {
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
        {deflections ? <dd className="mt-1 text-xs text-concrete-600">Deflection included.</dd> : null}
      </div>
      {deflections ? (
        <>
          <div className="rounded-lg border border-concrete-200 bg-white p-3">
            <dt className="text-sm font-semibold text-concrete-600">Deflection</dt>
            <dd className="tabular text-2xl font-bold text-concrete-900" data-testid="target-deflection">
              {lengthText(row.deflection, units)}
            </dd>
            <dd className="mt-1 text-xs text-concrete-600">The girder still sags this much under the wet deck; the forms are set this much high.</dd>
          </div>
          <div className="rounded-lg border border-concrete-200 bg-white p-3">
            <dt className="text-sm font-semibold text-concrete-600">Screed grade</dt>
            <dd className="tabular text-2xl font-bold text-concrete-900" data-testid="target-screed">
              {lengthText(row.screed_grade, units)}
            </dd>
            <dd className="mt-1 text-xs text-concrete-600">Top of deck plus deflection: the grade the screed strikes over the girder before the pour.</dd>
          </div>
        </>
      ) : null}
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
