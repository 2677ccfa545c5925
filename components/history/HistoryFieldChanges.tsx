import { offsetText, stationText, type Units } from '@/lib/units';
import { type FieldChange, type Scalar } from '@/lib/services/revision-diff';
import { fieldKind, fieldLabel } from '@/lib/services/revision-field-labels';
import type { BridgeDescription } from '@/lib/geometry';

function valueText(path: string, value: Scalar | undefined, units: Units): string {
  if (value === undefined) return '(not set)';
  if (value === null) return '—';
  if (typeof value !== 'number') return String(value);
  switch (fieldKind(path)) {
    case 'station':
      return `${stationText(value, units)}`;
    case 'offset':
      return offsetText(value, units, true);
    case 'slope':
      return `${+(value * 100).toPrecision(12)} %`;
    case 'angle':
      return `${value}°`;
    case 'count':
      return String(value);
    default:
      return `${+value.toPrecision(12)} ${units}`;
  }
}

/** The description's changed fields between two revisions, labelled with the trade's words. */
export default function HistoryFieldChanges({ changes, before, after, from, to }: { changes: FieldChange[]; before: BridgeDescription; after: BridgeDescription; from: number; to: number }) {
  const units = after.units;
  if (changes.length === 0)
    return (
      <p className="card p-4 text-concrete-700">
        No field of the description differs between revision {from} and revision {to}.
      </p>
    );
  return (
    <div className="card overflow-x-auto">
      <table className="w-full text-sm" data-testid="field-changes">
        <caption className="px-4 pt-3 text-left text-lg font-bold text-concrete-900">
          Fields changed <span className="text-sm font-normal text-concrete-600">({changes.length})</span>
        </caption>
        <thead>
          <tr className="border-b border-concrete-200 text-left text-xs text-concrete-600">
            <th className="px-4 py-2 font-semibold">Field</th>
            <th className="px-2 py-2 text-right font-semibold">Revision {from}</th>
            <th className="px-4 py-2 text-right font-semibold">Revision {to}</th>
          </tr>
        </thead>
        <tbody>
          {changes.map((c) => (
            <tr key={c.path} className="border-b border-concrete-100">
              <td className="px-4 py-1.5">
                <span title={`Field ${c.path} of the bridge description`}>{fieldLabel(c.path, c.after === undefined ? before : after)}</span>
              </td>
              <td className="px-2 py-1.5 text-right whitespace-nowrap text-concrete-700">{valueText(c.path, c.before, units)}</td>
              <td className="px-4 py-1.5 text-right font-semibold whitespace-nowrap">{valueText(c.path, c.after, units)}</td>
            </tr>
          ))}
        </tbody>
      </table>
    </div>
  );
}
