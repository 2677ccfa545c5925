import type { BridgeDescription } from '@/lib/geometry';
import type { ConstantEdgeBridge } from '@/lib/demo/bridges';

/** A plain straight, square bridge: alignment due north from (0, 0) at station 0. */
export function straightBridge(overrides: Partial<BridgeDescription> = {}): BridgeDescription {
  return {
    name: 'Straight test bridge',
    units: 'ft',
    alignment: { start_station: 0, start_x: 0, start_y: 0, start_bearing_deg: 0, elements: [{ type: 'line', length: 500 }] },
    profile: {
      pvis: [
        { station: 0, elevation: 100 },
        { station: 500, elevation: 105 },
      ],
    },
    cross_slopes: [{ station: 0, left: -0.03, right: -0.03 }],
    deck: {
      left_edge_offset: -20,
      right_edge_offset: 20,
      slab_thickness: 0.7,
      edge_thickness: 0.75,
      left_barrier_width: 1.5,
      right_barrier_width: 1.5,
    },
    bents: [
      { name: 'Bent 1', station: 100, skew_deg: 0 },
      { name: 'Bent 2', station: 200, skew_deg: 0 },
    ],
    girders: [
      { name: 'G1', layout: 'chord', offsets: [-16, -16] },
      { name: 'G2', layout: 'chord', offsets: [0, 0] },
      { name: 'G3', layout: 'chord', offsets: [16, 16] },
    ],
    points_per_span: 10,
    ...overrides,
  };
}

/** A bridge whose bents and deck lie on one circular arc (line, arc, line). */
export function arcBridge(opts: {
  radius: number;
  direction: 'left' | 'right';
  spans: number[];
  skews?: number[];
  layout?: 'chord' | 'curved';
  girderOffsets?: [number, number];
  edge?: number;
  n?: number;
  m?: number;
}): ConstantEdgeBridge {
  const total = opts.spans.reduce((a, b) => a + b, 0);
  const arcStart = 1200;
  const firstBent = arcStart + 80;
  const stations = [firstBent];
  for (const s of opts.spans) stations.push(stations[stations.length - 1] + s);
  const edge = opts.edge ?? 20;
  const [gl, gr] = opts.girderOffsets ?? [-edge + 3.5, edge - 3.5];
  return {
    name: 'Arc test bridge',
    units: 'ft',
    alignment: {
      start_station: 1000,
      start_x: 5000,
      start_y: 5000,
      start_bearing_deg: 40,
      elements: [
        { type: 'line', length: arcStart - 1000 },
        { type: 'arc', length: total + 160, radius: opts.radius, direction: opts.direction },
        { type: 'line', length: 200 },
      ],
    },
    profile: {
      pvis: [
        { station: 1000, elevation: 300 },
        { station: 3000, elevation: 310 },
      ],
    },
    cross_slopes: [{ station: 1000, left: -0.02, right: -0.02 }],
    deck: {
      left_edge_offset: -edge,
      right_edge_offset: edge,
      slab_thickness: 0.708,
      edge_thickness: 0.75,
      left_barrier_width: 1.5,
      right_barrier_width: 1.5,
    },
    bents: stations.map((s, i) => ({ name: `Bent ${i + 1}`, station: s, skew_deg: opts.skews?.[i] ?? 0 })),
    girders: [
      { name: 'GL', layout: opts.layout ?? 'chord', offsets: stations.map(() => gl) },
      { name: 'GR', layout: opts.layout ?? 'chord', offsets: stations.map(() => gr) },
    ],
    points_per_span: opts.n ?? 10,
    chord_spaces: opts.m ?? 20,
  };
}

/** Degrees, minutes → radians. */
export function dmsToRadians(deg: number, min = 0, sec = 0): number {
  return ((deg + min / 60 + sec / 3600) * Math.PI) / 180;
}
