'use client';

import { useMemo, useRef, useState } from 'react';
import { computeOffsetTable, GeometryError, type BridgeDescription, type OffsetTable } from '@/lib/geometry';
import { frameForTable } from './builders/frame';
import { edgeWidthRange, hasDeflections, overhangRuns, type PourState } from './builders/runs';
import { defaultBracketSpacing, defaultGirderShapeDepth } from './viewer/viewer-defaults';
import { cameraPose, type ViewName } from './cameras';
import BridgeScene from './BridgeScene';
import Legend from './Legend';
import ViewerControls, { VIEWS, type Framing } from './viewer/ViewerControls';
import PourControl, { THERMAL_DRAWN, viewerThermalBow } from './viewer/PourControl';
import SceneOverlayBar from './viewer/SceneOverlayBar';
import { usePresenter, useArrowSteps } from './presenter';
import { usePictureSaver } from './viewer/use-picture-saver';
import type { PictureFn } from './objects/PictureTaker';

export interface BridgeViewerProps {
  description: BridgeDescription;
  table: OffsetTable;
  name: string;
  revision?: number;
  showStats?: boolean;
  /** Start with the sun's shadows off (the benchmark compares both). */
  noShadows?: boolean;
}

/** Heights are raised this much in the views along the edge, so the corner at each bent shows. */
export const KINK_EXAGGERATION = 8;

function reframed(desc: BridgeDescription, layout: 'chord' | 'curved'): BridgeDescription {
  return { ...desc, girders: desc.girders.map((g) => ({ ...g, layout })) };
}

