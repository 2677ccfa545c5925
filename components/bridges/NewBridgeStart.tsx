'use client';

import { useState } from 'react';
import CopyBridgePicker from '@/components/bridges/CopyBridgePicker';
import LandXmlImport from '@/components/bridges/LandXmlImport';
import PasteDescription from '@/components/bridges/PasteDescription';
import type { RecordDraft } from '@/components/bridges/BridgeRecordFields';
import { landXmlDraft, starterDraft } from '@/lib/editor/new-bridge-drafts';
import type { Draft } from '@/lib/editor/draft';
import type { Units } from '@/lib/units';

/** Where a new bridge starts: a draft for the form editor, a line saying where it came from, record fields to carry over. */
export type Start = { draft: Draft; note: string; key: number; record?: Partial<RecordDraft> };

let starts = 0;

/** The first step of "New bridge": pick how to start. */
export default function NewBridgeStart({ onStart }: { onStart: (s: Start) => void }) {
  const [units, setUnits] = useState<Units>('ft');
  const begin = (draft: Draft, note: string, record?: Partial<RecordDraft>) => onStart({ draft, note, key: ++starts, record });
  const unitWords = units === 'm' ? 'metres' : 'feet';

  return (
    <div className="space-y-4" data-testid="new-bridge-start">
      <fieldset className="card p-4">
        <legend className="sr-only">Units of the new bridge</legend>
        <p className="field-label">Units of the new bridge</p>
        <div className="mt-2 flex gap-6">
          {(['ft', 'm'] as const).map((u) => (
            <label key={u} className="inline-flex items-center gap-2">
              <input type="radio" name="new-units" value={u} checked={units === u} onChange={() => setUnits(u)} className="h-4 w-4 accent-brand-600" />
              {u === 'ft' ? 'Feet (ft)' : 'Metres (m)'}
            </label>
          ))}
        </div>
        <p className="mt-1 text-sm text-concrete-600">For the starter bridge and a LandXML file. A copy keeps the units of the bridge it copies.</p>
      </fieldset>

      <div className="grid gap-4 lg:grid-cols-2">
        <section aria-labelledby="start-starter" className="card flex flex-col p-4">
          <h2 id="start-starter" className="text-lg font-bold text-concrete-900">
            Start from the starter bridge
          </h2>
          <p className="mt-1 flex-1 text-sm text-concrete-700">
            {units === 'm' ? 'Two 30 m spans on a 300 m radius curve' : 'Two 100 ft spans on a 1000 ft radius curve'}, four girder lines, a crest curve and a superelevation transition. Change any of
            it in the form editor.
          </p>
          <button type="button" className="btn-primary mt-3 self-start" onClick={() => begin(starterDraft(units), `Started from the starter bridge in ${unitWords}.`)}>
            Use the starter bridge
          </button>
        </section>

        <section aria-labelledby="start-copy" className="card p-4">
          <h2 id="start-copy" className="text-lg font-bold text-concrete-900">
            Copy an existing bridge
          </h2>
          <p className="mt-1 text-sm text-concrete-700">Its current geometry, route, district and contractor; give the copy its own name and structure number.</p>
          <CopyBridgePicker onPick={(draft, from, record) => begin(draft, `Copied from ${from} (its current revision).`, record)} />
        </section>
      </div>

      <section aria-labelledby="start-landxml" className="space-y-2">
        <h2 id="start-landxml" className="text-lg font-bold text-concrete-900">
          Start from a LandXML file
        </h2>
        <p className="text-sm text-concrete-700">The alignment and profile come from the file; the editor then asks for the cross slopes, deck, bent stations and girder offsets.</p>
        <LandXmlImport
          units={units}
          onApply={(item, fileName) =>
            begin(landXmlDraft(item, units, item.name || 'New bridge'), `Alignment${item.profile ? ' and profile' : ''} “${item.name}” read from ${fileName}; fill in the rest below.`)
          }
        />
      </section>

      <PasteDescription onOpen={(draft) => begin(draft, 'Opened the pasted description in the form editor.')} />
    </div>
  );
}
