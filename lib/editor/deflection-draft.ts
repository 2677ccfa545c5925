/**
 * The deflection table in the geometry editor: one row per girder and span, values at equal fractions
 * of the span (tenth points: 11 values), positive downward, typed in the bridge's length unit.
 */
import { numberInputText } from '@/lib/units';

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

/** Draft rows of a description's `deflections` (none when it has none). */
export function deflectionsToDraft(list: readonly DeflectionInput[] | undefined): DeflectionDraft[] {
  return (list ?? []).map(({ girder, span, values, ...rest }) => ({ key: deflectionKey(), girder, span: String(span), values: values.map((v) => numberInputText(v)), rest }));
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
export function deflectionsFromDraft(rows: readonly DeflectionDraft[], num: (path: string, text: string, what: string) => number | undefined): Record<string, unknown>[] {
  return rows.map((r, i) => {
    const p = `deflections.${i}`;
    return {
      ...r.rest,
      girder: r.girder,
      span: num(`${p}.span`, r.span, 'a span number'),
      values: r.values.map((v, k) => num(`${p}.values.${k}`, v, 'a deflection')),
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
