/**
 * The geometry editor's working copy of a bridge description. Every number is kept as the text the
 * user typed (so "12+3" or "-" can sit in a field while typing); offsets are a distance plus LT/RT
 * (LT = negative, left looking up-station); slopes are percentages. `toDescription` turns the draft
 * back into a bridge description and reports the fields it could not read, keyed by the same dotted
 * paths the schema and the engine use ("girders.0.offsets.2").
 */
import { numberInputText, type Parsed, parseNumber, parsePercent, parseStation, percentInputText, stationInputText, type Units } from '@/lib/units';
import type { AlignmentInput, BridgeDescription, PviInput } from '@/lib/geometry';
import { defaultDeflectionUnit, deflectionsFromDraft, deflectionsToDraft, type DeflectionDraft } from './deflection-draft';
import type { DeflectionUnit } from './deflection-paste';
import type { OffsetDraft } from './draft-types';
import { edgeFromDraft, edgeToDraft, offsetDraft, type EdgeDraft } from './edge-draft';

export type { OffsetDraft, Side } from './draft-types';
export { offsetDraft } from './edge-draft';
type Rest = Record<string, unknown>;
/** An alignment element as typed; a spiral's start and end are each a tangent or a radius. */
export interface ElementDraft {
  key: string;
  type: 'line' | 'arc' | 'spiral';
  length: string;
  radius: string;
  direction: 'left' | 'right';
  start: 'tangent' | 'radius';
  radius_start: string;
  end: 'tangent' | 'radius';
  radius_end: string;
  rest: Rest;
}
export interface PviDraft {
  key: string;
  station: string;
  elevation: string;
  curve_length: string;
  rest: Rest;
}
export interface SlopeDraft {
  key: string;
  station: string;
  left: string;
  right: string;
  rest: Rest;
}
export interface BentDraft {
  key: string;
  name: string;
  station: string;
  skew_deg: string;
  rest: Rest;
}
export interface GirderDraft {
  key: string;
  name: string;
  layout: 'chord' | 'curved';
  offsets: OffsetDraft[];
  rest: Rest;
}
export interface DeckDraft {
  left_edge_offset: EdgeDraft;
  right_edge_offset: EdgeDraft;
  slab_thickness: string;
  edge_thickness: string;
  left_barrier_width: string;
  right_barrier_width: string;
  form_settlement: string;
  rest: Rest;
}
export interface Draft {
  name: string;
  units: Units;
  alignment: { start_station: string; start_x: string; start_y: string; start_bearing_deg: string; elements: ElementDraft[]; rest: Rest };
  profileRest: Rest;
  pvis: PviDraft[];
  cross_slopes: SlopeDraft[];
  deck: DeckDraft;
  bents: BentDraft[];
  girders: GirderDraft[];
  points_per_span: string;
  chord_spaces: string;
  /** Dead-load deflections per girder and span (none when the bridge has none), values in `deflection_unit`. */
  deflections: DeflectionDraft[];
  deflection_unit: DeflectionUnit;
  /** Fields the editor does not show (top_of_girder, future optional fields), carried through unchanged. */
  rest: Rest;
}

let counter = 0;
/** A key for a new row (stable across re-renders and reordering). */
export const newKey = (prefix: string) => `${prefix}-${Date.now().toString(36)}-${(counter++).toString(36)}`;

function omit<T extends object>(obj: T, keys: string[]): Rest {
  const out: Rest = {};
  for (const [k, v] of Object.entries(obj)) if (!keys.includes(k)) out[k] = v;
  return out;
}

/** The alignment part of a draft, from a description's (or an import's) alignment. */
export function alignmentToDraft(al: AlignmentInput, u: Units): Draft['alignment'] {
  return {
    start_station: stationInputText(al.start_station, u),
    start_x: numberInputText(al.start_x),
    start_y: numberInputText(al.start_y),
    start_bearing_deg: numberInputText(al.start_bearing_deg),
    elements: al.elements.map((e) => ({
      key: newKey('el'),
      type: e.type,
      length: numberInputText(e.length),
      radius: e.type === 'arc' ? numberInputText(e.radius) : '',
      direction: e.type === 'line' ? 'right' : e.direction,
      start: e.type === 'spiral' && e.radius_start === null ? 'tangent' : 'radius',
      radius_start: e.type === 'spiral' ? numberInputText(e.radius_start) : '',
      end: e.type === 'spiral' && e.radius_end === null ? 'tangent' : 'radius',
      radius_end: e.type === 'spiral' ? numberInputText(e.radius_end) : '',
      rest: omit(e, ['type', 'length', 'radius', 'direction', 'radius_start', 'radius_end']),
    })),
    rest: omit(al, ['start_station', 'start_x', 'start_y', 'start_bearing_deg', 'elements']),
  };
}

