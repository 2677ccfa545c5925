/**
 * The deflection table in the geometry editor: one row per girder and span, values at equal fractions
 * of the span (tenth points: 11 values), positive downward, typed in the table's unit (inches or
 * millimetres by default, feet or metres on request) and stored in the bridge's unit.
 */
import Decimal from 'decimal.js';
import { numberInputText, type Units } from '@/lib/units';
import { convertText, unitFactor, type DeflectionUnit } from './deflection-paste';

export interface DeflectionDraft {
  key: string;
  girder: string;
  span: string;
  values: string[];
  rest: Record<string, unknown>;
}

let counter = 0;
export const deflectionKey = () => `defl-${Date.now().toString(36)}-${(counter++).toString(36)}`;

type DeflectionInput = { girder: string; span: number; values: readonly number[] } & Record<string, unknown>;

/** The unit the deflection table is shown in by default: inches on a feet bridge, millimetres on a metric one. */
export const defaultDeflectionUnit = (units: Units): DeflectionUnit => (units === 'm' ? 'mm' : 'in');

/** Draft rows of a description's `deflections` (none when it has none), values shown in `unit`. */
export function deflectionsToDraft(list: readonly DeflectionInput[] | undefined, units: Units, unit: DeflectionUnit): DeflectionDraft[] {
  return (list ?? []).map(({ girder, span, values, ...rest }) => ({ key: deflectionKey(), girder, span: String(span), values: values.map((v) => convertText(numberInputText(v), units, unit)), rest }));
}

/** Every row's values re-written from one unit to another (text that is not a number stays as typed). */
export function convertDeflectionRows(rows: readonly DeflectionDraft[], from: DeflectionUnit, to: DeflectionUnit): DeflectionDraft[] {
  const one = (t: string) => {
    try {
      return t.trim() === '' ? t : convertText(t.trim(), from, to);
    } catch {
      return t;
    }
  };
  return rows.map((r) => ({ ...r, values: r.values.map(one) }));
}

/** A new row: the first girder and span without a row yet, eleven zero values (tenth points). */
export function newDeflectionRow(rows: readonly DeflectionDraft[], girders: readonly string[], spans: number): DeflectionDraft {
  for (const g of girders) {
    for (let s = 1; s <= spans; s++) {
      if (!rows.some((r) => r.girder === g && r.span === String(s))) return { key: deflectionKey(), girder: g, span: String(s), values: Array(11).fill('0'), rest: {} };
    }
  }
  return { key: deflectionKey(), girder: girders[0] ?? '', span: '1', values: Array(11).fill('0'), rest: {} };
}

/**
 * The described `deflections` list from the draft rows; each field read through `num` (which records
 * problems at its dotted path: deflections.2.values.5, deflections.2.span).
 */
export function deflectionsFromDraft(
  rows: readonly DeflectionDraft[],
  unit: DeflectionUnit,
  units: Units,
  num: (path: string, text: string, what: string) => number | undefined,
): Record<string, unknown>[] {
  const factor = unitFactor(unit, units);
  const toBridge = (v: number | undefined) => (v === undefined ? undefined : unit === units ? v : new Decimal(v).times(factor).toNumber());
  return rows.map((r, i) => {
    const p = `deflections.${i}`;
    return {
      ...r.rest,
      girder: r.girder,
      span: num(`${p}.span`, r.span, 'a span number'),
      values: r.values.map((v, k) => toBridge(num(`${p}.values.${k}`, v, 'a deflection'))),
    };
  });
}

/** Adds pasted rows: a pasted girder and span replaces the row already there, others are appended. */
export function mergeDeflections(rows: readonly DeflectionDraft[], pasted: readonly { girder: string; span: number; values: string[] }[]): DeflectionDraft[] {
  const out = [...rows];
  for (const p of pasted) {
    const i = out.findIndex((r) => r.girder === p.girder && r.span === String(p.span));
    const row = { key: i >= 0 ? out[i].key : deflectionKey(), girder: p.girder, span: String(p.span), values: p.values, rest: i >= 0 ? out[i].rest : {} };
    if (i >= 0) out[i] = row;
    else out.push(row);
  }
  return out;
}
