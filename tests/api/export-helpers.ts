import type { BridgeDescription } from '@/lib/geometry';

/** 1 ft = 0.3048 m exactly (international foot, 1959 agreement). */
const M = 0.3048;

/**
 * The same bridge in metres: every length, station, coordinate and elevation times 0.3048; slopes,
 * angles and counts unchanged.
 */
export function metricCopy(b: BridgeDescription): BridgeDescription {
  const deck = b.deck as BridgeDescription['deck'] & { left_edge_offset: number; right_edge_offset: number };
  return {
    ...b,
    name: `${b.name} (metric)`,
    units: 'm',
    alignment: {
      ...b.alignment,
      start_station: b.alignment.start_station * M,
      start_x: b.alignment.start_x * M,
      start_y: b.alignment.start_y * M,
      elements: b.alignment.elements.map((e) => {
        const r = e as { radius?: number; radius_start?: number | null; radius_end?: number | null };
        const scaled = (v: number | null | undefined) => (typeof v === 'number' ? v * M : v);
        return {
          ...e,
          length: e.length * M,
          ...(r.radius !== undefined ? { radius: r.radius * M } : {}),
          ...(r.radius_start !== undefined ? { radius_start: scaled(r.radius_start), radius_end: scaled(r.radius_end) } : {}),
        };
      }),
    },
    profile: { pvis: b.profile.pvis.map((p) => ({ ...p, station: p.station * M, elevation: p.elevation * M, ...(p.curve_length ? { curve_length: p.curve_length * M } : {}) })) },
    cross_slopes: b.cross_slopes.map((c) => ({ ...c, station: c.station * M })),
    deck: {
      ...deck,
      left_edge_offset: deck.left_edge_offset * M,
      right_edge_offset: deck.right_edge_offset * M,
      slab_thickness: deck.slab_thickness * M,
      edge_thickness: deck.edge_thickness * M,
      left_barrier_width: deck.left_barrier_width * M,
      right_barrier_width: deck.right_barrier_width * M,
      form_settlement: deck.form_settlement === undefined ? undefined : 0.005,
    },
    bents: b.bents.map((x) => ({ ...x, station: x.station * M })),
    girders: b.girders.map((g) => ({ ...g, offsets: g.offsets.map((o) => o * M) })),
    top_of_girder: b.top_of_girder?.map((t) => ({ ...t, elevation: t.elevation * M })),
  } as BridgeDescription;
}