/** The PVI rows of a draft, from a description's (or an import's) profile. */
export function pvisToDraft(pvis: readonly PviInput[], u: Units): PviDraft[] {
  return pvis.map((p) => ({
    key: newKey('pvi'),
    station: stationInputText(p.station, u),
    elevation: numberInputText(p.elevation),
    curve_length: numberInputText(p.curve_length),
    rest: omit(p, ['station', 'elevation', 'curve_length']),
  }));
}

/** The draft of a stored description (every digit of every number kept). */
export function toDraft(d: BridgeDescription): Draft {
  const u = d.units;
  return {
    name: d.name,
    units: u,
    alignment: alignmentToDraft(d.alignment, u),
    profileRest: omit(d.profile, ['pvis']),
    pvis: pvisToDraft(d.profile.pvis, u),
    cross_slopes: d.cross_slopes.map((c) => ({
      key: newKey('cs'),
      station: stationInputText(c.station, u),
      left: percentInputText(c.left),
      right: percentInputText(c.right),
      rest: omit(c, ['station', 'left', 'right']),
    })),
    deck: {
      left_edge_offset: edgeToDraft(d.deck.left_edge_offset, u),
      right_edge_offset: edgeToDraft(d.deck.right_edge_offset, u),
      slab_thickness: numberInputText(d.deck.slab_thickness),
      edge_thickness: numberInputText(d.deck.edge_thickness),
      left_barrier_width: numberInputText(d.deck.left_barrier_width),
      right_barrier_width: numberInputText(d.deck.right_barrier_width),
      form_settlement: numberInputText(d.deck.form_settlement),
      rest: omit(d.deck, ['left_edge_offset', 'right_edge_offset', 'slab_thickness', 'edge_thickness', 'left_barrier_width', 'right_barrier_width', 'form_settlement']),
    },
    bents: d.bents.map((b) => ({ key: newKey('bent'), name: b.name, station: stationInputText(b.station, u), skew_deg: numberInputText(b.skew_deg), rest: omit(b, ['name', 'station', 'skew_deg']) })),
    girders: d.girders.map((g) => ({ key: newKey('girder'), name: g.name, layout: g.layout, offsets: g.offsets.map(offsetDraft), rest: omit(g, ['name', 'layout', 'offsets']) })),
    points_per_span: numberInputText(d.points_per_span),
    chord_spaces: numberInputText(d.chord_spaces),
    deflections: deflectionsToDraft(d.deflections, u, defaultDeflectionUnit(u)),
    deflection_unit: defaultDeflectionUnit(u),
    rest: omit(d, ['name', 'units', 'alignment', 'profile', 'cross_slopes', 'deck', 'bents', 'girders', 'points_per_span', 'chord_spaces', 'deflections']),
  };
}

