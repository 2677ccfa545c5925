'use client';

import { useMemo, useRef, useState } from 'react';
import type { SandboxSettings } from '@/lib/scene-data/sandbox';
import { frameForTable, type SceneFrame } from '@/scene/builders/frame';
import { edgeWidthRange, type PourState } from '@/scene/builders/runs';
import { defaultBracketSpacing } from '@/scene/builders/brackets';
import { cameraPose } from '@/scene/cameras';
import { useArrowSteps, usePresenter } from '@/scene/presenter';
import LazyBridgeScene from '@/scene/LazyBridgeScene';
import EdgeWidthSummary from '@/scene/EdgeWidthSummary';
import Legend from '@/scene/Legend';
import NoWebGL from '@/scene/NoWebGL';
import { STEPS, SAG_DRAWN, SWEEP_DRAWN, THERMAL_DRAWN, type StepControls } from './steps';
import { ft, OUTSIDE, SPAN, stepNumbers } from './walkthrough-numbers';
import { straightedgeOverlays } from './walkthrough-overlays';
import { useSandbox } from './use-sandbox';
import SandboxControls from './SandboxControls';
import StepNav from './StepNav';

/** The guided training walkthrough over a sandbox bridge that the engine recomputes live. */
export default function Walkthrough() {
  const { settings, setSettings, shown, error } = useSandbox();
  const [stepIndex, setStepIndex] = useState(0);
  const [exaggeration, setExaggeration] = useState(STEPS[0].exaggeration);
  const [deltaT, setDeltaT] = useState(20);
  const [pourValue, setPourValue] = useState(0);
  const [sagDrawn, setSagDrawn] = useState(SAG_DRAWN);
  const [poseVersion, setPoseVersion] = useState(0);
  const [showControls, setShowControls] = useState(false);
  const rootRef = useRef<HTMLDivElement>(null);
  const presenter = usePresenter(rootRef);
  const step = STEPS[stepIndex];
  const table = shown.table;
  // Every number in the steps comes from the deck in the picture: the last one the engine could build.
  const built = shown.settings;

  const frame: SceneFrame = useMemo(() => frameForTable(table, exaggeration), [table, exaggeration]);
  const range = useMemo(() => edgeWidthRange(table), [table]);
  const pose = useMemo(() => cameraPose(step.view, table, frame, 'ft', { span: step.span ?? SPAN, side: OUTSIDE }), [step, table, frame]);
  const n = useMemo(() => stepNumbers(table, built, shown.desc.girders[0]?.layout ?? 'chord', deltaT), [table, built, shown.desc, deltaT]);
  const overlays = useMemo(() => (step.straightedge ? straightedgeOverlays(n.straight, frame) : []), [step.straightedge, n.straight, frame]);
  const pour = useMemo((): PourState => (step.pour ? { pour: pourValue, deflectionScale: exaggeration * sagDrawn } : { pour: 0 }), [step.pour, pourValue, exaggeration, sagDrawn]);

  const go = (i: number) => {
    const k = Math.max(0, Math.min(STEPS.length - 1, i));
    setStepIndex(k);
    setExaggeration(STEPS[k].exaggeration);
    setPoseVersion((v) => v + 1);
  };
  // Arrow keys move between steps from anywhere on the page, except while a control has the keys.
  useArrowSteps((d) => go(stepIndex + d));
  const set = (patch: Partial<SandboxSettings>) => {
    setSettings((s) => ({ ...s, ...patch }));
    // The bridge's centre moves with its size: bring the camera along.
    setPoseVersion((v) => v + 1);
  };
  const controls: StepControls = { deltaT, setDeltaT, pour: pourValue, setPour: setPourValue, sagDrawn, setSagDrawn };
  const Body = step.Body;
  const big = presenter.presenting;
  const controlsShown = !big || showControls;

  return (
    <div ref={rootRef} data-presenting={big ? 'true' : 'false'} className={big ? 'fixed inset-0 z-50 space-y-4 overflow-y-auto bg-concrete-900 p-3 text-lg' : 'space-y-4'}>
      {/* On a wide screen the step's words sit beside the picture they talk about. */}
      <div className={`grid items-start gap-4 ${big ? 'lg:grid-cols-[minmax(0,1fr)_28rem]' : 'xl:grid-cols-[minmax(0,1fr)_24rem]'}`}>
        <div
          className={`relative min-w-0 overflow-hidden rounded-lg border border-concrete-300 bg-[#dde4e6] ${big ? 'h-[80vh]' : 'h-[56vh] min-h-[340px] sm:min-h-[380px] xl:sticky xl:top-4'}`}
          data-testid="scene-canvas"
        >
          <LazyBridgeScene
            fallback={<NoWebGL />}
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
            sweep={step.sweep ? (n.sweepLimitIn / 12) * SWEEP_DRAWN : 0}
            verticalBow={step.thermal ? (n.bowIn / 12) * THERMAL_DRAWN : 0}
            pour={pour}
            overlays={overlays}
            showDeck={!step.noDeck && (!step.pour || pourValue === 1)}
            stationEvery={0}
            large={big}
            label="Training bridge in 3D"
          />
          <div className={`pointer-events-none absolute left-3 top-3 max-w-[80%] rounded bg-white/85 px-2 py-1 font-semibold text-concrete-800 ${big ? 'text-base' : 'text-xs'}`}>
            Step {stepIndex + 1} of {STEPS.length} · {exaggeration > 1 ? `heights ×${exaggeration}` : 'true scale'}
            {step.noDeck ? ' · before the pour (no slab)' : ''}
            {step.pour ? (pourValue === 1 ? ' · after the pour' : ' · before the pour (no slab yet)') : ''}
          </div>
        </div>
        <StepNav
          steps={STEPS}
          index={stepIndex}
          go={go}
          big={big}
          presenting={presenter.presenting}
          onPresent={presenter.presenting ? presenter.stop : presenter.start}
          showControls={showControls}
          onShowControls={() => setShowControls((s) => !s)}
          stale={
            error ? (
              <p className="rounded border border-caution-500 bg-caution-100 p-2 text-sm text-caution-700" data-testid="walkthrough-stale">
                The sliders ask for a deck the engine cannot build, so the picture and these numbers are for the last one that worked: radius {ft(built.radius)}, span {ft(built.spanLength)}, overhang{' '}
                {ft(built.overhang)}.
              </p>
            ) : null
          }
        >
          <Body n={n} c={controls} />
        </StepNav>
      </div>

      {controlsShown ? (
        <div className="grid items-start gap-4 xl:grid-cols-[22rem_minmax(0,1fr)]">
          <SandboxControls
            settings={settings}
            set={set}
            exaggeration={exaggeration}
            setExaggeration={(v) => {
              setExaggeration(v);
              setPoseVersion((k) => k + 1);
            }}
            error={error}
          />
          <div className="min-w-0 space-y-4">
            <div className="card p-4">
              <Legend range={range} units="ft" points={false} deflection={Math.max(0, ...table.points.map((p) => p.deflection ?? 0))} />
            </div>
            <EdgeWidthSummary table={table} caption="Edge width per span, sandbox bridge (from the engine)" />
          </div>
        </div>
      ) : null}
    </div>
  );
}
