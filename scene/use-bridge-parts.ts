/**
 * Everything the bridge scene draws, built once per change of its inputs by the pure builders: the
 * meshes, the line work, the bracket instances, the bents, the pickable points, the labels and the
 * points that measure the rail's corner at each interior bent.
 */
import { useMemo } from 'react';
import { createBridgeModel, edgeOffsetAt, type BridgeDescription, type OffsetPoint, type OffsetTable } from '@/lib/geometry';
import { atMost, stationText, type Units } from '@/lib/units';
import type { SceneFrame } from './builders/frame';
import { formEdgeY, girderRuns, overhangRuns, type PourState } from './builders/runs';
import { buildGirderMesh, defaultGirderShape } from './builders/girders';
import { buildDeckTop, buildDeckUnderside, buildEdgeBand } from './builders/deck';
import { buildAlignmentSegments, buildFormEdgeSegments, buildStringLineSegments, stringLineLift } from './builders/lines';
import { buildBracketInstances, defaultBracketDims, placeBrackets, type BracketPlacement } from './builders/brackets';
import { buildBents } from './builders/bents';
import { bentProbeIndices } from './builders/kink';
import { outsideSide } from './cameras';
import type { SceneLabel } from './objects/LabelLayout';
import type { KinkCandidate } from './objects/KinkProbe';

export interface BridgePartsInput {
  desc: BridgeDescription;
  table: OffsetTable;
  frame: SceneFrame;
  widthRange: [number, number];
  bracketSpacing: number;
  pickable: readonly OffsetPoint[];
  sweep: number;
  verticalBow: number;
  pour: PourState;
  stationEvery?: number;
}

function joinMeshes(a: { positions: Float32Array; indices: Uint32Array }, b: { positions: Float32Array; indices: Uint32Array }) {
  const positions = new Float32Array(a.positions.length + b.positions.length);
  positions.set(a.positions);
  positions.set(b.positions, a.positions.length);
  const indices = new Uint32Array(a.indices.length + b.indices.length);
  indices.set(a.indices);
  const shift = a.positions.length / 3;
  for (let i = 0; i < b.indices.length; i++) indices[a.indices.length + i] = b.indices[i] + shift;
  return { positions, indices };
}

/** Rail and form-edge probe points at every interior bent on `side` (see objects/KinkProbe). */
export function kinkCandidates(
  desc: BridgeDescription,
  table: Pick<OffsetTable, 'points'>,
  frame: SceneFrame,
  placements: readonly BracketPlacement[],
  postTops: Float32Array,
  side: 'left' | 'right',
  pour: PourState,
): KinkCandidate[] {
  const mine: number[] = [];
  placements.forEach((p, i) => p.side === side && mine.push(i));
  const spans = mine.map((i) => placements[i].span);
  const runs = overhangRuns(table).filter((r) => r.side === side);
  const out: KinkCandidate[] = [];
  for (let j = 1; j + 1 < desc.bents.length; j++) {
    const perSpan = spans.filter((s) => s === j).length;
    const idx = bentProbeIndices(spans, j, Math.max(2, Math.floor(perSpan / 4)));
    const a = runs.find((r) => r.span === j);
    const b = runs.find((r) => r.span === j + 1);
    if (!idx || !a || !b) continue;
    const rail = new Float32Array(12);
    idx.forEach((k, n) => rail.set(postTops.subarray(mine[k] * 3, mine[k] * 3 + 3), n * 3));
    const q = Math.max(1, Math.round((a.rows.length - 1) / 4));
    const rows = [a.rows[a.rows.length - 1 - q], a.rows[a.rows.length - 1], b.rows[0], b.rows[Math.min(b.rows.length - 1, q)]];
    const formEdge = new Float32Array(12);
    rows.forEach((r, n) => {
      formEdge[n * 3] = (r.edge_x as number) - frame.originX;
      formEdge[n * 3 + 1] = formEdgeY(r, frame, pour);
      formEdge[n * 3 + 2] = -((r.edge_y as number) - frame.originY);
    });
    out.push({ bent: desc.bents[j].name, side, rail, formEdge });
  }
  return out;
}

