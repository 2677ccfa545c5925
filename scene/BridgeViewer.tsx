'use client';

import { useMemo, useRef, useState } from 'react';
import { computeOffsetTable, formatLength, GeometryError, type BridgeDescription, type OffsetTable } from '@/lib/geometry';
import { frameForTable } from './builders/frame';
import { edgeWidthRange, overhangRuns } from './builders/runs';
import { defaultBracketSpacing } from './builders/brackets';
import { cameraPose, type ViewName } from './cameras';
import BridgeScene from './BridgeScene';
import Legend from './Legend';
import PointReadout from './PointReadout';

export interface BridgeViewerProps {
  description: BridgeDescription;
  table: OffsetTable;
  name: string;
  showStats?: boolean;
}

type Framing = 'designed' | 'chord' | 'curved';

const VIEWS: Array<{ view: ViewName; label: string }> = [
  { view: 'orbit', label: 'Free orbit' },
  { view: 'plan', label: 'Plan' },
  { view: 'edge', label: 'Along the edge' },
  { view: 'crew', label: 'Crew at a bent' },
];

function reframed(desc: BridgeDescription, layout: 'chord' | 'curved'): BridgeDescription {
  return { ...desc, girders: desc.girders.map((g) => ({ ...g, layout })) };
}

/** The 3D view of a stored bridge with its controls; the numbers all come from the engine. */
export default function BridgeViewer({ description, table, name, showStats = false }: BridgeViewerProps) {
  const units = table.units;
  const layouts = new Set(description.girders.map((g) => g.layout));
  const designed: Framing = layouts.size === 1 ? (layouts.has('curved') ? 'curved' : 'chord') : 'designed';
  const [framing, setFraming] = useState<Framing>(designed);
  const [exaggeration, setExaggeration] = useState(1);
  const [spacing, setSpacing] = useState(defaultBracketSpacing(units));
  const [view, setView] = useState<{ name: ViewName; version: number }>({ name: 'orbit', version: 0 });
  const [selected, setSelected] = useState<number | null>(null);
  const [showDeck, setShowDeck] = useState(true);
  const statsRef = useRef<HTMLDivElement>(null);

  const alt = useMemo((): { table: OffsetTable; desc: BridgeDescription } | { error: string } => {
    if (framing === designed) return { table, desc: description };
    const desc = framing === 'designed' ? description : reframed(description, framing);
    try {
      return { table: computeOffsetTable(desc), desc };
    } catch (err) {
      return { error: err instanceof GeometryError ? err.message : String(err) };
    }
  }, [framing, designed, description, table]);
  const shown = 'table' in alt ? alt : { table, desc: description };
  const altError = 'error' in alt ? alt.error : null;

  // The frame is fixed by the stored bridge so switching framing does not move the picture.
  const frame = useMemo(() => frameForTable(table, exaggeration), [table, exaggeration]);
  const range = useMemo((): [number, number] => {
    const a = edgeWidthRange(table);
    const b = edgeWidthRange(shown.table);
    return [Math.min(a[0], b[0]), Math.max(a[1], b[1])];
  }, [table, shown.table]);
  const pickable = useMemo(() => overhangRuns(shown.table).flatMap((r) => r.rows), [shown.table]);
  const pose = useMemo(() => cameraPose(view.name, shown.table, frame, units), [view, shown.table, frame, units]);
  const row = selected !== null ? (pickable[selected] ?? null) : null;
  const step = units === 'm' ? 0.1 : 0.5;
  const spacingMax = units === 'm' ? 3 : 10;
  const spacingMin = units === 'm' ? 0.6 : 2;

  return (
    <section aria-label={`3D view of ${name}`} className="space-y-4">
      <div className="relative h-[62vh] min-h-[420px] overflow-hidden rounded-lg border border-concrete-300 bg-[#dde4e6]" data-testid="scene-canvas">
        <BridgeScene
          desc={shown.desc}
          table={shown.table}
          frame={frame}
          widthRange={range}
          bracketSpacing={spacing}
          pose={pose}
          poseVersion={view.version}
          pickable={pickable}
          selected={selected}
          onSelect={setSelected}
          statsRef={showStats ? statsRef : undefined}
          showDeck={showDeck}
          label={`3D model of ${name}: girders, deck, overhang brackets and handrail`}
        />
        <div className="pointer-events-none absolute left-3 top-3 rounded bg-white/85 px-2 py-1 text-xs font-semibold text-concrete-800">
          {framing === 'curved' ? 'Curved girders' : framing === 'chord' ? 'Straight chord girders' : 'Girders as designed'}
          {exaggeration > 1 ? ` · elevations ×${exaggeration}` : ' · true scale'}
        </div>
        {showStats ? (
          <div
            ref={statsRef}
            data-testid="render-stats"
            data-draw-calls="0"
            data-triangles="0"
            data-frames="0"
            className="pointer-events-none absolute right-3 top-3 rounded bg-concrete-900/85 px-2 py-1 font-mono text-xs text-white"
          />
        ) : null}
      </div>

      <div className="grid gap-4 lg:grid-cols-[1fr_22rem]">
        <div className="card space-y-4 p-4">
          <fieldset>
            <legend className="field-label">Camera</legend>
            <div className="mt-1 flex flex-wrap gap-2">
              {VIEWS.map((v) => (
                <button
                  key={v.view}
                  type="button"
                  aria-pressed={view.name === v.view}
                  className={view.name === v.view ? 'btn-primary' : 'btn-secondary'}
                  onClick={() => setView((s) => ({ name: v.view, version: s.version + 1 }))}
                >
                  {v.label}
                </button>
              ))}
            </div>
          </fieldset>
          <div className="grid gap-4 sm:grid-cols-2">
            <label className="block">
              <span className="field-label">
                Vertical exaggeration: <span className="tabular">{exaggeration}×</span>
              </span>
              <input type="range" min={1} max={50} step={1} value={exaggeration} onChange={(e) => {
                  setExaggeration(Number(e.target.value));
                  // Elevations move with the exaggeration: keep the same view on the bridge.
                  setView((s) => ({ ...s, version: s.version + 1 }));
                }}
                className="mt-2 w-full accent-brand-600"
              />
            </label>
            <label className="block">
              <span className="field-label">
                Bracket spacing: <span className="tabular">{formatLength(spacing, units)}</span>
              </span>
              <input
                type="range"
                min={spacingMin}
                max={spacingMax}
                step={step}
                value={spacing}
                onChange={(e) => setSpacing(Number(e.target.value))}
                className="mt-2 w-full accent-brand-600"
              />
            </label>
          </div>
          <label className="flex items-center gap-2 text-sm">
            <input type="checkbox" checked={showDeck} onChange={(e) => setShowDeck(e.target.checked)} className="accent-brand-600" />
            Show the deck slab (clear it to see the girders, string lines and forms as before the pour)
          </label>
          <fieldset>
            <legend className="field-label">Girder framing (same deck)</legend>
            <div className="mt-1 flex flex-wrap gap-4 text-sm">
              {(layouts.size > 1 ? (['designed', 'chord', 'curved'] as Framing[]) : (['chord', 'curved'] as Framing[])).map((f) => (
                <label key={f} className="flex items-center gap-2">
                  <input type="radio" name="framing" value={f} checked={framing === f} onChange={() => { setFraming(f); setSelected(null); }} className="accent-brand-600" />
                  {f === 'chord' ? 'Straight chords' : f === 'curved' ? 'Curved girders' : 'As designed'}
                  {f === designed ? <span className="text-concrete-500">(as designed)</span> : null}
                </label>
              ))}
            </div>
            {altError ? (
              <p role="alert" className="mt-2 rounded border border-caution-500 bg-caution-100 p-2 text-sm text-caution-700">
                This deck cannot be framed that way: {altError}
              </p>
            ) : null}
          </fieldset>
          <label className="block">
            <span className="field-label">Girder point</span>
            <select className="field-input" value={selected ?? ''} onChange={(e) => setSelected(e.target.value === '' ? null : Number(e.target.value))}>
              <option value="">Choose a point…</option>
              {pickable.map((p, i) => (
                <option key={`${p.side}-${p.span}-${p.point}`} value={i}>
                  {`Span ${p.span} · ${p.girder} (${p.side}) · point ${p.point}`}
                </option>
              ))}
            </select>
          </label>
          <PointReadout row={row} units={units} />
        </div>
        <div className="card p-4">
          <Legend range={range} units={units} />
        </div>
      </div>
    </section>
  );
}
