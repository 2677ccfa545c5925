'use client';

import { useEffect, useMemo, useRef, useState, type ReactNode } from 'react';
import {
  computeOffsetTable,
  formatFeetInches,
  formatLength,
  GeometryError,
  thermalBowInches,
  type OffsetPoint,
  type OffsetTable,
} from '@/lib/geometry';
import { DEFAULT_SANDBOX, SANDBOX_GIRDER_DEPTH_IN, SANDBOX_LIMITS, sandboxBridge, type SandboxSettings } from '@/lib/scene-data/sandbox';
import { frameForTable, sceneY, type SceneFrame } from '@/scene/builders/frame';
import { edgeWidthRange } from '@/scene/builders/runs';
import { defaultBracketSpacing } from '@/scene/builders/brackets';
import { cameraPose, type ViewName } from '@/scene/cameras';
import type { SceneOverlay } from '@/scene/BridgeScene';
import LazyBridgeScene from '@/scene/LazyBridgeScene';
import EdgeWidthSummary from '@/scene/EdgeWidthSummary';
import Legend from '@/scene/Legend';
import NoWebGL from '@/scene/NoWebGL';

/** The curve turns right, so the left overhang is on the outside of the curve. */
const OUTSIDE = 'left';
const INSIDE = 'right';
/** The span the walkthrough looks at: the middle one, with a bent at each end. */
const SPAN = 2;

interface Step {
  title: string;
  view: ViewName;
  exaggeration: number;
  sweep?: boolean;
  thermal?: boolean;
  straightedge?: boolean;
  /** Hide the slab: the forms and girders as the crew sees them before the pour. */
  noDeck?: boolean;
}

const STEPS: Step[] = [
  { title: 'Where the edge width changes, and why', view: 'span', exaggeration: 1 },
  { title: 'Why the forms kink at every bent', view: 'edge', exaggeration: 1 },
  { title: 'Measure from a string line, not the girder', view: 'string', exaggeration: 1, sweep: true, noDeck: true },
  { title: 'Why absolute elevations drift with the sun', view: 'side', exaggeration: 1, thermal: true },
  { title: 'Never extend the deck forms with a straightedge', view: 'section', exaggeration: 5, straightedge: true, noDeck: true },
];

/** Drawn-size factors for effects too small to see true size. */
const SWEEP_DRAWN = 12;
const THERMAL_DRAWN = 100;

const ft = (v: number) => formatLength(v, 'ft');
const inches = (v: number) => `${v.toFixed(2)} in`;

function rowsOf(table: OffsetTable, side: 'left' | 'right', span: number): OffsetPoint[] {
  return table.points.filter((p) => p.side === side && p.span === span).sort((a, b) => a.point - b.point);
}

/** Angle in degrees between the plan directions of two girder runs (end to end). */
function turnBetween(a: OffsetPoint[], b: OffsetPoint[]): number {
  if (a.length < 2 || b.length < 2) return 0;
  const ax = a[a.length - 1].x - a[0].x;
  const ay = a[a.length - 1].y - a[0].y;
  const bx = b[b.length - 1].x - b[0].x;
  const by = b[b.length - 1].y - b[0].y;
  const c = (ax * bx + ay * by) / (Math.hypot(ax, ay) * Math.hypot(bx, by));
  return (Math.acos(Math.min(1, Math.max(-1, c))) * 180) / Math.PI;
}

function Slider(props: { label: string; value: number; text: string; min: number; max: number; step: number; onChange: (v: number) => void }) {
  return (
    <label className="block">
      <span className="field-label">
        {props.label}: <span className="tabular">{props.text}</span>
      </span>
      <input type="range" min={props.min} max={props.max} step={props.step} value={props.value} onChange={(e) => props.onChange(Number(e.target.value))} className="mt-2 w-full accent-brand-600" />
    </label>
  );
}

