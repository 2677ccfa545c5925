/**
 * The training sandbox: an invented three-span bridge on a right-hand curve whose radius, span,
 * overhang, cross slope and girder layout come from the walkthrough's sliders. Pure; the engine
 * computes its offset table in the browser.
 */
import type { BridgeDescription } from '@/lib/geometry';

export interface SandboxSettings {
  /** Curve radius, ft (300..5000). */
  radius: number;
  /** Span length along the alignment, ft (each of the three spans). */
  spanLength: number;
  /** Overhang at the bents: exterior girder centreline to deck edge, ft. */
  overhang: number;
  /** Cross slope magnitude, rise/run (0..0.1). */
  crossSlope: number;
  /** 'crown': both sides fall away from the centreline; 'banked': superelevated toward the inside. */
  section: 'crown' | 'banked';
  layout: 'chord' | 'curved';
}

export const DEFAULT_SANDBOX: SandboxSettings = {
  radius: 800,
  spanLength: 100,
  overhang: 3.5,
  crossSlope: 0.04,
  section: 'banked',
  layout: 'chord',
};

/** Slider limits the walkthrough offers (ft, rise/run). */
export const SANDBOX_LIMITS = {
  radius: { min: 400, max: 3000, step: 50 },
  spanLength: { min: 40, max: 160, step: 5 },
  overhang: { min: 2.5, max: 5, step: 0.25 },
  crossSlope: { min: 0.01, max: 0.08, step: 0.005 },
} as const;

/** Girder line offsets, ft: five lines 8 ft apart. */
export const SANDBOX_GIRDER_OFFSETS = [-16, -8, 0, 8, 16] as const;
/** Girder depth for the thermal example, in (a 54 in steel plate girder). */
export const SANDBOX_GIRDER_DEPTH_IN = 54;

/**
 * Dead-load deflection still to come at midspan of a sandbox span, ft: an invented 1.5 in on a
 * 100 ft span, growing with the square of the span.
 */
export function sandboxMidspanDeflection(spanLength: number): number {
  return 0.125 * (spanLength / 100) ** 2;
}

/**
 * Deflection at tenth points for a midspan value: the elastic curve of a simply supported beam under
 * a uniform load, y = (16/5)·Δ·(ξ − 2ξ³ + ξ⁴) with ξ the fraction of the span (from memory: the
 * standard uniform-load beam diagram, w·x·(L³ − 2Lx² + x³) / 24EI scaled to Δ at midspan).
 */
export function tenthPointDeflections(midspan: number): number[] {
  return Array.from({ length: 11 }, (_, i) => {
    const x = i / 10;
    return (16 / 5) * midspan * (x - 2 * x ** 3 + x ** 4);
  });
}

/** The sandbox bridge for a set of slider values (feet). */
export function sandboxBridge(s: SandboxSettings): BridgeDescription {
  const lead = 60;
  const start = 1000;
  const firstBent = start + lead + 40;
  const edge = 16 + s.overhang;
  const left = s.section === 'crown' ? -s.crossSlope : s.crossSlope;
  const right = -s.crossSlope;
  return {
    name: 'Training sandbox',
    units: 'ft',
    alignment: {
      start_station: start,
      start_x: 5000,
      start_y: 5000,
      start_bearing_deg: 80,
      elements: [
        { type: 'line', length: lead },
        { type: 'arc', length: 3 * s.spanLength + 80, radius: s.radius, direction: 'right' },
        { type: 'line', length: lead },
      ],
    },
    profile: {
      pvis: [
        { station: start - 100, elevation: 100 },
        { station: start + 3 * s.spanLength + 400, elevation: 100 + 0.005 * (3 * s.spanLength + 500) },
      ],
    },
    cross_slopes: [{ station: start, left, right }],
    deck: {
      left_edge_offset: -edge,
      right_edge_offset: edge,
      slab_thickness: 0.708,
      edge_thickness: 0.75,
      left_barrier_width: 1.5,
      right_barrier_width: 1.5,
      form_settlement: 0.02,
    },
    bents: [0, 1, 2, 3].map((j) => ({ name: j === 0 || j === 3 ? `Abutment ${j + 1}` : `Pier ${j + 1}`, station: firstBent + j * s.spanLength, skew_deg: 0 })),
    girders: SANDBOX_GIRDER_OFFSETS.map((o, i) => ({ name: `G${i + 1}`, layout: s.layout, offsets: [o, o, o, o] })),
    points_per_span: 20,
    chord_spaces: 20,
    deflections: SANDBOX_GIRDER_OFFSETS.flatMap((_, g) => [1, 2, 3].map((span) => ({ girder: `G${g + 1}`, span, values: tenthPointDeflections(sandboxMidspanDeflection(s.spanLength)) }))),
  } as BridgeDescription;
}
