'use client';

export type SortDirection = 'ascending' | 'descending';

/**
 * A column header that sorts its table when clicked (again to reverse). The state is announced with
 * aria-sort; the whole header cell is the tap target.
 */
export default function OffsetSortHeader({
  label,
  unit,
  active,
  direction,
  onSort,
  align = 'right',
  sticky = false,
}: {
  label: string;
  unit?: string;
  active: boolean;
  direction: SortDirection;
  onSort: () => void;
  align?: 'left' | 'right';
  sticky?: boolean;
}) {
  return (
    <th scope="col" aria-sort={active ? direction : 'none'} className={`p-0 font-semibold ${sticky ? 'sticky left-0 z-10 bg-concrete-100 print:static' : ''}`}>
      <button
        type="button"
        onClick={onSort}
        className={`flex min-h-11 w-full items-end gap-1 px-2.5 py-2 font-semibold hover:bg-concrete-200 print:min-h-0 print:px-1.5 print:py-1 ${
          align === 'right' ? 'justify-end text-right' : 'justify-start text-left'
        } ${active ? 'text-brand-800' : 'text-concrete-600'}`}
      >
        <span className="max-w-32 leading-tight">
          {label}
          {unit ? <span className="font-normal"> ({unit})</span> : null}
        </span>
        <span aria-hidden="true" className={`no-print w-3 text-xs ${active ? '' : 'opacity-30'}`}>
          {active ? (direction === 'ascending' ? '▲' : '▼') : '↕'}
        </span>
      </button>
    </th>
  );
}
