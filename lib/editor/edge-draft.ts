/**
 * A deck edge in the geometry editor: either one offset (constant) or a station/offset table (a
 * flared edge, linear between the listed stations, constant beyond them). Offsets are a distance and
 * LT/RT as everywhere in the editor; stations as typed ("12+34.56" or a plain number).
 */
import { numberInputText, stationInputText, type Units } from '@/lib/units';
import type { OffsetDraft } from './draft-types';

export interface EdgeRowDraft {
  key: string;
  station: string;
  offset: OffsetDraft;
  rest: Record<string, unknown>;
}

export interface EdgeDraft {
  mode: 'constant' | 'table';
  constant: OffsetDraft;
  rows: EdgeRowDraft[];
}

let counter = 0;
const rowKey = () => `edge-${Date.now().toString(36)}-${(counter++).toString(36)}`;

/** Offset → draft text: the distance without sign and LT (negative) or RT. */
export function offsetDraft(value: number | undefined): OffsetDraft {
  if (value === undefined || !Number.isFinite(value)) return { magnitude: '', side: 'RT' };
  return { magnitude: numberInputText(Math.abs(value)), side: value < 0 ? 'LT' : 'RT' };
}

type EdgeInput = number | readonly ({ station: number; offset: number } & Record<string, unknown>)[];

/** The draft of an edge as described (a number, or a list of { station, offset }). */
export function edgeToDraft(spec: EdgeInput, units: Units): EdgeDraft {
  if (typeof spec === 'number') return { mode: 'constant', constant: offsetDraft(spec), rows: [] };
  return {
    mode: 'table',
    constant: offsetDraft(spec[0]?.offset),
    rows: spec.map(({ station, offset, ...rest }) => ({ key: rowKey(), station: stationInputText(station, units), offset: offsetDraft(offset), rest })),
  };
}

/**
 * Switches an edge between constant and table. A new table starts with two rows (the given stations,
 * usually the first and last bents) at the constant offset; a table turned constant keeps its first offset.
 */
export function switchEdgeMode(edge: EdgeDraft, mode: 'constant' | 'table', stations: [string, string]): EdgeDraft {
  if (mode === edge.mode) return edge;
  if (mode === 'constant') return { mode, constant: edge.rows[0]?.offset ?? edge.constant, rows: [] };
  const rows = edge.rows.length >= 2 ? edge.rows : stations.map((station) => ({ key: rowKey(), station, offset: { ...edge.constant }, rest: {} }));
  return { mode, constant: edge.constant, rows };
}

/** A new table row after the last one (station left blank for the user). */
export function newEdgeRow(edge: EdgeDraft): EdgeRowDraft {
  const last = edge.rows[edge.rows.length - 1];
  return { key: rowKey(), station: '', offset: last ? { ...last.offset } : { ...edge.constant }, rest: {} };
}

/**
 * The described edge from its draft. `offset` and `station` read one field each and record their
 * problems at the dotted path they are given (deck.left_edge_offset, deck.left_edge_offset.2.station, ...).
 */
export function edgeFromDraft(
  path: string,
  edge: EdgeDraft,
  offset: (path: string, o: OffsetDraft) => number | undefined,
  station: (path: string, text: string) => number | undefined,
): number | undefined | Record<string, unknown>[] {
  if (edge.mode === 'constant') return offset(path, edge.constant);
  return edge.rows.map((r, j) => ({ ...r.rest, station: station(`${path}.${j}.station`, r.station), offset: offset(`${path}.${j}.offset`, r.offset) }));
}
