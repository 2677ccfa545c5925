'use client';

import EditorField from '@/components/editor/EditorField';
import EditorEdgeEditor from '@/components/editor/EdgeEditor';
import EditorSection from '@/components/editor/EditorSection';
import { messagesAt, messagesUnder } from '@/lib/editor/check-draft';
import type { DeckDraft } from '@/lib/editor/draft';
import type { SectionProps } from '@/lib/editor/section-props';

const FIELDS = ['slab_thickness', 'edge_thickness', 'left_barrier_width', 'right_barrier_width', 'form_settlement'].map((f) => `deck.${f}`);

/** Deck section: edge lines at constant offset, slab and edge thickness, barriers and the form allowance. */
export default function EditorDeckSection({ draft, update, check }: SectionProps) {
  const u = draft.units;
  const d = draft.deck;
  const set = (patch: Partial<DeckDraft>) => update((x) => ({ ...x, deck: { ...x.deck, ...patch } }));
  const at = (f: string) => messagesAt(check, `deck.${f}`);
  return (
    <EditorSection
      id="deck"
      title="Deck section"
      intro="Each deck edge runs at a constant offset from the alignment or, where the deck flares (a ramp gore, a widening), follows a station/offset table. The top of deck is level from the gutter line (barrier width inside the edge) to the edge."
      messages={messagesUnder(check, 'deck', FIELDS).filter((m) => !messagesUnder(check, 'deck.left_edge_offset').concat(messagesUnder(check, 'deck.right_edge_offset')).includes(m))}
    >
      <div className="flex flex-wrap gap-x-3 gap-y-3">
        <div className="grid basis-full gap-3 md:grid-cols-2">
          {(['left', 'right'] as const).map((side) => (
            <EditorEdgeEditor
              key={side}
              label={side === 'left' ? 'Left deck edge' : 'Right deck edge'}
              path={`deck.${side}_edge_offset`}
              edge={d[`${side}_edge_offset`]}
              onChange={(edge) => set({ [`${side}_edge_offset`]: edge })}
              units={u}
              stationHint={u === 'm' ? '1+234.567' : '12+34.56'}
              defaultStations={[draft.bents[0]?.station ?? '', draft.bents[draft.bents.length - 1]?.station ?? '']}
              check={check}
            />
          ))}
        </div>
        <EditorField label="Left barrier width" value={d.left_barrier_width} onChange={(v) => set({ left_barrier_width: v })} unit={u} width="w-36" messages={at('left_barrier_width')} />
        <EditorField label="Right barrier width" value={d.right_barrier_width} onChange={(v) => set({ right_barrier_width: v })} unit={u} width="w-36" messages={at('right_barrier_width')} />
        <EditorField label="Slab thickness" value={d.slab_thickness} onChange={(v) => set({ slab_thickness: v })} unit={u} width="w-32" messages={at('slab_thickness')} />
        <EditorField label="Edge thickness" value={d.edge_thickness} onChange={(v) => set({ edge_thickness: v })} unit={u} width="w-32" messages={at('edge_thickness')} />
        <EditorField
          label="Form settlement allowance"
          value={d.form_settlement}
          onChange={(v) => set({ form_settlement: v })}
          unit={u}
          width="w-48"
          placeholder={u === 'm' ? '0.005 if blank' : '0.02 if blank'}
          messages={at('form_settlement')}
        />
      </div>
    </EditorSection>
  );
}
