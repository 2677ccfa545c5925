'use client';

import { SANDBOX_LIMITS, type SandboxSettings } from '@/lib/scene-data/sandbox';
import Slider from './Slider';
import { ft } from './walkthrough-numbers';

type Props = {
  settings: SandboxSettings;
  set: (patch: Partial<SandboxSettings>) => void;
  exaggeration: number;
  setExaggeration: (v: number) => void;
  /** The engine's message when the sliders ask for a deck it cannot build. */
  error: string | null;
};

/** The sandbox bridge's sliders and choices, and why a deck the engine refuses cannot be built. */
export default function SandboxControls({ settings, set, exaggeration, setExaggeration, error }: Props) {
  const askedOrdinate = (settings.spanLength * settings.spanLength) / (8 * settings.radius);
  return (
    <section aria-label="Sandbox bridge" className="card min-w-0 space-y-4 p-4">
      <h2 className="font-semibold text-concrete-900">Sandbox bridge (three spans, curve to the right)</h2>
      <Slider label="Curve radius" value={settings.radius} text={ft(settings.radius)} {...SANDBOX_LIMITS.radius} onChange={(v) => set({ radius: v })} />
      <Slider label="Span length" value={settings.spanLength} text={ft(settings.spanLength)} {...SANDBOX_LIMITS.spanLength} onChange={(v) => set({ spanLength: v })} />
      <Slider label="Overhang at the bents" value={settings.overhang} text={ft(settings.overhang)} {...SANDBOX_LIMITS.overhang} onChange={(v) => set({ overhang: v })} />
      <Slider label="Cross slope" value={settings.crossSlope} text={`${(settings.crossSlope * 100).toFixed(1)} %`} {...SANDBOX_LIMITS.crossSlope} onChange={(v) => set({ crossSlope: v })} />
      <fieldset>
        <legend className="field-label">Section</legend>
        <div className="mt-1 flex flex-wrap gap-4 text-sm">
          {(['crown', 'banked'] as const).map((v) => (
            <label key={v} className="flex items-center gap-2">
              <input type="radio" name="section" checked={settings.section === v} onChange={() => set({ section: v })} className="accent-brand-600" />
              {v === 'crown' ? 'Normal crown' : 'Banked to the inside'}
            </label>
          ))}
        </div>
      </fieldset>
      <fieldset>
        <legend className="field-label">Girders</legend>
        <div className="mt-1 flex flex-wrap gap-4 text-sm">
          {(['chord', 'curved'] as const).map((v) => (
            <label key={v} className="flex items-center gap-2">
              <input type="radio" name="layout" checked={settings.layout === v} onChange={() => set({ layout: v })} className="accent-brand-600" />
              {v === 'chord' ? 'Straight chords (precast)' : 'Curved (steel)'}
            </label>
          ))}
        </div>
      </fieldset>
      <Slider label="Vertical exaggeration" value={exaggeration} text={`${exaggeration}×`} min={1} max={50} step={1} onChange={setExaggeration} />
      {error ? (
        <div role="alert" className="space-y-1 rounded border border-caution-500 bg-caution-100 p-2 text-sm text-caution-700">
          {settings.layout === 'chord' && askedOrdinate >= settings.overhang ? (
            <p>
              The straight inside girder would cross the deck edge at midspan: a {ft(settings.spanLength)} chord on a {ft(settings.radius)} radius bows {ft(askedOrdinate)} away from the curve (span² ÷
              (8 × radius)), more than the {ft(settings.overhang)} overhang. Designers shorten the spans, widen the overhang or curve the girders.
            </p>
          ) : null}
          <p>The engine cannot build this deck, so the picture shows the last one that worked. {error}</p>
        </div>
      ) : null}
    </section>
  );
}