/** The 3D view of a stored bridge with its controls; the numbers all come from the engine. */
export default function BridgeViewer({ description, table, name, revision, showStats = false, noShadows = false }: BridgeViewerProps) {
  const units = table.units;
  const layouts = new Set(description.girders.map((g) => g.layout));
  const designed: Framing = layouts.size === 1 ? (layouts.has('curved') ? 'curved' : 'chord') : 'designed';
  const [framing, setFraming] = useState<Framing>(designed);
  const [exaggeration, setExaggerationState] = useState(1);
  const [spacing, setSpacing] = useState(defaultBracketSpacing(units));
  const [view, setView] = useState<{ name: ViewName; version: number }>({ name: 'orbit', version: 0 });
  const [selected, setSelected] = useState<number | null>(null);
  const [showDeck, setShowDeck] = useState(true);
  const [shadows, setShadows] = useState(!noShadows);
  const [pourValue, setPourValue] = useState(0);
  const [deltaT, setDeltaT] = useState(0);
  const [showControls, setShowControls] = useState(false);
  const statsRef = useRef<HTMLDivElement>(null);
  const rootRef = useRef<HTMLElement>(null);
  const pictureRef = useRef<PictureFn | null>(null);
  const presenter = usePresenter(rootRef);

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
  const deflected = useMemo(() => hasDeflections(shown.table), [shown.table]);
  const maxDeflection = useMemo(() => (deflected ? Math.max(...shown.table.points.map((p) => p.deflection ?? 0)) : 0), [deflected, shown.table]);
  const pour = useMemo((): PourState => ({ pour: deflected ? pourValue : 0 }), [deflected, pourValue]);
  const typicalSpan = (description.bents[description.bents.length - 1].station - description.bents[0].station) / Math.max(1, description.bents.length - 1);
  const bow = viewerThermalBow(units, deltaT, typicalSpan, defaultGirderShapeDepth(units));
  const edgeView = view.name === 'edge' || view.name === 'crew';

  const setExaggeration = (v: number) => {
    setExaggerationState(v);
    // Elevations move with the exaggeration: keep the same view on the bridge.
    setView((s) => ({ ...s, version: s.version + 1 }));
  };
  const chooseView = (v: ViewName) => {
    // Along the edge the corner at each bent is a few hundredths of a foot over a span: raise the heights.
    if ((v === 'edge' || v === 'crew') && !(view.name === 'edge' || view.name === 'crew')) setExaggerationState(KINK_EXAGGERATION);
    if (!(v === 'edge' || v === 'crew') && exaggeration === KINK_EXAGGERATION) setExaggerationState(1);
    setView((s) => ({ name: v, version: s.version + 1 }));
  };
  const viewLabel = VIEWS.find((v) => v.view === view.name)?.label ?? 'Free orbit';
  useArrowSteps((d) => {
    if (!presenter.presenting) return;
    const i = VIEWS.findIndex((v) => v.view === view.name);
    chooseView(VIEWS[(i + d + VIEWS.length) % VIEWS.length].view);
  });
  const saver = usePictureSaver(pictureRef, { bridge: name, revision: revision ?? null, view: viewLabel, exaggeration });
  const controlsShown = !presenter.presenting || showControls;

  return (
    <section
      ref={rootRef}
      aria-label={`3D view of ${name}`}
      data-presenting={presenter.presenting ? 'true' : 'false'}
      className={presenter.presenting ? 'fixed inset-0 z-50 flex flex-col gap-3 overflow-y-auto bg-concrete-900 p-3 text-lg' : 'space-y-4'}
    >
      {/* On a phone held upright the picture is about square: a tall, narrow one makes the overviews back far away. */}
      <div
        className={`relative overflow-hidden rounded-lg border border-concrete-300 bg-[#dde4e6] ${presenter.presenting ? 'min-h-[60vh] flex-1' : 'h-[min(62vh,100vw)] min-h-[320px] sm:h-[62vh] sm:min-h-[420px]'}`}
        data-testid="scene-canvas"
      >
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
          shadows={shadows}
          pour={pour}
          verticalBow={deflected ? 0 : bow * THERMAL_DRAWN}
          large={presenter.presenting}
          pictureRef={pictureRef}
          label={`3D model of ${name}: girders, deck, overhang brackets and handrail`}
        />
        <SceneOverlayBar
          framingText={framing === 'curved' ? 'Curved girders' : framing === 'chord' ? 'Straight chord girders' : 'Girders as designed'}
          exaggeration={exaggeration}
          edgeView={edgeView}
          kinkExaggeration={KINK_EXAGGERATION}
          onExaggeration={setExaggeration}
          large={presenter.presenting}
        />
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

      <div className={`flex flex-wrap items-center gap-2 ${presenter.presenting ? 'text-white' : ''}`}>
        {presenter.presenting ? (
          <>
            <button type="button" className="btn-secondary" onClick={() => chooseView(VIEWS[(VIEWS.findIndex((v) => v.view === view.name) + VIEWS.length - 1) % VIEWS.length].view)}>
              ← Previous view
            </button>
            <span className="font-semibold">{viewLabel}</span>
            <button type="button" className="btn-secondary" onClick={() => chooseView(VIEWS[(VIEWS.findIndex((v) => v.view === view.name) + 1) % VIEWS.length].view)}>
              Next view →
            </button>
            <button type="button" className="btn-secondary" aria-expanded={showControls} onClick={() => setShowControls((s) => !s)}>
              {showControls ? 'Hide controls' : 'Show controls'}
            </button>
          </>
        ) : null}
        <button type="button" className="btn-secondary" onClick={saver.save} disabled={saver.busy}>
          Save picture
        </button>
        <button type="button" className="btn-secondary" onClick={presenter.presenting ? presenter.stop : presenter.start}>
          {presenter.presenting ? 'Leave presenter mode' : 'Presenter mode'}
        </button>
        <span role="status" className={`text-sm ${presenter.presenting ? 'text-concrete-100' : 'text-concrete-600'}`} data-testid="picture-status">
          {saver.message}
        </span>
      </div>

      {controlsShown ? (
        <div className="grid gap-4 lg:grid-cols-[minmax(0,1fr)_22rem]">
          <ViewerControls
            units={units}
            view={view.name}
            onView={chooseView}
            exaggeration={exaggeration}
            onExaggeration={setExaggeration}
            spacing={spacing}
            onSpacing={setSpacing}
            showDeck={showDeck}
            onShowDeck={setShowDeck}
            shadows={shadows}
            onShadows={setShadows}
            framing={framing}
            designed={designed}
            framings={layouts.size > 1 ? ['designed', 'chord', 'curved'] : ['chord', 'curved']}
            onFraming={(f) => {
              setFraming(f);
              setSelected(null);
            }}
            altError={altError}
            pickable={pickable}
            selected={selected}
            onSelect={setSelected}
          >
            <PourControl units={units} maxDeflection={maxDeflection} pour={pourValue} onPour={setPourValue} deltaT={deltaT} onDeltaT={setDeltaT} bow={bow} />
          </ViewerControls>
          <div className="card min-w-0 p-4">
            <Legend range={range} units={units} deflection={maxDeflection} />
          </div>
        </div>
      ) : null}
    </section>
  );
}
