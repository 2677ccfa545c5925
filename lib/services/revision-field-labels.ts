/**
 * Words for the description's fields (`deck.left_overhang` → "Deck, left overhang") and the kind of
 * number each holds, for the revision history, the editor's preview and field error lists.
 */
import type { BridgeDescription } from '@/lib/geometry';

const NUMBERED: Record<string, string> = {
  'alignment.elements': 'Alignment element',
  'profile.pvis': 'PVI',
  cross_slopes: 'Cross slope',
  bents: 'Bent',
  girders: 'Girder',
  top_of_girder: 'Top of girder',
};

const FIELD_NAMES: Record<string, string> = {
  name: 'name',
  units: 'units',
  start_station: 'start station',
  start_x: 'start easting (x)',
  start_y: 'start northing (y)',
  start_bearing_deg: 'start bearing',
  type: 'type',
  length: 'length',
  radius: 'radius',
  direction: 'turn',
  station: 'station',
  elevation: 'elevation',
  curve_length: 'vertical curve length',
  left: 'left slope',
  right: 'right slope',
  left_edge_offset: 'left edge offset',
  right_edge_offset: 'right edge offset',
  slab_thickness: 'slab thickness',
  edge_thickness: 'edge thickness',
  left_barrier_width: 'left barrier width',
  right_barrier_width: 'right barrier width',
  form_settlement: 'form settlement allowance',
  skew_deg: 'skew',
  layout: 'layout',
  offsets: 'offset',
  girder: 'girder',
  span: 'span',
  point: 'point',
  points_per_span: 'Girder points per span',
  chord_spaces: 'Chord spaces per span',
};

/**
 * A person's label for a description path, naming bents and girders as the revision names them:
 * "girders.0.offsets.2" → "Girder G1 · offset at Pier 3".
 */
export function fieldLabel(path: string, description: BridgeDescription | null): string {
  const parts = path.split('.');
  if (parts[0] === 'deck') return `Deck · ${FIELD_NAMES[parts[1]] ?? parts[1]}`;
  if (parts[0] === 'alignment' && parts[1] !== 'elements') return `Alignment · ${FIELD_NAMES[parts[1]] ?? parts[1]}`;
  const twoPart = `${parts[0]}.${parts[1]}`;
  const section = NUMBERED[twoPart] ? twoPart : NUMBERED[parts[0]] ? parts[0] : null;
  if (section) {
    const rest = parts.slice(section.split('.').length);
    const index = Number(rest[0]);
    if (!Number.isInteger(index)) return `${NUMBERED[section]}s`;
    let head = `${NUMBERED[section]} ${index + 1}`;
    if (section === 'bents' && description?.bents[index]) head = `${description.bents[index].name}`;
    if (section === 'girders' && description?.girders[index]) head = `Girder ${description.girders[index].name}`;
    const field = rest[1];
    if (!field) return head;
    let label = `${head} · ${FIELD_NAMES[field] ?? field}`;
    if (section === 'girders' && field === 'offsets' && rest[2] !== undefined) {
      const bent = description?.bents[Number(rest[2])];
      label += bent ? ` at ${bent.name}` : ` at bent ${Number(rest[2]) + 1}`;
    }
    return label;
  }
  return FIELD_NAMES[path] ?? path;
}

/** The kind of quantity a path holds, for display with the right unit and sign words. */
export function fieldKind(path: string): 'station' | 'offset' | 'slope' | 'angle' | 'length' | 'count' | 'coordinate' | 'elevation' | 'text' {
  const last =
    path
      .split('.')
      .filter((p) => !/^\d+$/.test(p))
      .pop() ?? '';
  if (last === 'station' || last === 'start_station') return 'station';
  if (last === 'offsets' || last.endsWith('_edge_offset')) return 'offset';
  if (path.startsWith('cross_slopes.') && (last === 'left' || last === 'right')) return 'slope';
  if (last.endsWith('_deg')) return 'angle';
  if (last === 'start_x' || last === 'start_y') return 'coordinate';
  if (last === 'elevation') return 'elevation';
  if (last === 'points_per_span' || last === 'chord_spaces' || last === 'span' || last === 'point') return 'count';
  if (['length', 'radius', 'curve_length', 'slab_thickness', 'edge_thickness', 'left_barrier_width', 'right_barrier_width', 'form_settlement'].includes(last)) return 'length';
  return 'text';
}
