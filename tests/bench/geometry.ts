/**
 * Benchmark of the geometry engine (not a test): `npm run bench`.
 *  1. A 12-span bridge on a curve, 60th points on five girder lines, chord offsets: ~50 runs, median.
 *  2. The same bridge on a tangent–spiral–arc–spiral–tangent alignment with a flared edge and
 *     deflections on every girder at 60th points, its time beside the arc-only bridge's (budget 2×).
 *  3. The inverse (plan point → station, offset) on alignments of growing element count, with and
 *     without spirals, to show the search does not scan every element.
 */
import { performance } from 'node:perf_hooks';
import { computeOffsetTable, createAlignment, type AlignmentElementInput, type BridgeDescription } from '../../lib/geometry';

function median(values: number[]): number {
  const s = [...values].sort((a, b) => a - b);
  return s.length % 2 ? s[(s.length - 1) / 2] : (s[s.length / 2 - 1] + s[s.length / 2]) / 2;
}

/** The 12-span benchmark bridge (also drawn by the 3D benchmark, tests/bench/scene-3d.ts). */
export function twelveSpanBridge(): BridgeDescription {
  const spans = 12;
  const bents = Array.from({ length: spans + 1 }, (_, i) => ({ name: `Bent ${i + 1}`, station: 1100 + i * 95, skew_deg: (i % 3) * 6 - 6 }));
  const offsets = [-17.4, -8.7, 0, 8.7, 17.4];
  return {
    name: 'Benchmark viaduct',
    units: 'ft',
    alignment: {
      start_station: 1000,
      start_x: 20000,
      start_y: 20000,
      start_bearing_deg: 75,
      elements: [
        { type: 'line', length: 150 },
        { type: 'arc', length: 700, radius: 1400, direction: 'right' },
        { type: 'line', length: 60 },
        { type: 'arc', length: 500, radius: 1800, direction: 'left' },
        { type: 'line', length: 200 },
      ],
    },
    profile: {
      pvis: [
        { station: 900, elevation: 300 },
        { station: 1500, elevation: 309, curve_length: 500 },
        { station: 2400, elevation: 301 },
      ],
    },
    cross_slopes: [
      { station: 1100, left: -0.02, right: -0.02 },
      { station: 1250, left: 0.05, right: -0.05 },
      { station: 1800, left: 0.05, right: -0.05 },
      { station: 1950, left: -0.04, right: 0.04 },
    ],
    deck: { left_edge_offset: -21, right_edge_offset: 21, slab_thickness: 0.708, edge_thickness: 0.75, left_barrier_width: 1.5, right_barrier_width: 1.5 },
    bents,
    girders: offsets.map((o, g) => ({ name: `G${g + 1}`, layout: 'chord' as const, offsets: bents.map(() => o) })),
    points_per_span: 60,
    chord_spaces: 20,
  };
}

/**
 * The 12-span bridge again on a ramp-like alignment: tangent, 250 ft spiral into a 1400 ft curve,
 * spiral out, tangent; the right edge flares 21 → 27 ft over the bridge; every girder carries a
 * deflection table at 60th points (61 values) in every span.
 */
export function twelveSpanSpiralBridge(): BridgeDescription {
  const base = twelveSpanBridge();
  const first = base.bents[0].station;
  const last = base.bents[base.bents.length - 1].station;
  return {
    ...base,
    name: 'Benchmark viaduct with spirals',
    alignment: {
      ...base.alignment,
      elements: [
        { type: 'line', length: 120 },
        { type: 'spiral', length: 250, radius_start: null, radius_end: 1400, direction: 'right' },
        { type: 'arc', length: 600, radius: 1400, direction: 'right' },
        { type: 'spiral', length: 250, radius_start: 1400, radius_end: null, direction: 'right' },
        { type: 'line', length: 400 },
      ],
    },
    deck: {
      ...base.deck,
      right_edge_offset: [
        { station: first, offset: 21 },
        { station: last, offset: 27 },
      ],
    },
    girders: base.girders.map((g, i) => (i === base.girders.length - 1 ? { ...g, offsets: base.bents.map((b) => 17.4 + (6 * (b.station - first)) / (last - first)) } : g)),
    deflections: base.girders.flatMap((g) => base.bents.slice(1).map((_, j) => ({ girder: g.name, span: j + 1, values: Array.from({ length: 61 }, (_, i) => 0.1 * Math.sin((Math.PI * i) / 60)) }))),
  };
}

