'use client';

import EditorField from '@/components/editor/EditorField';
import EditorRow from '@/components/editor/EditorRow';
import EditorSection from '@/components/editor/EditorSection';
import { messagesAt, messagesUnder } from '@/lib/editor/check-draft';
import { moveItem, newKey, type PviDraft } from '@/lib/editor/draft';
import type { SectionProps } from '@/lib/editor/section-props';

/** Profile grade line: PVIs in station order, each with an optional symmetric vertical curve. */
export default function EditorProfileSection({ draft, update, check, request = null }: SectionProps & { request?: string[] | null }) {
  const u = draft.units;
  const set = (pvis: PviDraft[]) => update((d) => ({ ...d, pvis }));
  const setRow = (i: number, patch: Partial<PviDraft>) => set(draft.pvis.map((p, j) => (j === i ? { ...p, ...patch } : p)));
  const stationHint = u === 'm' ? '1+234.567' : '12+34.56';
  return (
    <EditorSection
      id="profile"
      title="Profile"
      intro="Points of vertical intersection in station order. A vertical curve length L runs a parabola from L/2 before to L/2 after the PVI; leave it blank for none."
      messages={messagesAt(check, 'profile').concat(messagesAt(check, 'profile.pvis'))}
      addLabel="Add PVI"
      onAdd={() => set([...draft.pvis, { key: newKey('pvi'), station: '', elevation: '', curve_length: '', rest: {} }])}
    >
      {request ? (
        <div role="alert" className="mb-3 rounded-md border border-caution-500 bg-caution-100 p-3 text-sm text-caution-700" data-testid="profile-request">
          <p className="font-semibold">{request[0]}</p>
          {request.length > 1 ? (
            <ul className="mt-1 list-disc pl-5">
              {request.slice(1).map((r) => (
                <li key={r}>{r}</li>
              ))}
            </ul>
          ) : null}
        </div>
      ) : null}
      <ol className="space-y-2">
        {draft.pvis.map((v, i) => {
          const p = `profile.pvis.${i}`;
          return (
            <EditorRow
              key={v.key}
              title={`PVI ${i + 1}`}
              index={i}
              count={draft.pvis.length}
              minRows={1}
              onMove={(to) => set(moveItem(draft.pvis, i, to))}
              onRemove={() => set(draft.pvis.filter((_, j) => j !== i))}
              messages={messagesUnder(check, p, [`${p}.station`, `${p}.elevation`, `${p}.curve_length`])}
            >
              <EditorField
                label="Station"
                value={v.station}
                onChange={(x) => setRow(i, { station: x })}
                placeholder={stationHint}
                unit={draft.units}
                width="w-36 sm:w-40"
                messages={messagesAt(check, `${p}.station`)}
              />
              <EditorField label="Elevation" value={v.elevation} onChange={(x) => setRow(i, { elevation: x })} unit={u} width="w-32" messages={messagesAt(check, `${p}.elevation`)} />
              <EditorField
                label="Vertical curve length"
                value={v.curve_length}
                onChange={(x) => setRow(i, { curve_length: x })}
                unit={u}
                width="w-40"
                placeholder="none"
                messages={messagesAt(check, `${p}.curve_length`)}
              />
            </EditorRow>
          );
        })}
      </ol>
    </EditorSection>
  );
}
