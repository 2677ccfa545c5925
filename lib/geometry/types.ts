/**
 * Output of the engine: the offset table, in the exact JSON shape of the data contract plus the
 * optional `span_summaries`. Lengths and elevations in the bridge's unit, full double precision.
 */

/** Which deck edge a row's overhang faces; interior girders carry no overhang. */
export type PointSide = 'left' | 'right' | 'interior';

/** One girder point of one span (and, for exterior girders, its overhang numbers). */
export interface OffsetPoint {
  span: number;
  girder: string;
  side: PointSide;
  point: number;
  /** k / n along the span. */
  fraction: number;
  /** Station and signed offset (positive right) of the girder point. */
  station: number;
  offset: number;
  x: number;
  y: number;
  /** Edge point Ek and its station; null for interior rows. */
  edge_x: number | null;
  edge_y: number | null;
  edge_station: number | null;
  /** Horizontal distance girder point → deck edge, always positive for a valid bridge. */
  edge_width: number | null;
  top_of_deck: number;
  bottom_of_slab: number;
  edge_bottom: number | null;
  /** Bottom of slab at the girder minus edge bottom; positive when the edge is lower. */
  edge_drop: number | null;
  form_target: number | null;
  top_of_girder: number | null;
  buildup: number | null;
  drop_from_girder_top: number | null;
  /** Dead-load deflection still to come at Pk (positive downward; 0 without `deflections`). */
  deflection: number;
  /** Top of deck at Pk + deflection: the grade the finishing machine strikes before the pour. */
  screed_grade: number;
}

/** One division point of a deck-edge chord. */
export interface ChordOffsetPoint {
  i: number;
  /** Along the chord from Ea. */
  distance: number;
  /** Perpendicular chord → edge line; positive when the edge lies outward (away from the alignment). */
  offset: number;
}

/** Chord offsets of one span and side. */
export interface ChordOffsetSet {
  span: number;
  side: 'left' | 'right';
  chord_length: number;
  spaces: number;
  offsets: ChordOffsetPoint[];
}

/** Per span and side: the overhang at a glance. */
export interface SpanSummary {
  span: number;
  side: 'left' | 'right';
  girder: string;
  min_edge_width: number;
  max_edge_width: number;
  /** Chord offset at the middle of the edge chord (positive when the edge bows outward). */
  middle_ordinate: number;
  /** Neighbouring girder points between which the edge width changes the most. */
  fastest_change: { from_point: number; to_point: number; width_change: number } | null;
}

/** The whole table. */
export interface OffsetTable {
  units: 'ft' | 'm';
  points: OffsetPoint[];
  chord_offsets: ChordOffsetSet[];
  span_summaries: SpanSummary[];
  /**
   * Things worth a look that do not refuse the bridge (a spiral whose end curvature differs by more
   * than 0.1 % from the arc it joins); present only when there are some.
   */
  warnings?: Array<{ path: string; message: string }>;
}