/** The guided training walkthrough over a sandbox bridge that the engine recomputes live. */
export default function Walkthrough() {
  const [settings, setSettings] = useState<SandboxSettings>(DEFAULT_SANDBOX);
  const [stepIndex, setStepIndex] = useState(0);
  const [exaggeration, setExaggeration] = useState(STEPS[0].exaggeration);
  const [deltaT, setDeltaT] = useState(20);
  const [poseVersion, setPoseVersion] = useState(0);
  const lastGood = useRef<{ table: OffsetTable; desc: ReturnType<typeof sandboxBridge>; settings: SandboxSettings } | null>(null);
  const step = STEPS[stepIndex];

  const desc = useMemo(() => sandboxBridge(settings), [settings]);
  const computed = useMemo(() => {
    try {
      return { table: computeOffsetTable(desc), error: null as string | null };
    } catch (err) {
      return { table: null, error: err instanceof GeometryError ? err.message : String(err) };
    }
  }, [desc]);
  if (computed.table) lastGood.current = { table: computed.table, desc, settings };
  const shown = lastGood.current ?? { table: computeOffsetTable(sandboxBridge(DEFAULT_SANDBOX)), desc: sandboxBridge(DEFAULT_SANDBOX), settings: DEFAULT_SANDBOX };
  const table = shown.table;
  // Every number in the steps comes from the deck in the picture: the last one the engine could build.
  const built = shown.settings;

  const frame: SceneFrame = useMemo(() => frameForTable(table, exaggeration), [table, exaggeration]);
  const range = useMemo(() => edgeWidthRange(table), [table]);
  const pose = useMemo(
    () => cameraPose(step.view, table, frame, 'ft', { span: step.view === 'section' || step.view === 'string' ? 1 : SPAN, side: OUTSIDE }),
    [step.view, table, frame],
  );

  const go = (i: number) => {
    const k = Math.max(0, Math.min(STEPS.length - 1, i));
    setStepIndex(k);
    setExaggeration(STEPS[k].exaggeration);
    setPoseVersion((v) => v + 1);
  };
  // Arrow keys move between steps from anywhere on the page, except while a slider, a field or a
  // radio button has the keys for itself.
  const goRef = useRef(go);
  goRef.current = go;
  const stepRef = useRef(stepIndex);
  stepRef.current = stepIndex;
  useEffect(() => {
    const onKey = (e: globalThis.KeyboardEvent) => {
      if (e.defaultPrevented || e.altKey || e.ctrlKey || e.metaKey || e.shiftKey) return;
      const t = e.target as HTMLElement | null;
      if (t && (t.isContentEditable || ['INPUT', 'SELECT', 'TEXTAREA'].includes(t.tagName))) return;
      if (e.key === 'ArrowRight') {
        e.preventDefault();
        goRef.current(stepRef.current + 1);
      } else if (e.key === 'ArrowLeft') {
        e.preventDefault();
        goRef.current(stepRef.current - 1);
      }
    };
    window.addEventListener('keydown', onKey);
    return () => window.removeEventListener('keydown', onKey);
  }, []);
  const set = (patch: Partial<SandboxSettings>) => {
    setSettings((s) => ({ ...s, ...patch }));
    // The bridge's centre moves with its size: bring the camera along.
    setPoseVersion((v) => v + 1);
  };

  // Numbers every step talks about, all from the engine's table for the current sliders.
  const summary = (side: 'left' | 'right') => table.span_summaries.find((s) => s.span === SPAN && s.side === side);
  const outside = summary(OUTSIDE);
  const inside = summary(INSIDE);
  const outRows = rowsOf(table, OUTSIDE, SPAN);
  const prevRows = rowsOf(table, OUTSIDE, SPAN - 1);
  const girderLength = outRows.length > 1 ? Math.hypot(outRows[outRows.length - 1].x - outRows[0].x, outRows[outRows.length - 1].y - outRows[0].y) : 0;
  const turn = turnBetween(prevRows, outRows);
  const chordOrdinate = (built.spanLength * built.spanLength) / (8 * built.radius);
  const askedOrdinate = (settings.spanLength * settings.spanLength) / (8 * settings.radius);
  const sweepLimitIn = (girderLength / 10) * 0.125;
  const bowIn = thermalBowInches('steel', deltaT, built.spanLength, SANDBOX_GIRDER_DEPTH_IN);
  const layoutIsChord = (shown.desc.girders[0]?.layout ?? 'chord') === 'chord';

  // The straightedge: the deck form's grade from the next girder in, carried out past the exterior
  // girder with a 1/4 in error where it rests on the exterior girder.
  const straight = useMemo(() => {
    // At the start of span 1, where the section view looks.
    const mid = rowsOf(table, OUTSIDE, 1)[0];
    if (!mid) return null;
    const inner = table.points.find((p) => p.span === 1 && p.girder === 'G2' && p.point === mid.point);
    if (!inner || mid.edge_width === null || mid.form_target === null || mid.edge_x === null || mid.edge_y === null) return null;
    const bay = Math.hypot(mid.x - inner.x, mid.y - inner.y);
    const error = 0.25 / 12;
    const slope = (mid.bottom_of_slab + error - inner.bottom_of_slab) / bay;
    const atEdge = mid.bottom_of_slab + error + slope * mid.edge_width;
    return { bay, error, atEdge, target: mid.form_target, magnified: (error * (bay + mid.edge_width)) / bay, mid, inner };
  }, [table]);

  const overlays: SceneOverlay[] = useMemo(() => {
    if (!step.straightedge || !straight) return [];
    const { mid, inner, error, atEdge } = straight;
    // Lying on the forms: lifted by about its own thickness (true size) so it shows above them.
    const lift = 0.2;
    const p = (x: number, y: number, z: number) => [x - frame.originX, sceneY(frame, z) + lift, -(y - frame.originY)];
    const ex = mid.edge_x as number;
    const ey = mid.edge_y as number;
    const a = p(inner.x, inner.y, inner.bottom_of_slab);
    const b = p(mid.x, mid.y, mid.bottom_of_slab + error);
    const c = p(ex, ey, atEdge);
    const g = p(mid.x, mid.y, mid.bottom_of_slab);
    const f = p(ex, ey, mid.form_target as number);
    return [
      { positions: new Float32Array([...a, ...b, ...b, ...c]), color: '#d98e04' },
      { positions: new Float32Array([...g, ...f]), color: '#17695d' },
    ];
  }, [step.straightedge, straight, frame]);

  const body: ReactNode[] = [
    <>
      <p>
        Precast girders are straight from bent to bent. The deck edge follows the curve. So the distance from the girder to the edge — the{' '}
        <strong>edge width</strong> — changes along every span.
      </p>
      {layoutIsChord && outside && inside ? (
        <p>
          In span {SPAN} of this bridge the outside overhang runs from <strong className="tabular">{ft(outside.min_edge_width)}</strong> at the bents to{' '}
          <strong className="tabular">{ft(outside.max_edge_width)}</strong> at midspan
          {Math.abs(outside.min_edge_width - built.overhang) >= 0.005
            ? ` (at the bents a touch more than the ${ft(built.overhang)} set there: the width is measured square to the girder, which meets the bent at a slight angle to the curve)`
            : ''}
          ; the inside one from{' '}
          <strong className="tabular">{ft(inside.max_edge_width)}</strong> down to <strong className="tabular">{ft(inside.min_edge_width)}</strong>. The swing is
          about the chord&apos;s middle ordinate, span² ÷ (8 × radius) = <span className="tabular">{ft(chordOrdinate)}</span>. Tighter curves and longer spans swing more.
        </p>
      ) : (
        <p>With curved girders the girder follows the curve too, so the edge width stays the same all along. Switch the girders back to straight chords to see it change.</p>
      )}
      <p>The colour along the edge shows the width: the legend gives it in feet.</p>
    </>,
    <>
      <p>
        Each span&apos;s brackets hang square to that span&apos;s girder. At a bent two straight girders meet at an angle, so the bracket ends, the handrail posts
        and the rail turn a corner there. The line looks peaked even when every grade is right.
      </p>
      {layoutIsChord ? (
        <p>
          Here the exterior girder turns <strong className="tabular">{turn.toFixed(2)}°</strong> at each pier. Shorter spans on a tighter curve make the corner sharper but
          spread it over more bents; try the span and radius sliders and watch the rail.
        </p>
      ) : (
        <p>Curved girders bend with the deck, so there is no corner at the piers. Switch to straight chords to see the kink.</p>
      )}
      <p>Do not fair the forms to &quot;fix&quot; the look: set every bracket to its own numbers.</p>
    </>,
    <>
      <p>
        Long concrete girders are never perfectly straight: they bow sideways (sweep). A common limit is about 1/8 in per 10 ft of length (from memory of precast
        tolerances) — for this <span className="tabular">{ft(girderLength)}</span> girder up to <strong className="tabular">{inches(sweepLimitIn)}</strong>.
      </p>
      <p>
        The edge widths are measured from the girder&apos;s straight centreline between its end centres. Stretch a <strong>string line</strong> (red) between the centres
        of the girder ends and measure from the string. Measuring from the bowed girder would copy the bow into the deck edge. The bow here is drawn {SWEEP_DRAWN}× its
        size so you can see it.
      </p>
    </>,
    <>
      <p>
        The sun warms the top flange of a steel girder more than the bottom, and the girder bows up. Rise at midspan = α × ΔT × L² ÷ (8 × depth), with α = 6.5 × 10⁻⁶
        per °F for steel.
      </p>
      <Slider label="Top flange warmer than bottom by" value={deltaT} text={`${deltaT} °F`} min={0} max={40} step={1} onChange={setDeltaT} />
      <p>
        For this {ft(built.spanLength)} span on a {SANDBOX_GIRDER_DEPTH_IN} in steel girder that is <strong className="tabular">{inches(bowIn)}</strong> (
        <span className="tabular">{formatFeetInches(bowIn / 12)}</span>). A form set in the cool morning to an elevation from the table is off by that much by
        afternoon. A reading from the top of the girder — the drop from girder top — moves with the girder and stays right. In the picture the girders and brackets rise
        ({THERMAL_DRAWN}× drawn) while the white form-target line, an absolute elevation, stays put.
      </p>
    </>,
    <>
      <p>
        An old habit: lay a straightedge on the deck forms and carry their grade out to set the overhang. Any error in the deck forms grows on the way out, and the
        overhang is not on that grade anyway — the slab changes thickness to the edge and is level under the barrier.
      </p>
      {straight ? (
        <p>
          With the deck form just 1/4 in high at the exterior girder and the next girder {ft(straight.bay)} in, the error at the edge is already{' '}
          <strong className="tabular">{inches(straight.magnified * 12)}</strong>, and the straightedge (amber bar) puts the form edge at{' '}
          <strong className="tabular">{formatLength(straight.atEdge, 'ft')}</strong> where the table says <strong className="tabular">{formatLength(straight.target, 'ft')}</strong> (green bar): off by{' '}
          <strong className="tabular">{inches(Math.abs(straight.atEdge - straight.target) * 12)}</strong>. Always go back to the girder: the buildup and the drop from girder top.
          (Elevations drawn 5×, the slab left off so the forms show.)
        </p>
      ) : null}
    </>,
  ];

  const sceneFallback = <NoWebGL />;

  return (
    <div className="space-y-4">
      {/* On a wide screen the step's words sit beside the picture they talk about. */}
      <div className="grid items-start gap-4 xl:grid-cols-[minmax(0,1fr)_24rem]">
        <div className="relative h-[56vh] min-h-[380px] overflow-hidden rounded-lg border border-concrete-300 bg-[#dde4e6] xl:sticky xl:top-4" data-testid="scene-canvas">
          <LazyBridgeScene
            fallback={sceneFallback}
            desc={shown.desc}
            table={table}
            frame={frame}
            widthRange={range}
            bracketSpacing={defaultBracketSpacing('ft')}
            pose={pose}
            poseVersion={poseVersion}
            pickable={[]}
            selected={null}
            onSelect={() => {}}
            sweep={step.sweep ? (sweepLimitIn / 12) * SWEEP_DRAWN : 0}
            verticalBow={step.thermal ? (bowIn / 12) * THERMAL_DRAWN : 0}
            overlays={overlays}
            showDeck={!step.noDeck}
            stationEvery={0}
            label="Training bridge in 3D"
          />
          <div className="pointer-events-none absolute left-3 top-3 rounded bg-white/85 px-2 py-1 text-xs font-semibold text-concrete-800">
            Step {stepIndex + 1} of {STEPS.length} · {exaggeration > 1 ? `elevations ×${exaggeration}` : 'true scale'}
            {step.noDeck ? ' · before the pour (no slab)' : ''}
          </div>
        </div>

        <section aria-labelledby="step-title" className="card space-y-3 p-4" data-testid="walkthrough-step">
          <ol className="flex flex-wrap gap-2" aria-label="Steps">
            {STEPS.map((s, i) => (
              <li key={s.title}>
                <button
                  type="button"
                  onClick={() => go(i)}
                  aria-current={i === stepIndex ? 'step' : undefined}
                  aria-label={`Step ${i + 1}: ${s.title}`}
                  className={`h-8 w-8 rounded-full text-sm font-semibold ${i === stepIndex ? 'bg-brand-600 text-white' : 'bg-concrete-100 text-concrete-700 hover:bg-concrete-200'}`}
                >
                  {i + 1}
                </button>
              </li>
            ))}
          </ol>
          <h2 id="step-title" className="text-xl font-bold text-concrete-900">
            {step.title}
          </h2>
          {computed.error ? (
            <p className="rounded border border-caution-500 bg-caution-100 p-2 text-sm text-caution-700" data-testid="walkthrough-stale">
              The sliders ask for a deck the engine cannot build, so the picture and these numbers are for the last one that worked: radius {ft(built.radius)}, span{' '}
              {ft(built.spanLength)}, overhang {ft(built.overhang)}.
            </p>
          ) : null}
          <div className="space-y-3 text-concrete-800">{body[stepIndex]}</div>
          <div className="flex items-center justify-between gap-2 pt-2">
            <button type="button" className="btn-secondary" onClick={() => go(stepIndex - 1)} disabled={stepIndex === 0}>
              Back
            </button>
            <span className="text-sm text-concrete-500">Arrow keys move between steps</span>
            <button type="button" className="btn-primary" onClick={() => go(stepIndex + 1)} disabled={stepIndex === STEPS.length - 1}>
              Next
            </button>
          </div>
        </section>
      </div>

      <div className="grid items-start gap-4 xl:grid-cols-[22rem_minmax(0,1fr)]">
        <section aria-label="Sandbox bridge" className="card space-y-4 p-4">
          <h2 className="font-semibold text-concrete-900">Sandbox bridge (three spans, curve to the right)</h2>
          <Slider label="Curve radius" value={settings.radius} text={ft(settings.radius)} {...SANDBOX_LIMITS.radius} onChange={(v) => set({ radius: v })} />
          <Slider label="Span length" value={settings.spanLength} text={ft(settings.spanLength)} {...SANDBOX_LIMITS.spanLength} onChange={(v) => set({ spanLength: v })} />
          <Slider label="Overhang at the bents" value={settings.overhang} text={ft(settings.overhang)} {...SANDBOX_LIMITS.overhang} onChange={(v) => set({ overhang: v })} />
          <Slider
            label="Cross slope"
            value={settings.crossSlope}
            text={`${(settings.crossSlope * 100).toFixed(1)} %`}
            {...SANDBOX_LIMITS.crossSlope}
            onChange={(v) => set({ crossSlope: v })}
          />
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
          <Slider
            label="Vertical exaggeration"
            value={exaggeration}
            text={`${exaggeration}×`}
            min={1}
            max={50}
            step={1}
            onChange={(v) => {
              setExaggeration(v);
              setPoseVersion((n) => n + 1);
            }}
          />
          {computed.error ? (
            <div role="alert" className="space-y-1 rounded border border-caution-500 bg-caution-100 p-2 text-sm text-caution-700">
              {settings.layout === 'chord' && askedOrdinate >= settings.overhang ? (
                <p>
                  The straight inside girder would cross the deck edge at midspan: a {ft(settings.spanLength)} chord on a {ft(settings.radius)} radius bows{' '}
                  {ft(askedOrdinate)} away from the curve (span² ÷ (8 × radius)), more than the {ft(settings.overhang)} overhang. Designers shorten the spans, widen
                  the overhang or curve the girders.
                </p>
              ) : null}
              <p>The engine cannot build this deck, so the picture shows the last one that worked. {computed.error}</p>
            </div>
          ) : null}
        </section>
        <div className="space-y-4">
          <div className="card p-4">
            <Legend range={range} units="ft" points={false} />
          </div>
          <EdgeWidthSummary table={table} caption="Edge width per span, sandbox bridge (from the engine)" />
        </div>
      </div>
    </div>
  );
}
