'use client';

import { useId } from 'react';
import OffsetPdfDownload from '@/components/offsets/OffsetPdfDownload';
import type { DisplayStyle } from '@/lib/geometry';
import type { Units } from '@/lib/units';

/** How near a typed station ("12+45") a girder point must lie to be shown, either side. */
export const NEAR_STATION = { ft: 5, m: 1.5 } as const;

export type OffsetFilter = { span: number | 'all'; side: 'left' | 'right' | 'both'; text: string };

const STYLE_CHOICES: { value: DisplayStyle; label: string; hint: string }[] = [
  { value: 'decimal-feet', label: 'Decimal feet', hint: '0.01 ft' },
  { value: 'feet-inches', label: 'Feet-inches', hint: 'to 1/8"' },
];

/**
 * Controls of the offset table: display style, span / side / text filters, CSV and PDF downloads in
 * the chosen style and print. Hidden on paper.
 */
export default function OffsetTableToolbar({
  bridgeId,
  units,
  style,
  onStyle,
  spans,
  filter,
  onFilter,
  shown,
  total,
}: {
  bridgeId: number;
  units: Units;
  style: DisplayStyle;
  onStyle: (s: DisplayStyle) => void;
  spans: number[];
  filter: OffsetFilter;
  onFilter: (f: OffsetFilter) => void;
  shown: number;
  total: number;
}) {
  const id = useId();
  const csvStyle = units === 'm' ? 'metric' : style;
  return (
    <div className="no-print card space-y-3 p-3 sm:p-4" role="region" aria-label="Table controls">
      <div className="flex flex-wrap items-end gap-x-6 gap-y-3">
        <fieldset>
          <legend className="field-label">Show lengths in</legend>
          {units === 'm' ? (
            <p className="mt-1 inline-flex min-h-11 items-center rounded-md border border-brand-600 bg-brand-50 px-4 text-sm font-semibold text-brand-800">
              Metric (m, to 1 mm): this bridge is metric
            </p>
          ) : (
            <div className="mt-1 inline-flex rounded-md border border-concrete-300 bg-white p-0.5" role="radiogroup" aria-label="Length style">
              {STYLE_CHOICES.map((c) => (
                <button
                  key={c.value}
                  type="button"
                  role="radio"
                  aria-checked={style === c.value}
                  onClick={() => onStyle(c.value)}
                  className={`min-h-11 rounded px-3 text-sm font-semibold ${style === c.value ? 'bg-brand-600 text-white' : 'text-concrete-800 hover:bg-concrete-100'}`}
                >
                  {c.label} <span className="font-normal opacity-80">{c.hint}</span>
                </button>
              ))}
            </div>
          )}
        </fieldset>
        <div className="flex flex-wrap gap-2">
          <a href={`/api/bridges/${bridgeId}/offsets.csv?style=${csvStyle}`} className="btn-secondary min-h-11" download>
            Download CSV ({units === 'm' ? 'metric' : style === 'feet-inches' ? 'feet-inches' : 'decimal feet'})
          </a>
          <OffsetPdfDownload bridgeId={bridgeId} units={units} style={style} />
          <button type="button" className="btn-secondary min-h-11" onClick={() => window.print()}>
            Print
          </button>
        </div>
      </div>
      <div className="grid grid-cols-2 gap-3 sm:flex sm:flex-wrap sm:items-end">
        <div>
          <label htmlFor={`${id}-span`} className="field-label">
            Span
          </label>
          <select
            id={`${id}-span`}
            className="field-input min-h-11"
            value={String(filter.span)}
            onChange={(e) => onFilter({ ...filter, span: e.target.value === 'all' ? 'all' : Number(e.target.value) })}
          >
            <option value="all">All spans</option>
            {spans.map((s) => (
              <option key={s} value={s}>
                Span {s}
              </option>
            ))}
          </select>
        </div>
        <div>
          <label htmlFor={`${id}-side`} className="field-label">
            Side
          </label>
          <select id={`${id}-side`} className="field-input min-h-11" value={filter.side} onChange={(e) => onFilter({ ...filter, side: e.target.value as OffsetFilter['side'] })}>
            <option value="both">Both sides</option>
            <option value="left">Left</option>
            <option value="right">Right</option>
          </select>
        </div>
        <div className="col-span-2 sm:w-64">
          <label htmlFor={`${id}-text`} className="field-label">
            Station or point
          </label>
          <input
            id={`${id}-text`}
            type="search"
            inputMode="decimal"
            placeholder={units === 'm' ? 'e.g. 1+245 or 10' : 'e.g. 12+45 or 10'}
            className="field-input min-h-11"
            value={filter.text}
            onChange={(e) => onFilter({ ...filter, text: e.target.value })}
          />
        </div>
        <p className="col-span-2 self-center text-sm text-concrete-600 sm:pb-2" aria-live="polite">
          Showing {shown} of {total} girder points
          {filter.text.includes('+') ? ` within ${NEAR_STATION[units]} ${units} of ${filter.text.trim()}` : ''}
        </p>
      </div>
    </div>
  );
}
