/**
 * Two invented demonstration bridges (feet). Names, places and numbers are made up; they are shaped
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

/** The demonstration bridges: [0] the precast chorded bridge, [1] the curved steel bridge. */
export const demoBridges: [ConstantEdgeBridge, ConstantEdgeBridge, ...BridgeDescription[]] = [marlowCreek, quarryLane];
