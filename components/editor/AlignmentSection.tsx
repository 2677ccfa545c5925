'use client';

import EditorField from '@/components/editor/EditorField';
import EditorRow from '@/components/editor/EditorRow';
import EditorSelect from '@/components/editor/EditorSelect';
import EditorSection from '@/components/editor/EditorSection';
import EditorSpiralFields from '@/components/editor/SpiralFields';
import { messagesAt, messagesUnder } from '@/lib/editor/check-draft';
import { moveItem, newKey, type ElementDraft } from '@/lib/editor/draft';
import type { SectionProps } from '@/lib/editor/section-props';

/** Horizontal alignment: start point, start bearing and the tangents and arcs laid end to end. */
export default function EditorAlignmentSection({ draft, update, check }: SectionProps) {
  const u = draft.units;
  const a = draft.alignment;
  const setA = (patch: Partial<typeof a>) => update((d) => ({ ...d, alignment: { ...d.alignment, ...patch } }));
  const setEl = (i: number, patch: Partial<ElementDraft>) => setA({ elements: a.elements.map((e, j) => (j === i ? { ...e, ...patch } : e)) });
  const stationHint = u === 'm' ? '1+234.567' : '12+34.56';
  return (
    <EditorSection
      id="alignment"
      title="Alignment"
      intro="Tangents, clothoid spirals and circular arcs laid end to end from the start point, each tangent to the one before. Bearings are azimuths, clockwise from north."
      messages={messagesAt(check, 'alignment').concat(messagesAt(check, 'alignment.elements'))}
      addLabel="Add element"
      onAdd={() =>
        setA({
          elements: [...a.elements, { key: newKey('el'), type: 'line', length: '100', radius: '', direction: 'right', start: 'tangent', radius_start: '', end: 'radius', radius_end: '', rest: {} }],
        })
      }
    >
      <div className="mb-3 flex flex-wrap gap-x-3 gap-y-2">
        <EditorField
          label="Start station"
          value={a.start_station}
          onChange={(v) => setA({ start_station: v })}
          placeholder={stationHint}
          unit={u}
          width="w-36 sm:w-40"
          messages={messagesAt(check, 'alignment.start_station')}
        />
        <EditorField label="Start easting (x)" value={a.start_x} onChange={(v) => setA({ start_x: v })} unit={u} width="w-40" messages={messagesAt(check, 'alignment.start_x')} />
        <EditorField label="Start northing (y)" value={a.start_y} onChange={(v) => setA({ start_y: v })} unit={u} width="w-40" messages={messagesAt(check, 'alignment.start_y')} />
        <EditorField
          label="Start bearing"
          value={a.start_bearing_deg}
          onChange={(v) => setA({ start_bearing_deg: v })}
          unit="°"
          width="w-32"
          messages={messagesAt(check, 'alignment.start_bearing_deg')}
        />
      </div>
      <ol className="space-y-2">
        {a.elements.map((e, i) => {
          const p = `alignment.elements.${i}`;
          const shown = [`${p}.length`, `${p}.radius`, `${p}.type`, `${p}.direction`, `${p}.radius_start`, `${p}.radius_end`];
          return (
            <EditorRow
              key={e.key}
              title={`Element ${i + 1}: ${e.type === 'line' ? 'tangent' : e.type === 'arc' ? 'arc' : 'spiral'}`}
              index={i}
              count={a.elements.length}
              minRows={1}
              onMove={(to) => setA({ elements: moveItem(a.elements, i, to) })}
              onRemove={() => setA({ elements: a.elements.filter((_, j) => j !== i) })}
              messages={messagesUnder(check, p, shown)}
            >
              <EditorSelect
                label="Type"
                value={e.type}
                onChange={(v) => setEl(i, { type: v, radius: e.radius || '1000', radius_end: e.radius_end || e.radius || '1000' })}
                options={[
                  { value: 'line', label: 'Tangent' },
                  { value: 'spiral', label: 'Spiral' },
                  { value: 'arc', label: 'Arc' },
                ]}
                width="w-28"
              />
              <EditorField label="Length" value={e.length} onChange={(v) => setEl(i, { length: v })} unit={u} messages={messagesAt(check, `${p}.length`)} />
              {e.type === 'arc' ? (
                <>
                  <EditorField label="Radius" value={e.radius} onChange={(v) => setEl(i, { radius: v })} unit={u} messages={messagesAt(check, `${p}.radius`)} />
                  <EditorSelect
                    label="Turns"
                    value={e.direction}
                    onChange={(v) => setEl(i, { direction: v })}
                    options={[
                      { value: 'right', label: 'Right' },
                      { value: 'left', label: 'Left' },
                    ]}
                    width="w-24"
                  />
                </>
              ) : null}
              {e.type === 'spiral' ? <EditorSpiralFields element={e} path={p} units={u} check={check} onChange={(patch) => setEl(i, patch)} /> : null}
            </EditorRow>
          );
        })}
      </ol>
    </EditorSection>
  );
}
