import { differenceText, lengthText } from '@/lib/units';
import type { RevisionDiff } from '@/lib/services/revision-diff';

const side = (s: 'left' | 'right') => (s === 'left' ? 'LT' : 'RT');

/**
 * How the overhangs moved between two revisions: the edge-width range of each span and side, and
 * every girder point whose edge width changed, with before, after and the difference.
 */
export default function HistoryEdgeWidthChanges({ diff, from, to }: { diff: RevisionDiff; from: number; to: number }) {
  const u = diff.units;
  if (diff.before_problem || diff.after_problem) {
    return (
      <p className="card border-caution-500 bg-caution-100 p-4 text-sm text-caution-700">
        Edge widths cannot be compared: {diff.before_problem ? `revision ${from} does not compute (${diff.before_problem})` : `revision ${to} does not compute (${diff.after_problem})`}.
      </p>
    );
  }
  return (
    <div className="space-y-4">
      <div className="card overflow-x-auto">
        <table className="w-full text-sm" data-testid="span-width-changes">
          <caption className="px-4 pt-3 text-left text-lg font-bold text-concrete-900">Edge width per span and side</caption>
          <thead>
            <tr className="border-b border-concrete-200 text-left text-xs text-concrete-600">
              <th className="px-4 py-2 font-semibold">Span</th>
              <th className="px-2 py-2 font-semibold">Side</th>
              <th className="px-2 py-2 text-right font-semibold">
                Revision {from} ({u})
              </th>
              <th className="px-2 py-2 text-right font-semibold">
                Revision {to} ({u})
              </th>
              <th className="px-4 py-2 text-right font-semibold">Largest change at a point ({u})</th>
            </tr>
          </thead>
          <tbody>
            {diff.spans.map((s) => (
              <tr key={`${s.span}-${s.side}`} className={`border-b border-concrete-100 ${s.largest_change && s.largest_change > 0 ? 'bg-caution-100/50' : ''}`}>
                <td className="px-4 py-1.5">{s.span}</td>
                <td className="px-2 py-1.5">{side(s.side)}</td>
                <td className="px-2 py-1.5 text-right whitespace-nowrap">{s.before ? `${lengthText(s.before.min, u, false)} – ${lengthText(s.before.max, u, false)}` : '—'}</td>
                <td className="px-2 py-1.5 text-right whitespace-nowrap">{s.after ? `${lengthText(s.after.min, u, false)} – ${lengthText(s.after.max, u, false)}` : '—'}</td>
                <td className="px-4 py-1.5 text-right">{s.largest_change === null ? '—' : lengthText(s.largest_change, u, false)}</td>
              </tr>
            ))}
          </tbody>
        </table>
      </div>
      {diff.edge_widths.length === 0 ? (
        <p className="card p-4 text-concrete-700">
          No girder point&apos;s edge width changed between revision {from} and revision {to}.
        </p>
      ) : (
        <div className="card overflow-x-auto">
          <table className="w-full text-sm" data-testid="point-width-changes">
            <caption className="px-4 pt-3 text-left text-lg font-bold text-concrete-900">
              Girder points whose edge width changed <span className="text-sm font-normal text-concrete-600">({diff.edge_widths.length})</span>
            </caption>
            <thead>
              <tr className="border-b border-concrete-200 text-left text-xs text-concrete-600">
                <th className="px-4 py-2 font-semibold">Span</th>
                <th className="px-2 py-2 font-semibold">Side</th>
                <th className="px-2 py-2 font-semibold">Girder</th>
                <th className="px-2 py-2 text-right font-semibold">Point</th>
                <th className="px-2 py-2 text-right font-semibold">
                  Revision {from} ({u})
                </th>
                <th className="px-2 py-2 text-right font-semibold">
                  Revision {to} ({u})
                </th>
                <th className="px-4 py-2 text-right font-semibold">Difference ({u})</th>
              </tr>
            </thead>
            <tbody>
              {diff.edge_widths.map((c) => (
                <tr key={`${c.span}-${c.side}-${c.girder}-${c.point}`} className="border-b border-concrete-100">
                  <td className="px-4 py-1">{c.span}</td>
                  <td className="px-2 py-1">{side(c.side)}</td>
                  <td className="px-2 py-1">{c.girder}</td>
                  <td className="px-2 py-1 text-right">{c.point}</td>
                  <td className="px-2 py-1 text-right">{c.before === null ? '—' : lengthText(c.before, u, false)}</td>
                  <td className="px-2 py-1 text-right">{c.after === null ? '—' : lengthText(c.after, u, false)}</td>
                  <td className="px-4 py-1 text-right font-semibold">{differenceText(c.difference, u)}</td>
                </tr>
              ))}
            </tbody>
          </table>
        </div>
      )}
    </div>
  );
}
