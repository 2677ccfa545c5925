'use client';

import EditorField from '@/components/editor/EditorField';
import EditorSection from '@/components/editor/EditorSection';
import { messagesAt } from '@/lib/editor/check-draft';
import type { SectionProps } from '@/lib/editor/section-props';

/** How finely each span is divided: girder points per span and deck-edge chord spaces per span. */
export default function EditorPointsSection({ draft, update, check }: SectionProps) {
  return (
    <EditorSection id="points" title="Girder points per span" intro="Girder points k = 0…n in each span (10 gives tenth points) and the equal spaces of each deck-edge chord.">
      <div className="flex flex-wrap gap-x-3 gap-y-2">
        <EditorField
          label="Points per span (n)"
          value={draft.points_per_span}
          onChange={(v) => update((d) => ({ ...d, points_per_span: v }))}
          inputMode="numeric"
          unit="spaces"
          width="w-44"
          placeholder="10 if blank"
          messages={messagesAt(check, 'points_per_span')}
        />
        <EditorField
          label="Chord spaces per span (m)"
          value={draft.chord_spaces}
          onChange={(v) => update((d) => ({ ...d, chord_spaces: v }))}
          inputMode="numeric"
          unit="spaces"
          width="w-48"
          placeholder="20 if blank"
          messages={messagesAt(check, 'chord_spaces')}
        />
      </div>
    </EditorSection>
  );
}
