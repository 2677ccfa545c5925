'use client';

import EditorField from '@/components/editor/EditorField';
import EditorRow from '@/components/editor/EditorRow';
import EditorSection from '@/components/editor/EditorSection';
import { messagesAt, messagesUnder } from '@/lib/editor/check-draft';
import { moveItem, newKey, type SlopeDraft } from '@/lib/editor/draft';
import type { SectionProps } from '@/lib/editor/section-props';

/** Cross slopes per side at stations, linear between them, constant before the first and after the last. */
export default function EditorCrossSlopeSection({ draft, update, check }: SectionProps) {
  const set = (rows: SlopeDraft[]) => update((d) => ({ ...d, cross_slopes: rows }));
  const setRow = (i: number, patch: Partial<SlopeDraft>) => set(draft.cross_slopes.map((c, j) => (j === i ? { ...c, ...patch } : c)));
  const stationHint = draft.units === 'm' ? '1+234.567' : '12+34.56';
  return (
    <EditorSection
      id="cross-slopes"
      title="Cross slopes"
      intro="Per side, measured outward from the alignment: negative falls away (a normal crown is −2 % and −2 %), positive rises outward."
      messages={messagesAt(check, 'cross_slopes')}
      addLabel="Add cross-slope station"
      onAdd={() => {
        const last = draft.cross_slopes[draft.cross_slopes.length - 1];
        set([...draft.cross_slopes, { key: newKey('cs'), station: '', left: last?.left ?? '-2', right: last?.right ?? '-2', rest: {} }]);
      }}
    >
      <ol className="space-y-2">
        {draft.cross_slopes.map((c, i) => {
          const p = `cross_slopes.${i}`;
          return (
            <EditorRow
              key={c.key}
              title={`Cross-slope station ${i + 1}`}
              index={i}
              count={draft.cross_slopes.length}
              minRows={1}
              onMove={(to) => set(moveItem(draft.cross_slopes, i, to))}
              onRemove={() => set(draft.cross_slopes.filter((_, j) => j !== i))}
              messages={messagesUnder(check, p, [`${p}.station`, `${p}.left`, `${p}.right`])}
            >
              <EditorField
                label="Station"
                value={c.station}
                onChange={(x) => setRow(i, { station: x })}
                placeholder={stationHint}
                unit={draft.units}
                width="w-36 sm:w-40"
                messages={messagesAt(check, `${p}.station`)}
              />
              <EditorField label="Left slope" value={c.left} onChange={(x) => setRow(i, { left: x })} unit="%" width="w-28" messages={messagesAt(check, `${p}.left`)} />
              <EditorField label="Right slope" value={c.right} onChange={(x) => setRow(i, { right: x })} unit="%" width="w-28" messages={messagesAt(check, `${p}.right`)} />
            </EditorRow>
          );
        })}
      </ol>
    </EditorSection>
  );
}
