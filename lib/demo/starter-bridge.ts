import type { BridgeDescriptionInput } from '@/lib/geometry';
import type { Units } from '@/lib/units';

/**
 * The built-in starting point for a new bridge: two equal spans of straight (chord) precast girders
 * on a right-hand circular curve, four girder lines, a crest vertical curve and a superelevation
 * transition across the bridge. Invented numbers, valid per the bridge-format contract, written
 * separately for feet and metres so that each reads as round numbers in its own units.
 */
export function starterBridge(units: Units, name = 'New two-span bridge'): BridgeDescriptionInput {
  return units === 'm' ? starterMetres(name) : starterFeet(name);
}

function starterFeet(name: string): BridgeDescriptionInput {
  return {
    name,
    units: 'ft',
    alignment: {
      start_station: 1000,
      start_x: 5000,
      start_y: 5000,
      start_bearing_deg: 30,
      elements: [
        { type: 'line', length: 100 },
        { type: 'arc', length: 300, radius: 1000, direction: 'right' },
        { type: 'line', length: 100 },
      ],
    },
    profile: {
      pvis: [
        { station: 900, elevation: 250 },
        { station: 1250, elevation: 253.5, curve_length: 200 },
        { station: 1600, elevation: 251 },
      ],
    },
    cross_slopes: [
      { station: 1120, left: -0.02, right: -0.02 },
      { station: 1220, left: 0.04, right: -0.04 },
    ],
    deck: {
      left_edge_offset: -19,
      right_edge_offset: 19,
      slab_thickness: 0.708,
      edge_thickness: 0.75,
      left_barrier_width: 1.5,
      right_barrier_width: 1.5,
      form_settlement: 0.02,
    },
    bents: [
      { name: 'Abutment 1', station: 1150, skew_deg: 0 },
      { name: 'Bent 2', station: 1250, skew_deg: 0 },
      { name: 'Abutment 3', station: 1350, skew_deg: 0 },
    ],
    girders: [
      { name: 'G1', layout: 'chord', offsets: [-15, -15, -15] },
      { name: 'G2', layout: 'chord', offsets: [-5, -5, -5] },
      { name: 'G3', layout: 'chord', offsets: [5, 5, 5] },
      { name: 'G4', layout: 'chord', offsets: [15, 15, 15] },
    ],
    points_per_span: 10,
    chord_spaces: 10,
  };
}

function starterMetres(name: string): BridgeDescriptionInput {
  return {
    name,
    units: 'm',
    alignment: {
      start_station: 300,
      start_x: 1500,
      start_y: 1500,
      start_bearing_deg: 30,
      elements: [
        { type: 'line', length: 30 },
        { type: 'arc', length: 90, radius: 300, direction: 'right' },
        { type: 'line', length: 30 },
      ],
    },
    profile: {
      pvis: [
        { station: 270, elevation: 76.2 },
        { station: 375, elevation: 77.25, curve_length: 60 },
        { station: 480, elevation: 76.5 },
      ],
    },
    cross_slopes: [
      { station: 336, left: -0.02, right: -0.02 },
      { station: 366, left: 0.04, right: -0.04 },
    ],
    deck: {
      left_edge_offset: -5.8,
      right_edge_offset: 5.8,
      slab_thickness: 0.215,
      edge_thickness: 0.23,
      left_barrier_width: 0.45,
      right_barrier_width: 0.45,
      form_settlement: 0.005,
    },
    bents: [
      { name: 'Abutment 1', station: 345, skew_deg: 0 },
      { name: 'Bent 2', station: 375, skew_deg: 0 },
      { name: 'Abutment 3', station: 405, skew_deg: 0 },
    ],
    girders: [
      { name: 'G1', layout: 'chord', offsets: [-4.6, -4.6, -4.6] },
      { name: 'G2', layout: 'chord', offsets: [-1.5, -1.5, -1.5] },
      { name: 'G3', layout: 'chord', offsets: [1.5, 1.5, 1.5] },
      { name: 'G4', layout: 'chord', offsets: [4.6, 4.6, 4.6] },
    ],
    points_per_span: 10,
    chord_spaces: 10,
  };
}
