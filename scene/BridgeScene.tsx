'use client';

import { Canvas } from '@react-three/fiber';
import { OrbitControls } from '@react-three/drei';
import { useMemo, useRef, type RefObject } from 'react';
import type { BridgeDescription, OffsetPoint, OffsetTable } from '@/lib/geometry';
import type { SceneFrame } from './builders/frame';
import type { PourState } from './builders/runs';
import type { CameraPose } from './cameras';
import { useBridgeParts } from './use-bridge-parts';
import BufferMesh from './objects/BufferMesh';
import Segments from './objects/Segments';
import InstancedBoxes from './objects/InstancedBoxes';
import GirderPoints from './objects/GirderPoints';
import RenderStats from './objects/RenderStats';
import CameraRig from './objects/CameraRig';
import Ground from './objects/Ground';
import OverlayBeams from './objects/OverlayBeams';
import SkyDome from './objects/SkyDome';
import SunLight, { STATIC_SHADOWS } from './objects/SunLight';
import LabelLayout from './objects/LabelLayout';
import KinkProbe from './objects/KinkProbe';
import PictureTaker, { type PictureFn } from './objects/PictureTaker';

export interface SceneOverlay {
  positions: Float32Array;
  color: string;
}

export interface BridgeSceneProps {
  desc: BridgeDescription;
  table: OffsetTable;
  frame: SceneFrame;
  /** Edge widths at the two ends of the colour ramp. */
  widthRange: [number, number];
  bracketSpacing: number;
  pose: CameraPose;
  poseVersion: number;
  /** Rows that can be clicked (their order is the index `onSelect` reports). */
  pickable: readonly OffsetPoint[];
  selected: number | null;
  onSelect: (index: number) => void;
  statsRef?: RefObject<HTMLElement | null>;
  /** Lateral bow of the exterior girders at midspan (bridge units), to show sweep. */
  sweep?: number;
  /** Vertical bow of the girders at midspan (scene units), to show thermal camber change. */
  verticalBow?: number;
  /** Before (0) and after (1) the pour: girders and forms come down by their deflection. */
  pour?: PourState;
  /** Extra line work (a straightedge, a drifted form line). */
  overlays?: readonly SceneOverlay[];
  /** Draw the deck slab's top (off: the forms and girders before the pour). */
  showDeck?: boolean;
  /** Whole-station label spacing (bridge units); 0 hides them. */
  stationEvery?: number;
  /** Sun shadows on the ground and under the overhang (on by default). */
  shadows?: boolean;
  /** Large labels for a projector. */
  large?: boolean;
  /** Receives a function that draws the scene larger for "Save picture". */
  pictureRef?: RefObject<PictureFn | null>;
  label: string;
}

const NO_POUR: PourState = { pour: 0 };

