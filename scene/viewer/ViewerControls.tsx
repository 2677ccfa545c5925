'use client';

import type { OffsetPoint } from '@/lib/geometry';
import { lengthText, type Units } from '@/lib/units';
import type { ViewName } from '../cameras';
import PointReadout from '../PointReadout';

export type Framing = 'designed' | 'chord' | 'curved';

export const VIEWS: Array<{ view: ViewName; label: string }> = [
  { view: 'orbit', label: 'Free orbit' },
  { view: 'plan', label: 'Plan' },
  { view: 'edge', label: 'Along the edge' },
  { view: 'crew', label: 'Crew at a bent' },
];

type Props = {
  units: Units;
  view: ViewName;
  onView: (v: ViewName) => void;
  exaggeration: number;
  onExaggeration: (v: number) => void;
  spacing: number;
  onSpacing: (v: number) => void;
  showDeck: boolean;
  onShowDeck: (v: boolean) => void;
  shadows: boolean;
  onShadows: (v: boolean) => void;
  framing: Framing;
  designed: Framing;
  framings: Framing[];
  onFraming: (f: Framing) => void;
  altError: string | null;
  pickable: readonly OffsetPoint[];
  selected: number | null;
  onSelect: (i: number | null) => void;
  children?: React.ReactNode;
};

/** The bridge view's controls: camera presets, exaggeration, bracket spacing, slab, shadows, framing, girder point. */
export default function ViewerControls(p: Props) {
  const u = p.units;
  const row = p.selected !== null ? (p.pickable[p.selected] ?? null) : null;
  return (
    <div className="card min-w-0 space-y-4 p-4">
      <fieldset>
        <legend className="field-label">Camera</legend>
        <div className="mt-1 flex flex-wrap gap-2">
          {VIEWS.map((v) => (
            <button key={v.view} type="button" aria-pressed={p.view === v.view} className={p.view === v.view ? 'btn-primary' : 'btn-secondary'} onClick={() => p.onView(v.view)}>
              {v.label}
            </button>
          ))}
        </div>
      </fieldset>
      <div className="grid gap-4 sm:grid-cols-2">
        <label className="block">
          <span className="field-label">
            Vertical exaggeration: <span className="tabular">{p.exaggeration}×</span>
          </span>
          <input type="range" min={1} max={50} step={1} value={p.exaggeration} onChange={(e) => p.onExaggeration(Number(e.target.value))} className="mt-2 w-full accent-brand-600" />
        </label>
        <label className="block">
          <span className="field-label">
            Bracket spacing: <span className="tabular">{lengthText(p.spacing, u)}</span>
          </span>
          <input
            type="range"
            min={u === 'm' ? 0.6 : 2}
            max={u === 'm' ? 3 : 10}
            step={u === 'm' ? 0.1 : 0.5}
            value={p.spacing}
            onChange={(e) => p.onSpacing(Number(e.target.value))}
            className="mt-2 w-full accent-brand-600"
          />
        </label>
      </div>
      {p.children}
      <div className="flex flex-wrap gap-x-6 gap-y-2 text-sm">
        <label className="flex items-center gap-2">
          <input type="checkbox" checked={p.showDeck} onChange={(e) => p.onShowDeck(e.target.checked)} className="accent-brand-600" />
          Show the deck slab (clear it to see the girders, string lines and forms as before the pour)
        </label>
        <label className="flex items-center gap-2">
          <input type="checkbox" checked={p.shadows} onChange={(e) => p.onShadows(e.target.checked)} className="accent-brand-600" />
          Sun shadows
        </label>
      </div>
      <fieldset>
        <legend className="field-label">Girder framing (same deck)</legend>
        <div className="mt-1 flex flex-wrap gap-4 text-sm">
          {p.framings.map((f) => (
            <label key={f} className="flex items-center gap-2">
              <input type="radio" name="framing" value={f} checked={p.framing === f} onChange={() => p.onFraming(f)} className="accent-brand-600" />
              {f === 'chord' ? 'Straight chords' : f === 'curved' ? 'Curved girders' : 'As designed'}
              {f === p.designed ? <span className="text-concrete-500">(as designed)</span> : null}
            </label>
          ))}
        </div>
        {p.altError ? (
          <p role="alert" className="mt-2 rounded border border-caution-500 bg-caution-100 p-2 text-sm text-caution-700">
            This deck cannot be framed that way: {p.altError}
          </p>
        ) : null}
      </fieldset>
      <label className="block">
        <span className="field-label">Girder point</span>
        <select className="field-input" value={p.selected ?? ''} onChange={(e) => p.onSelect(e.target.value === '' ? null : Number(e.target.value))}>
          <option value="">Choose a point…</option>
          {p.pickable.map((r, i) => (
            <option key={`${r.side}-${r.span}-${r.point}`} value={i}>
              {`Span ${r.span} · ${r.girder} (${r.side}) · point ${r.point}`}
            </option>
          ))}
        </select>
      </label>
      <PointReadout row={row} units={u} />
    </div>
  );
}