/** The description a draft stands for, and the fields that could not be read (dotted path → sentences). */
export function toDescription(draft: Draft): { description: Record<string, unknown>; errors: Record<string, string[]> } {
  const errors: Record<string, string[]> = {};
  const u = draft.units;
  const take = (path: string, parsed: Parsed, optional = false): number | undefined => {
    if (parsed.ok) return parsed.value;
    if (optional && parsed.empty) return undefined;
    (errors[path] ??= []).push(parsed.message);
    return undefined;
  };
  const num = (path: string, text: string, what: string, optional = false) => take(path, parseNumber(text, what), optional);
  const station = (path: string, text: string) => take(path, parseStation(text, u));
  const offset = (path: string, o: OffsetDraft): number | undefined => {
    const t = o.magnitude.trim();
    if (/^[+-]/.test(t)) {
      (errors[path] ??= []).push('Type the distance without a sign and choose LT or RT.');
      return undefined;
    }
    const m = take(path, parseNumber(t, `a distance in ${u}`));
    return m === undefined ? undefined : o.side === 'LT' ? -m : m;
  };
  const whole = (path: string, text: string, what: string): number | undefined => {
    const v = num(path, text, what, true);
    if (v !== undefined && !Number.isInteger(v)) {
      (errors[path] ??= []).push(`${what} must be a whole number.`);
      return undefined;
    }
    return v;
  };

  const a = draft.alignment;
  const description: Record<string, unknown> = {
    ...draft.rest,
    name: draft.name,
    units: u,
    alignment: {
      ...a.rest,
      start_station: station('alignment.start_station', a.start_station),
      start_x: num('alignment.start_x', a.start_x, `an easting in ${u}`),
      start_y: num('alignment.start_y', a.start_y, `a northing in ${u}`),
      start_bearing_deg: num('alignment.start_bearing_deg', a.start_bearing_deg, 'a bearing in degrees'),
      elements: a.elements.map((e, i) => {
        const p = `alignment.elements.${i}`;
        const length = num(`${p}.length`, e.length, `a length in ${u}`);
        if (e.type === 'line') return { ...e.rest, type: 'line', length };
        if (e.type === 'spiral') {
          const r = (which: 'start' | 'end') => (e[which] === 'tangent' ? null : num(`${p}.radius_${which}`, e[`radius_${which}`], `a radius in ${u}`));
          return { ...e.rest, type: 'spiral', length, radius_start: r('start'), radius_end: r('end'), direction: e.direction };
        }
        return { ...e.rest, type: 'arc', length, radius: num(`${p}.radius`, e.radius, `a radius in ${u}`), direction: e.direction };
      }),
    },
    profile: {
      ...draft.profileRest,
      pvis: draft.pvis.map((v, i) => {
        const p = `profile.pvis.${i}`;
        const out: Rest = { ...v.rest, station: station(`${p}.station`, v.station), elevation: num(`${p}.elevation`, v.elevation, `an elevation in ${u}`) };
        const L = num(`${p}.curve_length`, v.curve_length, `a curve length in ${u}`, true);
        if (L !== undefined) out.curve_length = L;
        return out;
      }),
    },
    cross_slopes: draft.cross_slopes.map((c, i) => {
      const p = `cross_slopes.${i}`;
      return { ...c.rest, station: station(`${p}.station`, c.station), left: take(`${p}.left`, parsePercent(c.left)), right: take(`${p}.right`, parsePercent(c.right)) };
    }),
    deck: (() => {
      const d = draft.deck;
      const out: Rest = {
        ...d.rest,
        left_edge_offset: edgeFromDraft('deck.left_edge_offset', d.left_edge_offset, offset, station),
        right_edge_offset: edgeFromDraft('deck.right_edge_offset', d.right_edge_offset, offset, station),
        slab_thickness: num('deck.slab_thickness', d.slab_thickness, `a thickness in ${u}`),
        edge_thickness: num('deck.edge_thickness', d.edge_thickness, `a thickness in ${u}`),
        left_barrier_width: num('deck.left_barrier_width', d.left_barrier_width, `a width in ${u}`),
        right_barrier_width: num('deck.right_barrier_width', d.right_barrier_width, `a width in ${u}`),
      };
      const form = num('deck.form_settlement', d.form_settlement, `an allowance in ${u}`, true);
      if (form !== undefined) out.form_settlement = form;
      return out;
    })(),
    bents: draft.bents.map((b, i) => ({
      ...b.rest,
      name: b.name.trim(),
      station: station(`bents.${i}.station`, b.station),
      skew_deg: num(`bents.${i}.skew_deg`, b.skew_deg, 'a skew in degrees'),
    })),
    girders: draft.girders.map((g, i) => ({
      ...g.rest,
      name: g.name.trim(),
      layout: g.layout,
      offsets: g.offsets.map((o, j) => offset(`girders.${i}.offsets.${j}`, o)),
    })),
  };
  const n = whole('points_per_span', draft.points_per_span, 'Points per span');
  if (n !== undefined) description.points_per_span = n;
  const m = whole('chord_spaces', draft.chord_spaces, 'Chord spaces');
  if (m !== undefined) description.chord_spaces = m;
  if (draft.deflections.length > 0) description.deflections = deflectionsFromDraft(draft.deflections, draft.deflection_unit, u, (path, text, what) => num(path, text, what));
  return { description, errors };
}

/** Moves item `from` of a list to `to` (both indices), returning a new list. */
export function moveItem<T>(list: readonly T[], from: number, to: number): T[] {
  if (to < 0 || to >= list.length || from === to) return [...list];
  const out = [...list];
  const [item] = out.splice(from, 1);
  out.splice(to, 0, item);
  return out;
}
