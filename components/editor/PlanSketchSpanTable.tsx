import { lengthText, type Units } from '@/lib/units';
import type { SpanSummary } from '@/lib/geometry';

/** Edge-width range (girder point → deck edge) of each span and side, from the engine's span summaries. */
export default function PlanSketchSpanTable({ summaries, units }: { summaries: SpanSummary[]; units: Units }) {
  return (
    <div className="overflow-x-auto">
      <table className="w-full text-sm" data-testid="span-widths">
        <caption className="mb-1 text-left text-sm font-bold text-concrete-800">Edge width per span</caption>
        <thead>
          <tr className="border-b border-concrete-200 text-left text-xs text-concrete-600">
            <th className="py-1 pr-2 font-semibold">Span</th>
            <th className="py-1 pr-2 font-semibold">Side</th>
            <th className="py-1 pr-2 font-semibold">Girder</th>
            <th className="py-1 pr-2 text-right font-semibold">Least ({units})</th>
            <th className="py-1 text-right font-semibold">Greatest ({units})</th>
          </tr>
        </thead>
        <tbody>
          {summaries.map((s) => (
            <tr key={`${s.span}-${s.side}`} className="border-b border-concrete-100" data-span={s.span} data-side={s.side}>
              <td className="py-1 pr-2">{s.span}</td>
              <td className="py-1 pr-2">{s.side === 'left' ? 'LT' : 'RT'}</td>
              <td className="py-1 pr-2">{s.girder}</td>
              <td className="py-1 pr-2 text-right" data-testid="min-width">
                {lengthText(s.min_edge_width, units, false)}
              </td>
              <td className="py-1 text-right" data-testid="max-width">
                {lengthText(s.max_edge_width, units, false)}
              </td>
            </tr>
          ))}
        </tbody>
      </table>
    </div>
  );
}