/** Median milliseconds of computeOffsetTable over 50 runs after a warm-up. */
function timeTable(bridge: BridgeDescription): { ms: number; min: number; max: number; rows: number; chords: number } {
  const first = computeOffsetTable(bridge); // warm-up, and the size of the table
  for (let i = 0; i < 5; i++) computeOffsetTable(bridge);
  const times: number[] = [];
  for (let i = 0; i < 50; i++) {
    const t0 = performance.now();
    computeOffsetTable(bridge);
    times.push(performance.now() - t0);
  }
  return { ms: median(times), min: Math.min(...times), max: Math.max(...times), rows: first.points.length, chords: first.chord_offsets.length };
}

function benchTable(): void {
  const girderPoints = 12 * 61 * 5;
  const arc = timeTable(twelveSpanBridge());
  console.log(`offset table: 12 spans × 5 girders × 61 points (${girderPoints} girder points, ${arc.rows} rows, ${arc.chords} chord sets)`);
  console.log(
    `  arcs only:                       median ${arc.ms.toFixed(2)} ms over 50 runs (min ${arc.min.toFixed(2)}, max ${arc.max.toFixed(2)}); ${Math.round((girderPoints / arc.ms) * 1000).toLocaleString('en-US')} girder points/s; target < 25 ms: ${arc.ms < 25 ? 'met' : 'MISSED'}`,
  );
  const sp = timeTable(twelveSpanSpiralBridge());
  const ratio = sp.ms / arc.ms;
  console.log(
    `  spirals, flare, 60th-point deflections: median ${sp.ms.toFixed(2)} ms (min ${sp.min.toFixed(2)}, max ${sp.max.toFixed(2)}); ${ratio.toFixed(2)}× the arc-only median (${(sp.min / arc.min).toFixed(2)}× by the fastest runs); budget within 2×: ${ratio <= 2 ? 'met' : 'MISSED'}`,
  );
}

/** Line, arc, line, … or, with spirals, line, spiral in, arc, spiral out, … over a 3000 ft road. */
function roadElements(count: number, spirals: boolean): AlignmentElementInput[] {
  const elements: AlignmentElementInput[] = [];
  const each = 3000 / count;
  for (let i = 0; i < count; i++) {
    const radius = 2000 + 37 * (Math.floor(i / 4) % 13);
    const direction = Math.floor(i / 4) % 2 === 0 ? 'right' : 'left';
    if (!spirals) elements.push(i % 2 === 0 ? { type: 'line', length: each } : { type: 'arc', length: each, radius: 2000 + 37 * (i % 13), direction: i % 4 === 1 ? 'left' : 'right' });
    else if (i % 4 === 0) elements.push({ type: 'line', length: each });
    else if (i % 4 === 1) elements.push({ type: 'spiral', length: each, radius_start: null, radius_end: radius, direction });
    else if (i % 4 === 2) elements.push({ type: 'arc', length: each, radius, direction });
    else elements.push({ type: 'spiral', length: each, radius_start: radius, radius_end: null, direction });
  }
  return elements;
}

function benchInverse(spirals: boolean): void {
  console.log(`inverse (plan point → station, offset), 200,000 calls each on a 3000 ft road of ${spirals ? 'tangents, spirals and arcs' : 'tangents and arcs'}, points scattered along it:`);
  let baseline = 0;
  for (const count of spirals ? [4, 40, 400, 4000] : [3, 30, 300, 3000]) {
    const elements = roadElements(count, spirals);
    const al = createAlignment({ start_station: 0, start_x: 0, start_y: 0, start_bearing_deg: 20, elements });
    const calls = 200000;
    // Scattered along the whole road so the last-element hint rarely helps: this measures the tree search.
    const pts = Array.from({ length: 1000 }, (_, i) => al.pointAt((i * 1237.77) % al.endStation, ((i * 7) % 61) - 30));
    let sink = 0;
    for (let i = 0; i < 20000; i++) sink += al.stationOffset(pts[i % 1000].x, pts[i % 1000].y).station;
    const t0 = performance.now();
    for (let i = 0; i < calls; i++) sink += al.stationOffset(pts[i % 1000].x, pts[i % 1000].y).offset;
    const us = ((performance.now() - t0) * 1000) / calls;
    if (baseline === 0) baseline = us;
    console.log(`  ${String(count).padStart(5)} elements: ${us.toFixed(3)} µs per call (${(us / baseline).toFixed(1)}× the ${spirals ? 4 : 3}-element time)${sink === 42 ? '' : ''}`);
  }
}

// Run only as the engine benchmark itself, not when the 3D benchmark borrows the bridge.
if (/geometry\.ts$/.test(process.argv[1] ?? '')) {
  benchTable();
  benchInverse(false);
  benchInverse(true);
}