/** The 3D bridge: every part built by a pure builder from the engine's numbers; see builders/frame.ts. */
export default function BridgeScene(props: BridgeSceneProps) {
  const { pose, poseVersion, selected, onSelect, statsRef, overlays = [], label, showDeck = true, shadows = true, large = false } = props;
  const parts = useBridgeParts({ ...props, sweep: props.sweep ?? 0, verticalBow: props.verticalBow ?? 0, pour: props.pour ?? NO_POUR });
  const { u, brackets, bents, pickPositions, labels } = parts;
  const labelEls = useRef<Array<HTMLElement | null>>([]);
  const avoid = useMemo((): [number, number, number] | null => {
    if (selected === null || selected * 3 >= pickPositions.length) return null;
    return [pickPositions[selected * 3], pickPositions[selected * 3 + 1], pickPositions[selected * 3 + 2]];
  }, [selected, pickPositions]);
  // What casts or takes the sun's shadow: the static shadow map is drawn again when one of these changes.
  const casters = useMemo(() => [parts.deckTop, parts.underside, parts.girders, brackets, bents, showDeck], [parts.deckTop, parts.underside, parts.girders, brackets, bents, showDeck]);
  const centre = useMemo((): { target: [number, number, number]; reach: number } => {
    const p = parts.deckTop.positions;
    let minX = Infinity,
      maxX = -Infinity,
      minZ = Infinity,
      maxZ = -Infinity,
      y = 0;
    for (let i = 0; i < p.length; i += 3) {
      minX = Math.min(minX, p[i]);
      maxX = Math.max(maxX, p[i]);
      minZ = Math.min(minZ, p[i + 2]);
      maxZ = Math.max(maxZ, p[i + 2]);
      y += p[i + 1];
    }
    if (!Number.isFinite(minX)) return { target: [0, 0, 0], reach: 100 };
    const reach = Math.max(maxX - minX, maxZ - minZ) * 0.62 + 40 * u;
    return { target: [(minX + maxX) / 2, bents.groundY, (minZ + maxZ) / 2], reach: Math.max(reach, y / (p.length / 3) - bents.groundY) };
  }, [parts.deckTop, bents.groundY, u]);

  return (
    <div className="relative h-full w-full overflow-hidden">
      <Canvas
        // Draw on demand (camera moves, changes); with the stats overlay on, every frame, so the
        // counters describe steady rendering.
        frameloop={statsRef ? 'always' : 'demand'}
        dpr={[1, 1.5]}
        shadows={shadows ? STATIC_SHADOWS : false}
        camera={{ fov: 50, near: 0.3 * u, far: 60000 * u, position: pose.position }}
        gl={{ antialias: true, preserveDrawingBuffer: true }}
        aria-label={label}
        role="img"
      >
        <SkyDome radius={30000 * u} />
        <SunLight target={centre.target} reach={centre.reach} shadows={shadows} casters={casters} />
        <Ground y={bents.groundY} units={parts.units} centre={[centre.target[0], centre.target[2]]} extent={centre.reach} />
        {showDeck ? <BufferMesh positions={parts.deckTop.positions} indices={parts.deckTop.indices} color="#dcd7cb" recessed shadow={shadows} /> : null}
        <BufferMesh positions={parts.underside.positions} indices={parts.underside.indices} color="#c79d5f" roughness={0.9} recessed shadow={shadows} />
        {showDeck ? <BufferMesh positions={parts.band.positions} indices={parts.band.indices} colors={parts.band.colors} roughness={0.7} raised /> : null}
        <BufferMesh positions={parts.girders.positions} indices={parts.girders.indices} color="#66717a" roughness={0.5} metalness={0.35} shadow={shadows} />
        <Segments positions={parts.formEdge} color="#ffffff" />
        <Segments positions={parts.strings} color="#e0442b" />
        <Segments positions={parts.alignment} color="#12544b" />
        <InstancedBoxes matrices={brackets.arms} color="#23282c" shadow={shadows} />
        <InstancedBoxes matrices={brackets.struts} color="#23282c" shadow={shadows} />
        <InstancedBoxes matrices={brackets.jacks} color="#8a1f11" shadow={shadows} />
        <InstancedBoxes matrices={brackets.posts} color="#e8b100" roughness={0.5} metalness={0} shadow={shadows} />
        <InstancedBoxes matrices={brackets.rails} color="#e8b100" roughness={0.5} metalness={0} shadow={shadows} />
        <InstancedBoxes matrices={bents.caps} color="#bdb7a8" roughness={0.9} metalness={0} shadow={shadows} />
        <InstancedBoxes matrices={bents.columns} color="#bdb7a8" roughness={0.9} metalness={0} shadow={shadows} />
        <GirderPoints positions={pickPositions} radius={0.35 * u} selected={selected} onPick={onSelect} />
        {overlays.map((o, i) => (
          <OverlayBeams key={i} positions={o.positions} color={o.color} size={0.25 * u} />
        ))}
        <OrbitControls makeDefault enableDamping={false} maxPolarAngle={Math.PI * 0.98} />
        <CameraRig pose={pose} version={poseVersion} />
        <LabelLayout labels={labels} elementsRef={labelEls} avoid={avoid} measureKey={large ? 'large' : 'normal'} />
        <KinkProbe candidates={parts.kinks} />
        {props.pictureRef ? <PictureTaker targetRef={props.pictureRef} /> : null}
        <RenderStats targetRef={statsRef} shadows={shadows} />
      </Canvas>
      <div className="pointer-events-none absolute inset-0 overflow-hidden" data-testid="scene-labels" aria-hidden="true">
        {labels.map((l, i) => (
          <div
            key={l.key}
            ref={(el) => {
              labelEls.current[i] = el;
            }}
            data-label-kind={l.kind}
            style={{ visibility: 'hidden' }}
            className={
              l.kind === 'bent'
                ? `absolute left-0 top-0 whitespace-nowrap rounded bg-concrete-900/85 px-1.5 py-0.5 font-semibold text-white tabular ${large ? 'text-lg' : 'text-[11px] sm:text-xs'}`
                : `absolute left-0 top-0 whitespace-nowrap rounded bg-white/70 px-1 font-semibold text-brand-800 tabular ${large ? 'text-base' : 'text-[10px] sm:text-[11px]'}`
            }
          >
            {l.text}
          </div>
        ))}
      </div>
    </div>
  );
}
