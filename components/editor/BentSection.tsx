'use client';

import EditorField from '@/components/editor/EditorField';
import EditorRow from '@/components/editor/EditorRow';
import EditorSection from '@/components/editor/EditorSection';
import { messagesAt, messagesUnder } from '@/lib/editor/check-draft';
import { moveItem, newKey, type BentDraft } from '@/lib/editor/draft';
import type { SectionProps } from '@/lib/editor/section-props';

/**
 * Bents in up-station order. Each girder has one offset per bent, so adding, removing or moving a
 * bent adds, removes or moves that offset of every girder with it.
 */
export default function EditorBentSection({ draft, update, check }: SectionProps) {
  const setRow = (i: number, patch: Partial<BentDraft>) => update((d) => ({ ...d, bents: d.bents.map((b, j) => (j === i ? { ...b, ...patch } : b)) }));
  const stationHint = draft.units === 'm' ? '1+234.567' : '12+34.56';
  return (
    <EditorSection
      id="bents"
      title="Bents"
      intro="In up-station order; span 1 runs from the first bent to the second. Skew is the angle from the alignment's normal, positive when the bent's right end lies further up-station."
      messages={messagesAt(check, 'bents')}
      addLabel="Add bent"
      onAdd={() =>
        update((d) => ({
          ...d,
          bents: [...d.bents, { key: newKey('bent'), name: `Bent ${d.bents.length + 1}`, station: '', skew_deg: '0', rest: {} }],
          girders: d.girders.map((g) => ({ ...g, offsets: [...g.offsets, { ...(g.offsets[g.offsets.length - 1] ?? { magnitude: '', side: 'RT' as const }) }] })),
        }))
      }
    >
      <ol className="space-y-2">
        {draft.bents.map((b, i) => {
          const p = `bents.${i}`;
          return (
            <EditorRow
              key={b.key}
              title={b.name.trim() || `Bent ${i + 1}`}
              index={i}
              count={draft.bents.length}
              minRows={2}
              onMove={(to) => update((d) => ({ ...d, bents: moveItem(d.bents, i, to), girders: d.girders.map((g) => ({ ...g, offsets: moveItem(g.offsets, i, to) })) }))}
              onRemove={() => update((d) => ({ ...d, bents: d.bents.filter((_, j) => j !== i), girders: d.girders.map((g) => ({ ...g, offsets: g.offsets.filter((_, j) => j !== i) })) }))}
              messages={messagesUnder(check, p, [`${p}.name`, `${p}.station`, `${p}.skew_deg`])}
            >
              <EditorField label="Name" value={b.name} onChange={(x) => setRow(i, { name: x })} inputMode="text" width="w-32 sm:w-40" messages={messagesAt(check, `${p}.name`)} />
              <EditorField
                label="Station"
                value={b.station}
                onChange={(x) => setRow(i, { station: x })}
                placeholder={stationHint}
                unit={draft.units}
                width="w-36 sm:w-40"
                messages={messagesAt(check, `${p}.station`)}
              />
              <EditorField label="Skew" value={b.skew_deg} onChange={(x) => setRow(i, { skew_deg: x })} unit="°" width="w-28" messages={messagesAt(check, `${p}.skew_deg`)} />
            </EditorRow>
          );
        })}
      </ol>
    </EditorSection>
  );
}