/** The scene's parts for a bridge at a frame, pour state and bracket spacing. */
export function useBridgeParts(input: BridgePartsInput) {
  const { desc, table, frame, widthRange, bracketSpacing, pickable, sweep, verticalBow, pour } = input;
  const units: Units = table.units;
  const u = units === 'm' ? 0.3048 : 1;
  const model = useMemo(() => createBridgeModel(desc), [desc]);
  const shape = useMemo(() => defaultGirderShape(units), [units]);
  const runs = useMemo(() => girderRuns(table), [table]);
  const girders = useMemo(() => {
    // Sweep is a property of the exterior (precast) girders only.
    const exterior = runs.filter((r) => r.side !== 'interior');
    const interior = runs.filter((r) => r.side === 'interior');
    return joinMeshes(buildGirderMesh(interior, frame, { ...shape, verticalBow, pour }), buildGirderMesh(exterior, frame, { ...shape, verticalBow, sweep, pour }));
  }, [runs, frame, shape, sweep, verticalBow, pour]);
  const deckTop = useMemo(() => buildDeckTop(desc, model, frame, 24), [desc, model, frame]);
  const underside = useMemo(() => buildDeckUnderside(table, frame, pour), [table, frame, pour]);
  const band = useMemo(() => buildEdgeBand(table, desc, frame, widthRange), [table, desc, frame, widthRange]);
  const formEdge = useMemo(() => buildFormEdgeSegments(table, frame, pour), [table, frame, pour]);
  const strings = useMemo(() => buildStringLineSegments(table, frame, stringLineLift(units), pour), [table, frame, units, pour]);
  const alignment = useMemo(() => buildAlignmentSegments(desc, model, frame, 60 * u, 2 * u), [desc, model, frame, u]);
  const placements = useMemo(() => placeBrackets(table, bracketSpacing), [table, bracketSpacing]);
  const brackets = useMemo(() => buildBracketInstances(placements, frame, { ...defaultBracketDims(units, shape.depth), verticalBow, pour }), [placements, frame, units, shape, verticalBow, pour]);
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
  const labels = useMemo((): SceneLabel[] => {
    const out: SceneLabel[] = desc.bents.map((b, i) => ({
      key: `bent-${i}`,
      kind: 'bent',
      text: `${b.name} · ${stationText(b.station, units)}`,
      position: [bents.labels[i * 3], bents.labels[i * 3 + 1], bents.labels[i * 3 + 2]],
    }));
    const every = input.stationEvery ?? (units === 'm' ? 20 : 50);
    if (!(every > 0)) return out;
    const s0 = desc.bents[0].station;
    const s1 = desc.bents[desc.bents.length - 1].station;
    for (let s = Math.ceil(s0 / every) * every, n = 0; atMost(s, s1) && n < 40; s += every, n++) {
      const edge = edgeOffsetAt(desc.deck, 'right', s);
      const p = model.alignment.pointAt(s, edge + 6 * u);
      const z = model.surface.topOfDeckAtStationOffset(s, edge);
      out.push({ key: `station-${s}`, kind: 'station', text: stationText(s, units), position: [p.x - frame.originX, (z - frame.refElevation) * frame.exaggeration + 2 * u, -(p.y - frame.originY)] });
    }
    return out;
  }, [desc, model, frame, units, u, bents, input.stationEvery]);
  const kinks = useMemo(() => kinkCandidates(desc, table, frame, placements, brackets.postTops, outsideSide(table), pour), [desc, table, frame, placements, brackets, pour]);
  return { units, u, girders, deckTop, underside, band, formEdge, strings, alignment, brackets, bents, pickPositions, labels, kinks };
}
