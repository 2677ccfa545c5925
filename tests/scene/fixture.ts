/**
 * An invented two-span bridge on a 900 ft curve, far from the coordinate origin (state-plane-sized
 * eastings) so the scene's origin shift matters. Straight precast chords, five girder lines.
 */
import type { ConstantEdgeBridge } from '@/lib/demo/bridges';

export function fixtureBridge(layout: 'chord' | 'curved' = 'chord'): ConstantEdgeBridge {
  return {
    name: 'Fixture Curve Bridge',
    units: 'ft',
    alignment: {
      start_station: 1000,
      start_x: 5000,
      start_y: 5000,
      start_bearing_deg: 60,
      elements: [
        { type: 'line', length: 80 },
        { type: 'arc', length: 360, radius: 900, direction: 'right' },
        { type: 'line', length: 80 },
      ],
    },
    profile: {
      pvis: [
        { station: 900, elevation: 412.0 },
        { station: 1250, elevation: 415.5, curve_length: 200 },
        { station: 1700, elevation: 413.0 },
      ],
    },
    cross_slopes: [
      { station: 1000, left: -0.02, right: -0.02 },
      { station: 1250, left: 0.04, right: -0.04 },
    ],
    deck: {
      left_edge_offset: -23,
      right_edge_offset: 23,
      slab_thickness: 0.708,
      edge_thickness: 0.75,
      left_barrier_width: 1.5,
      right_barrier_width: 1.5,
      form_settlement: 0.02,
    },
    bents: [
      { name: 'Bent 1', station: 1100, skew_deg: 0 },
      { name: 'Bent 2', station: 1220, skew_deg: 8 },
      { name: 'Bent 3', station: 1340, skew_deg: 0 },
    ],
    girders: [
      { name: 'G1', layout, offsets: [-19, -19, -19] },
      { name: 'G2', layout, offsets: [-9.5, -9.5, -9.5] },
      { name: 'G3', layout, offsets: [0, 0, 0] },
      { name: 'G4', layout, offsets: [9.5, 9.5, 9.5] },
      { name: 'G5', layout, offsets: [19, 19, 19] },
    ],
    points_per_span: 20,
    top_of_girder: [{ girder: 'G1', span: 1, point: 10, elevation: 413.9 }],
  } as ConstantEdgeBridge;
}
