'use client';

import EditorDeflectionPaste from '@/components/editor/DeflectionPaste';
import EditorField from '@/components/editor/EditorField';
import EditorRow from '@/components/editor/EditorRow';
import EditorSection from '@/components/editor/EditorSection';
import EditorSelect from '@/components/editor/EditorSelect';
import { messagesAt, messagesUnder } from '@/lib/editor/check-draft';
import { convertDeflectionRows, mergeDeflections, newDeflectionRow, type DeflectionDraft } from '@/lib/editor/deflection-draft';
import { DEFLECTION_UNIT_WORDS, type DeflectionUnit } from '@/lib/editor/deflection-paste';
import { moveItem } from '@/lib/editor/draft';
import type { SectionProps } from '@/lib/editor/section-props';

/** Fraction label of value k of n + 1 values along the span: "0.0", "0.1", … "1.0" for tenth points. */
const fraction = (k: number, n: number) => (n === 10 ? (k / 10).toFixed(1) : (k / n).toFixed(3).replace(/0+$/, '').replace(/\.$/, '.0'));

/**
 * Dead-load deflections per girder and span (the plans' deflection table), positive downward, in the
 * bridge's unit: the forms, the haunch and the screed are set high by them before the pour.
 */
export default function EditorDeflectionSection({ draft, update, check }: SectionProps) {
  const u = draft.units;
  const rows = draft.deflections;
  const girders = draft.girders.map((g) => g.name.trim()).filter(Boolean);
  const spans = Math.max(1, draft.bents.length - 1);
  const set = (deflections: DeflectionDraft[]) => update((d) => ({ ...d, deflections }));
  const setRow = (i: number, patch: Partial<DeflectionDraft>) => set(rows.map((r, j) => (j === i ? { ...r, ...patch } : r)));
  return (
    <EditorSection
      id="deflections"
      title="Dead-load deflections"
      intro={`How far each girder will still sag under the wet deck, from the plans' deflection table: positive downward, in ${DEFLECTION_UNIT_WORDS[draft.deflection_unit]} (stored in ${u === 'm' ? 'metres' : 'feet'}), at equal fractions of each span (11 values for tenth points). Form targets, buildups and the screed grade are raised by them. Leave the table empty when the plans give none.`}
      messages={messagesAt(check, 'deflections')}
      addLabel="Add girder and span"
      onAdd={() => set([...rows, newDeflectionRow(rows, girders, spans)])}
    >
      <div className="mb-3">
        <EditorSelect
          label="Table values in"
          value={draft.deflection_unit}
          onChange={(unit) => update((d) => ({ ...d, deflections: convertDeflectionRows(d.deflections, d.deflection_unit, unit), deflection_unit: unit }))}
          options={(Object.keys(DEFLECTION_UNIT_WORDS) as DeflectionUnit[]).map((x) => ({ value: x, label: DEFLECTION_UNIT_WORDS[x] }))}
          width="w-40"
        />
      </div>
      <EditorDeflectionPaste into={draft.deflection_unit} girders={girders} spans={spans} onRows={(pasted) => set(mergeDeflections(rows, pasted))} />
      {rows.length === 0 ? <p className="mt-3 text-sm text-concrete-600">No deflections: the targets are the design elevations plus the form settlement allowance.</p> : null}
      <ol className="mt-3 space-y-2" data-testid="deflection-rows">
        {rows.map((r, i) => {
          const p = `deflections.${i}`;
          const n = r.values.length - 1;
          const shown = [`${p}.girder`, `${p}.span`, ...r.values.map((_, k) => `${p}.values.${k}`)];
          return (
            <EditorRow
              key={r.key}
              title={`${r.girder || 'Girder ?'}, span ${r.span}`}
              index={i}
              count={rows.length}
              minRows={0}
              onMove={(to) => set(moveItem(rows, i, to))}
              onRemove={() => set(rows.filter((_, j) => j !== i))}
              messages={messagesUnder(check, p, shown)}
            >
              <EditorSelect
                label="Girder"
                value={r.girder}
                onChange={(v) => setRow(i, { girder: v })}
                options={(girders.includes(r.girder) ? girders : [r.girder, ...girders]).map((g) => ({ value: g, label: g || '—' }))}
                width="w-24"
              />
              <EditorSelect
                label="Span"
                value={r.span}
                onChange={(v) => setRow(i, { span: v })}
                options={Array.from({ length: spans }, (_, s) => ({ value: String(s + 1), label: String(s + 1) }))}
                width="w-20"
              />
              <EditorSelect
                label="Values"
                value={String(n)}
                onChange={(v) => setRow(i, { values: Array.from({ length: Number(v) + 1 }, (_, k) => r.values[k] ?? '0') })}
                options={[2, 4, 5, 10, 20].map((c) => ({ value: String(c), label: c === 10 ? '11 (tenths)' : String(c + 1) }))}
                width="w-32"
              />
              <div className="grid basis-full grid-cols-4 gap-x-2 gap-y-2 sm:grid-cols-6 lg:grid-cols-11">
                {r.values.map((v, k) => (
                  <EditorField
                    key={k}
                    label={`${fraction(k, n)} (${draft.deflection_unit})`}
                    value={v}
                    onChange={(x) => setRow(i, { values: r.values.map((y, j) => (j === k ? x : y)) })}
                    width="w-full min-w-0"
                    messages={messagesAt(check, `${p}.values.${k}`)}
                  />
                ))}
              </div>
            </EditorRow>
          );
        })}
      </ol>
    </EditorSection>
  );
}
