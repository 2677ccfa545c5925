/**
 * Three invented demonstration bridges (feet). Names, places and numbers are made up; they are shaped
 * like real decks so that the tables, the 3D view and the field sheets have something true to show.
 */
import type { BridgeDescription } from '@/lib/geometry';

/** A description whose deck edges are constant offsets (numbers, not flared lists). */
export type ConstantEdgeBridge = BridgeDescription & {
  deck: BridgeDescription['deck'] & { left_edge_offset: number; right_edge_offset: number };
};

/**
 * Three spans of straight precast girders (chords) on a 1000 ft curve to the right, with the crown
 * rolling into full superelevation across the bridge, a crest vertical curve and skewed bents.
 * Exterior girders sit further out at the bents on the outside of the curve and further in on the
 * inside, so the overhang stays buildable where the chord bows away from or toward the edge.
 */
const marlowCreek: ConstantEdgeBridge = {
  name: 'Marlow Creek Overpass',
  units: 'ft',
  alignment: {
    start_station: 1000,
    start_x: 5000,
    start_y: 5000,
    start_bearing_deg: 30,
    elements: [
      { type: 'line', length: 150 },
      { type: 'arc', length: 500, radius: 1000, direction: 'right' },
      { type: 'line', length: 200 },
    ],
  },
  profile: {
    pvis: [
      { station: 900, elevation: 250 },
      { station: 1340, elevation: 256, curve_length: 400 },
      { station: 1800, elevation: 252 },
    ],
  },
  cross_slopes: [
    { station: 1180, left: -0.02, right: -0.02 },
    { station: 1260, left: 0.02, right: -0.02 },
    { station: 1420, left: 0.06, right: -0.06 },
  ],
  deck: {
    left_edge_offset: -21,
    right_edge_offset: 21,
    slab_thickness: 0.708,
    edge_thickness: 0.75,
    left_barrier_width: 1.5,
    right_barrier_width: 1.5,
    form_settlement: 0.02,
  },
  bents: [
    { name: 'Abutment 1', station: 1200, skew_deg: 10 },
    { name: 'Pier 2', station: 1290, skew_deg: 12 },
    { name: 'Pier 3', station: 1390, skew_deg: 12 },
    { name: 'Abutment 4', station: 1480, skew_deg: 8 },
  ],
  girders: [
    { name: 'G1', layout: 'chord', offsets: [-18.2, -18.2, -18.2, -18.2] },
    { name: 'G2', layout: 'chord', offsets: [-8.8, -8.8, -8.8, -8.8] },
    { name: 'G3', layout: 'chord', offsets: [0, 0, 0, 0] },
    { name: 'G4', layout: 'chord', offsets: [8.6, 8.6, 8.6, 8.6] },
    { name: 'G5', layout: 'chord', offsets: [17.2, 17.2, 17.2, 17.2] },
  ],
  points_per_span: 20,
  chord_spaces: 20,
  // Surveyed after erection; buildups of roughly 2 to 3 inches.
  top_of_girder: [
    { girder: 'G1', span: 1, point: 0, elevation: 252.83 },
    { girder: 'G1', span: 1, point: 10, elevation: 253.68 },
    { girder: 'G1', span: 1, point: 20, elevation: 254.22 },
    { girder: 'G5', span: 1, point: 0, elevation: 252.78 },
    { girder: 'G5', span: 1, point: 10, elevation: 253.2 },
    { girder: 'G5', span: 1, point: 20, elevation: 253.29 },
  ],
};

/**
 * Two spans of curved steel plate girders, concentric with an 850 ft curve to the left, on a sag
 * vertical curve with the deck banked down to the left.
 */
const quarryLane: ConstantEdgeBridge = {
  name: 'Quarry Lane Connector',
  units: 'ft',
  alignment: {
    start_station: 2000,
    start_x: 10000,
    start_y: 8000,
    start_bearing_deg: 110,
    elements: [
      { type: 'line', length: 100 },
      { type: 'arc', length: 600, radius: 850, direction: 'left' },
      { type: 'line', length: 100 },
    ],
  },
  profile: {
    pvis: [
      { station: 1900, elevation: 420 },
      { station: 2300, elevation: 414, curve_length: 300 },
      { station: 2700, elevation: 418 },
    ],
  },
  cross_slopes: [{ station: 2000, left: -0.04, right: 0.04 }],
  deck: {
    left_edge_offset: -17,
    right_edge_offset: 17,
    slab_thickness: 0.75,
    edge_thickness: 0.833,
    left_barrier_width: 1.25,
    right_barrier_width: 1.25,
  },
  bents: [
    { name: 'Abutment A', station: 2150, skew_deg: 0 },
    { name: 'Pier 1', station: 2300, skew_deg: 5 },
    { name: 'Abutment B', station: 2450, skew_deg: 0 },
  ],
  girders: [
    { name: 'G1', layout: 'curved', offsets: [-13.5, -13.5, -13.5] },
    { name: 'G2', layout: 'curved', offsets: [-4.5, -4.5, -4.5] },
    { name: 'G3', layout: 'curved', offsets: [4.5, 4.5, 4.5] },
    { name: 'G4', layout: 'curved', offsets: [13.5, 13.5, 13.5] },
  ],
  points_per_span: 10,
  chord_spaces: 10,
};

