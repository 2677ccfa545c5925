'use client';

import { Canvas } from '@react-three/fiber';
import { Html, OrbitControls } from '@react-three/drei';
import { useMemo, useRef, type RefObject } from 'react';
import { createBridgeModel, edgeOffsetAt, formatStation, type BridgeDescription, type OffsetPoint, type OffsetTable } from '@/lib/geometry';
import type { SceneFrame } from './builders/frame';
import { girderRuns } from './builders/runs';
import { buildGirderMesh, defaultGirderShape } from './builders/girders';
import { buildDeckTop, buildDeckUnderside, buildEdgeBand } from './builders/deck';
import { buildAlignmentSegments, buildFormEdgeSegments, buildStringLineSegments, stringLineLift } from './builders/lines';
import { buildBracketInstances, defaultBracketDims, placeBrackets } from './builders/brackets';
import { buildBents } from './builders/bents';
import type { CameraPose } from './cameras';
import BufferMesh from './objects/BufferMesh';
import Segments from './objects/Segments';
import InstancedBoxes from './objects/InstancedBoxes';
import GirderPoints from './objects/GirderPoints';
import RenderStats from './objects/RenderStats';
import CameraRig from './objects/CameraRig';
import Ground from './objects/Ground';
import OverlayBeams from './objects/OverlayBeams';

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
  /** Extra line work (a straightedge, a drifted form line). */
  overlays?: readonly SceneOverlay[];
  /** Draw the deck slab's top (off: the forms and girders before the pour). */
  showDeck?: boolean;
  /** Whole-station label spacing (bridge units); 0 hides them. */
  stationEvery?: number;
  label: string;
}

