'use client';

import EditorField from '@/components/editor/EditorField';
import EditorSelect from '@/components/editor/EditorSelect';
import { messagesAt, type DraftCheck } from '@/lib/editor/check-draft';
import type { ElementDraft } from '@/lib/editor/draft';

/**
 * A clothoid spiral's own fields: where it starts and ends (on a tangent, or at a radius: the arc it
 * joins), and the way it turns. Its curvature changes evenly along its length between the two.
 */
export default function EditorSpiralFields({
  element: e,
  path,
  units,
  check,
  onChange,
}: {
  element: ElementDraft;
  path: string;
  units: string;
  check: DraftCheck;
  onChange: (patch: Partial<ElementDraft>) => void;
}) {
  const end = (which: 'start' | 'end') => {
    const mode = e[which];
    const key = which === 'start' ? 'radius_start' : 'radius_end';
    return (
      <div className="flex items-end gap-1.5">
        <EditorSelect
          label={which === 'start' ? 'Starts on' : 'Ends on'}
          value={mode}
          onChange={(v) => onChange({ [which]: v, [key]: e[key] || e.radius || '1000' } as Partial<ElementDraft>)}
          options={[
            { value: 'tangent', label: 'Tangent' },
            { value: 'radius', label: 'Radius' },
          ]}
          width="w-28"
        />
        {mode === 'radius' ? (
          <EditorField
            label={which === 'start' ? 'Start radius' : 'End radius'}
            value={e[key]}
            onChange={(v) => onChange({ [key]: v } as Partial<ElementDraft>)}
            unit={units}
            messages={messagesAt(check, `${path}.${key}`)}
          />
        ) : null}
      </div>
    );
  };
  return (
    <>
      {end('start')}
      {end('end')}
      <EditorSelect
        label="Turns"
        value={e.direction}
        onChange={(v) => onChange({ direction: v })}
        options={[
          { value: 'right', label: 'Right' },
          { value: 'left', label: 'Left' },
        ]}
        width="w-24"
      />
    </>
  );
}
