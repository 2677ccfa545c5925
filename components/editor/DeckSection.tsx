'use client';

import EditorField from '@/components/editor/EditorField';
import EditorOffsetField from '@/components/editor/OffsetField';
import EditorSection from '@/components/editor/EditorSection';
import { messagesAt, messagesUnder } from '@/lib/editor/check-draft';
import type { DeckDraft } from '@/lib/editor/draft';
import type { SectionProps } from '@/lib/editor/section-props';

const FIELDS = ['left_edge_offset', 'right_edge_offset', 'slab_thickness', 'edge_thickness', 'left_barrier_width', 'right_barrier_width', 'form_settlement'].map((f) => `deck.${f}`);

/** Deck section: edge lines at constant offset, slab and edge thickness, barriers and the form allowance. */
export default function EditorDeckSection({ draft, update, check }: SectionProps) {
  const u = draft.units;
  const d = draft.deck;
  const set = (patch: Partial<DeckDraft>) => update((x) => ({ ...x, deck: { ...x.deck, ...patch } }));
  const at = (f: string) => messagesAt(check, `deck.${f}`);
  return (
    <EditorSection id="deck" title="Deck section" intro="The deck edges run at constant offsets from the alignment; the top of deck is level from the gutter line (barrier width inside the edge) to the edge." messages={messagesUnder(check, 'deck', FIELDS)}>
      <div className="flex flex-wrap gap-x-3 gap-y-3">
        <EditorOffsetField label="Left edge offset" value={d.left_edge_offset} onChange={(v) => set({ left_edge_offset: v })} unit={u} messages={at('left_edge_offset')} />
        <EditorOffsetField label="Right edge offset" value={d.right_edge_offset} onChange={(v) => set({ right_edge_offset: v })} unit={u} messages={at('right_edge_offset')} />
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
