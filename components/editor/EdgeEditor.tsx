'use client';

import EditorField from '@/components/editor/EditorField';
import EditorMessages from '@/components/editor/EditorMessages';
import EditorOffsetField from '@/components/editor/OffsetField';
import EditorSelect from '@/components/editor/EditorSelect';
import { messagesAt, messagesUnder, type DraftCheck } from '@/lib/editor/check-draft';
import { newEdgeRow, switchEdgeMode, type EdgeDraft } from '@/lib/editor/edge-draft';

/**
 * One deck edge: a constant offset from the alignment, or a station/offset table for a flared edge
 * (straight between the listed stations, constant before the first and after the last).
 */
export default function EditorEdgeEditor({
  label,
  path,
  edge,
  onChange,
  units,
  stationHint,
  defaultStations,
  check,
}: {
  label: string;
  path: string;
  edge: EdgeDraft;
  onChange: (edge: EdgeDraft) => void;
  units: string;
  stationHint: string;
  defaultStations: [string, string];
  check: DraftCheck;
}) {
  const shown = edge.rows.flatMap((_, j) => [`${path}.${j}.station`, `${path}.${j}.offset`]);
  const setRow = (j: number, patch: Partial<EdgeDraft['rows'][number]>) => onChange({ ...edge, rows: edge.rows.map((r, k) => (k === j ? { ...r, ...patch } : r)) });
  return (
    <fieldset className="min-w-0 rounded-md border border-concrete-200 p-3" data-testid={`edge-${path.endsWith('left_edge_offset') ? 'left' : 'right'}`}>
      <legend className="px-1 text-sm font-bold text-concrete-800">{label}</legend>
      <EditorSelect
        label="Edge line"
        value={edge.mode}
        onChange={(mode) => onChange(switchEdgeMode(edge, mode, defaultStations))}
        options={[
          { value: 'constant', label: 'Constant offset' },
          { value: 'table', label: 'Flared: station / offset table' },
        ]}
        width="w-64"
      />
      {edge.mode === 'constant' ? (
        <div className="mt-2">
          <EditorOffsetField label="Offset" value={edge.constant} onChange={(v) => onChange({ ...edge, constant: v })} unit={units} messages={messagesAt(check, path)} />
        </div>
      ) : (
        <>
          <table className="mt-2 text-sm">
            <caption className="sr-only">{label}: station and offset of each listed point of the edge</caption>
            <tbody>
              {edge.rows.map((r, j) => (
                <tr key={r.key} className="align-top">
                  <td className="py-1 pr-2">
                    <EditorField
                      label={`Station ${j + 1}`}
                      value={r.station}
                      onChange={(v) => setRow(j, { station: v })}
                      placeholder={stationHint}
                      unit={units}
                      width="w-36"
                      messages={messagesAt(check, `${path}.${j}.station`)}
                    />
                  </td>
                  <td className="py-1 pr-2">
                    <EditorOffsetField label={`Offset ${j + 1}`} value={r.offset} onChange={(v) => setRow(j, { offset: v })} unit={units} messages={messagesAt(check, `${path}.${j}.offset`)} />
                  </td>
                  <td className="py-1 pt-6">
                    <button
                      type="button"
                      className="rounded border border-concrete-300 bg-white px-2 py-0.5 text-sm text-fail-600 hover:bg-fail-100 disabled:opacity-40"
                      onClick={() => onChange({ ...edge, rows: edge.rows.filter((_, k) => k !== j) })}
                      disabled={edge.rows.length <= 2}
                      aria-label={`Remove ${label.toLowerCase()} station ${j + 1}`}
                      title={edge.rows.length <= 2 ? 'A flared edge needs at least two stations' : 'Remove'}
                    >
                      ✕
                    </button>
                  </td>
                </tr>
              ))}
            </tbody>
          </table>
          <button type="button" className="btn-secondary mt-2" onClick={() => onChange({ ...edge, rows: [...edge.rows, newEdgeRow(edge)] })}>
            + Add station
          </button>
        </>
      )}
      <EditorMessages messages={messagesUnder(check, path, [path, ...shown])} />
    </fieldset>
  );
}
