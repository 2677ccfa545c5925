/**
 * Benchmark of the geometry engine (not a test): `npm run bench`.
 *  1. A 12-span bridge on a curve, 60th points on five girder lines, chord offsets: ~50 runs, median.
 *  2. The inverse (plan point → station, offset) on alignments of growing element count, to show the
 *     search does not scan every element.
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

function benchTable(): void {
  const bridge = twelveSpanBridge();
  const first = computeOffsetTable(bridge); // warm-up, and the size of the table
  for (let i = 0; i < 5; i++) computeOffsetTable(bridge);
  const times: number[] = [];
  for (let i = 0; i < 50; i++) {
    const t0 = performance.now();
    computeOffsetTable(bridge);
    times.push(performance.now() - t0);
  }
  const girderPoints = 12 * 61 * 5;
  const ms = median(times);
  console.log(`offset table: 12 spans × 5 girders × 61 points (${girderPoints} girder points, ${first.points.length} rows, ${first.chord_offsets.length} chord sets)`);
  console.log(`  median ${ms.toFixed(2)} ms over ${times.length} runs (min ${Math.min(...times).toFixed(2)}, max ${Math.max(...times).toFixed(2)}); ${Math.round((girderPoints / ms) * 1000).toLocaleString('en-US')} girder points/s; target < 25 ms: ${ms < 25 ? 'met' : 'MISSED'}`);
}

function benchInverse(): void {
  console.log('inverse (plan point → station, offset), 200,000 calls each on a 3000 ft road, points scattered along it:');
  let baseline = 0;
  for (const count of [3, 30, 300, 3000]) {
    const elements: AlignmentElementInput[] = [];
    const each = 3000 / count;
    for (let i = 0; i < count; i++) {
      elements.push(i % 2 === 0 ? { type: 'line', length: each } : { type: 'arc', length: each, radius: 2000 + 37 * (i % 13), direction: i % 4 === 1 ? 'left' : 'right' });
    }
    const al = createAlignment({ start_station: 0, start_x: 0, start_y: 0, start_bearing_deg: 20, elements });
    const calls = 200000;
    // Scattered along the whole road so the last-element hint rarely helps: this measures the tree search.
    const pts = Array.from({ length: 1000 }, (_, i) => al.pointAt((i * 1237.77) % al.endStation, ((i * 7) % 61) - 30));
    let sink = 0;
    for (let i = 0; i < 20000; i++) sink += al.stationOffset(pts[i % 1000].x, pts[i % 1000].y).station;
    const t0 = performance.now();
    for (let i = 0; i < calls; i++) sink += al.stationOffset(pts[i % 1000].x, pts[i % 1000].y).offset;
    const us = ((performance.now() - t0) * 1000) / calls;
    if (count === 3) baseline = us;
    console.log(`  ${String(count).padStart(5)} elements: ${us.toFixed(3)} µs per call (${(us / baseline).toFixed(1)}× the 3-element time)${sink === 42 ? '' : ''}`);
  }
}

// Run only as the engine benchmark itself, not when the 3D benchmark borrows the bridge.
if (/geometry\.ts$/.test(process.argv[1] ?? '')) {
  benchTable();
  benchInverse();
}
