import type { OffsetTable } from '@/lib/geometry';
import { lengthText } from '@/lib/units';

/**
 * Edge width range per span and side, straight from the engine's span summaries: the numbers the
 * 3D view colours. Plain HTML, so it shows with or without WebGL.
 */
export default function EdgeWidthSummary({ table, caption = 'Edge width per span' }: { table: Pick<OffsetTable, 'units' | 'span_summaries'>; caption?: string }) {
  const u = table.units;
  const rows = [...table.span_summaries].sort((a, b) => a.span - b.span || (a.side === 'left' ? -1 : 1));
  return (
    <div className="card overflow-x-auto">
      <table className="w-full text-sm tabular" data-testid="edge-width-summary">
        <caption className="px-4 pt-3 text-left font-semibold text-concrete-800">{caption}</caption>
        <thead>
          <tr className="border-b border-concrete-200 text-left text-concrete-600">
            <th scope="col" className="px-4 py-2 font-semibold">
              Span
            </th>
            <th scope="col" className="px-4 py-2 font-semibold">
              Side
            </th>
            <th scope="col" className="px-4 py-2 font-semibold">
              Girder
            </th>
            <th scope="col" className="px-4 py-2 text-right font-semibold">
              Narrowest ({u})
            </th>
            <th scope="col" className="px-4 py-2 text-right font-semibold">
              Widest ({u})
            </th>
            <th scope="col" className="px-4 py-2 text-right font-semibold">
              Edge middle ordinate ({u})
            </th>
          </tr>
        </thead>
        <tbody>
          {rows.map((s) => (
            <tr key={`${s.span}-${s.side}`} className="border-b border-concrete-100 last:border-0">
              <td className="px-4 py-2">{s.span}</td>
              <td className="px-4 py-2">{s.side === 'left' ? 'Left' : 'Right'}</td>
              <td className="px-4 py-2">{s.girder}</td>
              <td className="px-4 py-2 text-right">{lengthText(s.min_edge_width, u)}</td>
              <td className="px-4 py-2 text-right">{lengthText(s.max_edge_width, u)}</td>
              <td className="px-4 py-2 text-right">{lengthText(s.middle_ordinate, u)}</td>
            </tr>
          ))}
        </tbody>
      </table>
    </div>
  );
}