/**
 * A tenth-point dead-load deflection table shaped like a uniformly loaded simple span
 * (d(f) ∝ f − 2f³ + f⁴, normalised to `midspan` at f = 0.5), rounded to 0.001 ft as plans print it.
 */
function tenthPointDeflections(midspan: number): number[] {
  return Array.from({ length: 11 }, (_, i) => {
    const f = i / 10;
    return Math.round(((midspan * (f - 2 * f ** 3 + f ** 4)) / 0.3125) * 1000) / 1000;
  });
}

const rampGirders = [
  { name: 'G1', layout: 'chord' as const, offsets: [-12, -12, -12, -12] },
  { name: 'G2', layout: 'chord' as const, offsets: [-4.5, -4.5, -4.5, -4.5] },
  { name: 'G3', layout: 'chord' as const, offsets: [3, 3.6, 4.2, 4.8] },
  { name: 'G4', layout: 'chord' as const, offsets: [7, 8.6, 10.2, 11.8] },
  { name: 'G5', layout: 'chord' as const, offsets: [11.1, 13.77, 16.43, 19.1] },
];

/**
 * Three spans of straight precast girders on a ramp that leaves a tangent through a 200 ft spiral
 * into a 1000 ft curve to the right: the first bents sit inside the spiral. The right deck edge
 * flares from 15 ft to 23 ft toward the gore, the section rolls from normal crown to full
 * superelevation through the spiral, and the plans' tenth-point deflection tables set the forms high.
 */
const tansyHollow: BridgeDescription = {
  name: 'Tansy Hollow Ramp B',
  units: 'ft',
  alignment: {
    start_station: 3000,
    start_x: 12000,
    start_y: 6500,
    start_bearing_deg: 62,
    elements: [
      { type: 'line', length: 120 },
      { type: 'spiral', length: 200, radius_start: null, radius_end: 1000, direction: 'right' },
      { type: 'arc', length: 250, radius: 1000, direction: 'right' },
      { type: 'spiral', length: 200, radius_start: 1000, radius_end: null, direction: 'right' },
      { type: 'line', length: 150 },
    ],
  },
  profile: {
    pvis: [
      { station: 2900, elevation: 180 },
      { station: 3350, elevation: 186.5, curve_length: 400 },
      { station: 3900, elevation: 183 },
    ],
  },
  cross_slopes: [
    { station: 3120, left: -0.02, right: -0.02 },
    { station: 3180, left: 0.02, right: -0.02 },
    { station: 3320, left: 0.06, right: -0.06 },
  ],
  deck: {
    left_edge_offset: -15,
    right_edge_offset: [
      { station: 3200, offset: 15 },
      { station: 3500, offset: 23 },
    ],
    slab_thickness: 0.708,
    edge_thickness: 0.75,
    left_barrier_width: 1.5,
    right_barrier_width: 1.5,
    form_settlement: 0.02,
  },
  bents: [
    { name: 'Abutment 1', station: 3200, skew_deg: 0 },
    { name: 'Pier 2', station: 3300, skew_deg: 6 },
    { name: 'Pier 3', station: 3400, skew_deg: 6 },
    { name: 'Abutment 4', station: 3500, skew_deg: 0 },
  ],
  girders: rampGirders,
  points_per_span: 10,
  chord_spaces: 20,
  // The plans' dead-load deflections (wet deck, barrier and overlay placed with it), tenth points.
  deflections: rampGirders.flatMap((g, gi) => [1, 2, 3].map((span) => ({ girder: g.name, span, values: tenthPointDeflections(gi === 0 || gi === 4 ? 0.052 : 0.064) }))),
};

/**
 * The demonstration bridges: [0] the precast chorded bridge, [1] the curved steel bridge, [2] the
 * ramp with a spiral, a flared edge and deflection tables.
 */
export const demoBridges: [ConstantEdgeBridge, ConstantEdgeBridge, ...BridgeDescription[]] = [marlowCreek, quarryLane, tansyHollow];
