'use client';

import EditorField from '@/components/editor/EditorField';
import EditorOffsetField from '@/components/editor/OffsetField';
import EditorRow from '@/components/editor/EditorRow';
import EditorSelect from '@/components/editor/EditorSelect';
import EditorSection from '@/components/editor/EditorSection';
import { messagesAt, messagesUnder } from '@/lib/editor/check-draft';
import { moveItem, newKey, type GirderDraft, type OffsetDraft } from '@/lib/editor/draft';
import type { SectionProps } from '@/lib/editor/section-props';

/** Girders: a name, chord or curved layout, and the offset where the girder crosses each bent line. */
export default function EditorGirderSection({ draft, update, check }: SectionProps) {
  const u = draft.units;
  const set = (girders: GirderDraft[]) => update((d) => ({ ...d, girders }));
  const setRow = (i: number, patch: Partial<GirderDraft>) => set(draft.girders.map((g, j) => (j === i ? { ...g, ...patch } : g)));
  const setOffset = (i: number, k: number, v: OffsetDraft) => setRow(i, { offsets: draft.girders[i].offsets.map((o, j) => (j === k ? v : o)) });
  return (
    <EditorSection
      id="girders"
      title="Girders"
      intro="Offsets are measured square to the alignment where the girder crosses each bent line. Chord girders run straight from bent to bent; curved girders stay concentric with the alignment."
      messages={messagesAt(check, 'girders')}
      addLabel="Add girder"
      onAdd={() =>
        set([
          ...draft.girders,
          {
            key: newKey('girder'),
            name: `G${draft.girders.length + 1}`,
            layout: draft.girders[0]?.layout ?? 'chord',
            offsets: draft.bents.map(() => ({ magnitude: '0', side: 'RT' as const })),
            rest: {},
          },
        ])
      }
    >
      <ol className="space-y-2">
        {draft.girders.map((g, i) => {
          const p = `girders.${i}`;
          const shown = [`${p}.name`, `${p}.layout`, ...g.offsets.map((_, k) => `${p}.offsets.${k}`)];
          return (
            <EditorRow
              key={g.key}
              title={`Girder ${g.name.trim() || i + 1}`}
              index={i}
              count={draft.girders.length}
              minRows={1}
              onMove={(to) => set(moveItem(draft.girders, i, to))}
              onRemove={() => set(draft.girders.filter((_, j) => j !== i))}
              messages={messagesUnder(check, p, shown)}
            >
              <EditorField label="Name" value={g.name} onChange={(x) => setRow(i, { name: x })} inputMode="text" width="w-24" messages={messagesAt(check, `${p}.name`)} />
              <EditorSelect
                label="Layout"
                value={g.layout}
                onChange={(v) => setRow(i, { layout: v })}
                options={[
                  { value: 'chord', label: 'Chord' },
                  { value: 'curved', label: 'Curved' },
                ]}
              />
              <div className="grid basis-full grid-cols-2 gap-x-3 gap-y-2 sm:grid-cols-3">
                {g.offsets.map((o, k) => (
                  <EditorOffsetField
                    key={draft.bents[k]?.key ?? k}
                    label={`Offset at ${draft.bents[k]?.name.trim() || `bent ${k + 1}`}`}
                    value={o}
                    onChange={(v) => setOffset(i, k, v)}
                    unit={u}
                    width="w-full min-w-0"
                    messages={messagesAt(check, `${p}.offsets.${k}`)}
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
