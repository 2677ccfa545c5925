/**
 * Reads deflection rows pasted from a spreadsheet or uploaded as CSV (papaparse): tab-, comma- or
 * semicolon-separated rows of values at equal fractions of a span (tenth points: 11 values), in the
 * unit the user chose on screen (feet, inches, metres or millimetres), converted to the table's unit.
 * A row may start with the girder name and span number ("G1, 2, 0, 0.35, ..."); rows of numbers only
 * go to the chosen girder, span after span from the chosen one. A first row of words is a header.
 */
import Decimal from 'decimal.js';
import Papa from 'papaparse';

export type DeflectionUnit = 'ft' | 'in' | 'm' | 'mm';

/** Words for each unit, as the screen says them. */
export const DEFLECTION_UNIT_WORDS: Record<DeflectionUnit, string> = { ft: 'feet', in: 'inches', m: 'metres', mm: 'millimetres' };

/** How many of unit `to` one `from` is (exact: 1 in = 1/12 ft, 1 ft = 0.3048 m, 1 in = 25.4 mm). */
export function unitFactor(from: DeflectionUnit, to: DeflectionUnit): Decimal {
  const inMetres: Record<DeflectionUnit, Decimal> = { ft: new Decimal('0.3048'), in: new Decimal('0.0254'), m: new Decimal(1), mm: new Decimal('0.001') };
  return inMetres[from].dividedBy(inMetres[to]);
}

/**
 * A value typed in one unit as editor text in another: the same text when the units agree, else
 * converted exactly and written to 12 significant digits (0.31 in → "0.0258333333333" ft).
 */
export function convertText(text: string, from: DeflectionUnit, to: DeflectionUnit): string {
  if (from === to) return text;
  return new Decimal(text).times(unitFactor(from, to)).toSignificantDigits(12).toFixed();
}

export interface PastedDeflection {
  girder: string;
  span: number;
  /** Values in the table's unit (`into`), as editor text. */
  values: string[];
}

export interface PasteResult {
  rows: PastedDeflection[];
  /** Sentences naming the row (and column) of each value that could not be read. */
  problems: string[];
  /** True when a first row of words was taken as a header and skipped. */
  header: boolean;
}

const NUMBER = /^[+-]?(\d+\.?\d*|\.\d+)(e[+-]?\d+)?$/i;

/**
 * @param text pasted text or CSV file contents.
 * @param options unit of the values; the bridge's unit, girder names and span count; the girder and
 *   first span that rows of numbers only go to.
 */
export function readDeflectionPaste(
  text: string,
  options: { unit: DeflectionUnit; into: DeflectionUnit; girders: readonly string[]; spans: number; girder: string; firstSpan: number; maxValues?: number },
): PasteResult {
  const parsed = Papa.parse<string[]>(text.trim(), { delimiter: '', delimitersToGuess: ['\t', ',', ';'], skipEmptyLines: 'greedy' });
  const decimalComma = parsed.meta.delimiter === ';';
  const byName = new Map(options.girders.map((g) => [g.trim().toLowerCase(), g]));
  const rows: PastedDeflection[] = [];
  const problems: string[] = [];
  let header = false;
  let nextSpan = options.firstSpan;
  parsed.data.forEach((raw, r) => {
    const cells = raw.map((c) => (decimalComma ? c.trim().replace(',', '.') : c.trim()));
    while (cells.length > 0 && cells[cells.length - 1] === '') cells.pop();
    if (cells.length === 0) return;
    const line = `Row ${r + 1}`;
    let girder = options.girder;
    let span = nextSpan;
    let values = cells;
    if (!NUMBER.test(cells[0])) {
      const name = byName.get(cells[0].toLowerCase());
      if (!name) {
        if (r === 0 && rows.length === 0) header = true;
        else problems.push(`${line}: "${cells[0]}" is not a girder of this bridge (${options.girders.join(', ')}).`);
        return;
      }
      if (!/^\d+$/.test(cells[1] ?? '')) {
        problems.push(`${line}: after the girder name comes the span number (1 to ${options.spans}), not "${cells[1] ?? ''}".`);
        return;
      }
      girder = name;
      span = Number(cells[1]);
      values = cells.slice(2);
    } else {
      nextSpan += 1;
    }
    if (span < 1 || span > options.spans) {
      problems.push(`${line}: the bridge has spans 1 to ${options.spans}, not span ${span}.`);
      return;
    }
    const bad = values.findIndex((v) => !NUMBER.test(v));
    if (bad >= 0) {
      problems.push(`${line}, value ${bad + 1}: "${values[bad]}" is not a number.`);
      return;
    }
    if (values.length < 2 || values.length > (options.maxValues ?? 201)) {
      problems.push(`${line}: ${values.length} ${values.length === 1 ? 'value' : 'values'}; a span needs from 2 to ${options.maxValues ?? 201} (11 for tenth points).`);
      return;
    }
    rows.push({ girder, span, values: values.map((v) => convertText(v, options.unit, options.into)) });
  });
  for (const e of parsed.errors) if (e.type === 'Quotes') problems.push(`Row ${(e.row ?? 0) + 1}: a quote is not closed.`);
  return { rows, problems, header };
}