/** The 3D bridge: every part built by a pure builder from the engine's numbers; see builders/frame.ts. */
export default function BridgeScene(props: BridgeSceneProps) {
  const { desc, table, frame, widthRange, bracketSpacing, pose, poseVersion, pickable, selected, onSelect, statsRef, sweep = 0, verticalBow = 0, overlays = [], label, showDeck = true } = props;
  const units = table.units;
  const u = units === 'm' ? 0.3048 : 1;
  const model = useMemo(() => createBridgeModel(desc), [desc]);
  const shape = useMemo(() => defaultGirderShape(units), [units]);
  const runs = useMemo(() => girderRuns(table), [table]);

  const girders = useMemo(() => {
    // Sweep is a property of the exterior (precast) girders only.
    const exterior = runs.filter((r) => r.side !== 'interior');
    const interior = runs.filter((r) => r.side === 'interior');
    const a = buildGirderMesh(interior, frame, { ...shape, verticalBow });
    const b = buildGirderMesh(exterior, frame, { ...shape, verticalBow, sweep });
    const positions = new Float32Array(a.positions.length + b.positions.length);
    positions.set(a.positions);
    positions.set(b.positions, a.positions.length);
    const indices = new Uint32Array(a.indices.length + b.indices.length);
    indices.set(a.indices);
    const shift = a.positions.length / 3;
    for (let i = 0; i < b.indices.length; i++) indices[a.indices.length + i] = b.indices[i] + shift;
    return { positions, indices };
  }, [runs, frame, shape, sweep, verticalBow]);
  const deckTop = useMemo(() => buildDeckTop(desc, model, frame, 24), [desc, model, frame]);
  const underside = useMemo(() => buildDeckUnderside(table, frame), [table, frame]);
  const band = useMemo(() => buildEdgeBand(table, desc, frame, widthRange), [table, desc, frame, widthRange]);
  const formEdge = useMemo(() => buildFormEdgeSegments(table, frame), [table, frame]);
  const strings = useMemo(() => buildStringLineSegments(table, frame, stringLineLift(units)), [table, frame, units]);
  const alignment = useMemo(() => buildAlignmentSegments(desc, model, frame, 60 * u, 2 * u), [desc, model, frame, u]);
  const brackets = useMemo(() => {
    const placements = placeBrackets(table, bracketSpacing);
    return buildBracketInstances(placements, frame, { ...defaultBracketDims(units, shape.depth), verticalBow });
  }, [table, bracketSpacing, frame, units, shape, verticalBow]);
  const bents = useMemo(() => buildBents(desc, model, table, frame, shape.depth, units), [desc, model, table, frame, shape, units]);
  const pickPositions = useMemo(() => {
    const out = new Float32Array(pickable.length * 3);
    pickable.forEach((p, i) => {
      out[i * 3] = p.x - frame.originX;
      out[i * 3 + 1] = ((p.top_of_girder ?? p.bottom_of_slab) - frame.refElevation) * frame.exaggeration + 0.15 * u;
      out[i * 3 + 2] = -(p.y - frame.originY);
    });
    return out;
  }, [pickable, frame, u]);
  const stations = useMemo(() => {
    const every = props.stationEvery ?? (units === 'm' ? 20 : 50);
    if (!(every > 0)) return [];
    const s0 = desc.bents[0].station;
    const s1 = desc.bents[desc.bents.length - 1].station;
    const out: Array<{ s: number; pos: [number, number, number] }> = [];
    for (let s = Math.ceil(s0 / every) * every; s <= s1 + 1e-9; s += every) {
      const edge = edgeOffsetAt(desc.deck, 'right', s);
      const p = model.alignment.pointAt(s, edge + 6 * u);
      const z = model.surface.topOfDeckAtStationOffset(s, edge);
      out.push({ s, pos: [p.x - frame.originX, (z - frame.refElevation) * frame.exaggeration + 2 * u, -(p.y - frame.originY)] });
    }
    return out.slice(0, 40);
  }, [desc, model, frame, units, u, props.stationEvery]);

  // Labels go into this fixed host rather than the canvas's own wrapper: the wrapper's event target
  // changes once the canvas connects, and a label mounted before that came out empty.
  const labelHost = useRef<HTMLDivElement>(null!);

  return (
    <div ref={labelHost} className="relative h-full w-full overflow-hidden">
      <Canvas
        // Draw on demand (camera moves, changes); with the stats overlay on, every frame, so the
        // counters describe steady rendering.
        frameloop={statsRef ? 'always' : 'demand'}
        dpr={[1, 1.5]}
        camera={{ fov: 50, near: 0.3 * u, far: 60000 * u, position: pose.position }}
        gl={{ antialias: true, preserveDrawingBuffer: true }}
        aria-label={label}
        role="img"
      >
        <color attach="background" args={['#dde4e6']} />
        <hemisphereLight args={['#f4f1ea', '#6b665b', 0.9]} />
        <directionalLight position={[300, 500, 200]} intensity={1.6} />
        <directionalLight position={[-200, 150, -300]} intensity={0.35} />
        <Ground y={bents.groundY} />
        {showDeck ? <BufferMesh positions={deckTop.positions} indices={deckTop.indices} color="#d6d1c6" recessed /> : null}
        <BufferMesh positions={underside.positions} indices={underside.indices} color="#b59a6d" recessed />
        {showDeck ? <BufferMesh positions={band.positions} indices={band.indices} colors={band.colors} roughness={0.7} raised /> : null}
        <BufferMesh positions={girders.positions} indices={girders.indices} color="#8d969b" roughness={0.55} metalness={0.3} />
        <Segments positions={formEdge} color="#ffffff" />
        <Segments positions={strings} color="#e0442b" />
        <Segments positions={alignment} color="#12544b" />
        <InstancedBoxes matrices={brackets.arms} color="#3f4a52" />
        <InstancedBoxes matrices={brackets.struts} color="#3f4a52" />
        <InstancedBoxes matrices={brackets.posts} color="#5e6a3a" />
        <InstancedBoxes matrices={brackets.rails} color="#5e6a3a" />
        <InstancedBoxes matrices={bents.caps} color="#a8a295" roughness={0.9} metalness={0} />
        <InstancedBoxes matrices={bents.columns} color="#a8a295" roughness={0.9} metalness={0} />
        <GirderPoints positions={pickPositions} radius={0.35 * u} selected={selected} onPick={onSelect} />
        {overlays.map((o, i) => (
          <OverlayBeams key={i} positions={o.positions} color={o.color} size={0.25 * u} />
        ))}
        {desc.bents.map((b, i) => (
          <Html key={b.name + i} portal={labelHost} position={[bents.labels[i * 3], bents.labels[i * 3 + 1], bents.labels[i * 3 + 2]]} center zIndexRange={[20, 0]}>
            <div className="pointer-events-none whitespace-nowrap rounded bg-concrete-900/80 px-2 py-0.5 text-xs font-semibold text-white tabular">
              {b.name} · {formatStation(b.station, units)}
            </div>
          </Html>
        ))}
        {stations.map((st) => (
          <Html key={st.s} portal={labelHost} position={st.pos} center zIndexRange={[10, 0]}>
            <div className="pointer-events-none whitespace-nowrap text-[11px] font-semibold text-brand-800 tabular">{formatStation(st.s, units)}</div>
          </Html>
        ))}
        <OrbitControls makeDefault enableDamping={false} maxPolarAngle={Math.PI * 0.98} />
        <CameraRig pose={pose} version={poseVersion} />
        {statsRef ? <RenderStats target={statsRef} /> : null}
      </Canvas>
    </div>
  );
}
