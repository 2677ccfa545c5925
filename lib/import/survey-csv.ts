/**
 * Top-of-girder survey CSV: one surveyed elevation per row as `girder, span, point, elevation`.
 * Pure (text in, per-row report out): nothing here reads or writes the store. Every row is checked
 * against the bridge's girders, spans and girder points so that a person sees every problem of a file
 * before anything is stored. Cells are read by Papa Parse (RFC 4180 quoting, quoted cells over several
 * lines); the separator is found from the file: commas, or semicolons or tabs as spreadsheets in
 * metric locales write them, where a decimal comma is read as a decimal point.
 */
import Papa from 'papaparse';

/** What the rows are checked against: the current revision's framing. */
export interface SurveyFraming {
  /** Girder names as the description spells them. */
  girders: readonly string[];
  /** Number of spans (bents − 1). */
  spanCount: number;
  /** Girder points per span n: points 0..n. */
  pointsPerSpan: number;
}

/** One data line of the file and everything wrong with it (empty `problems` means usable). */
export interface SurveyCsvRow {
  /** 1-based line number in the file, as a text editor shows it. */
  line: number;
  girder: string;
  span: number | null;
  point: number | null;
  /** Top of girder elevation in the bridge's units; null when the cell is not a number. */
  elevation: number | null;
  problems: string[];
}

/** The cell separator found in a file. */
export type CsvDelimiter = ',' | ';' | '\t';

/** The separator in words, for the import preview: "commas", "semicolons" or "tabs". */
export function delimiterName(d: CsvDelimiter): string {
  return d === ';' ? 'semicolons' : d === '\t' ? 'tabs' : 'commas';
}

export interface SurveyCsvReport {
  /** True when the first non-blank line was read as column names. */
  header: boolean;
  /** The cell separator found in the file (commas when nothing else fits). */
  delimiter: CsvDelimiter;
  /** True when decimal commas are read (files separated by semicolons or tabs). */
  decimalComma: boolean;
  rows: SurveyCsvRow[];
  /** Problems of the file as a whole (empty file, too many rows). */
  fileProblems: string[];
  /** Rows without problems. */
  good: number;
  /** Rows with at least one problem. */
  bad: number;
}

/** Most data lines one file may hold (a 60-point, 12-span, 12-girder bridge is under 9 000). */
export const MAX_SURVEY_ROWS = 20000;

const COLUMNS = ['girder', 'span', 'point', 'elevation'] as const;
type Column = (typeof COLUMNS)[number];

const HEADER_ALIASES: Record<string, Column> = {
  girder: 'girder',
  beam: 'girder',
  span: 'span',
  point: 'point',
  girder_point: 'point',
  pt: 'point',
  elevation: 'elevation',
  elev: 'elevation',
  top_of_girder: 'elevation',
  tog: 'elevation',
};

/** Splits one CSV line into cells: commas, double-quoted cells with "" as a quote; cells trimmed. */
export function splitCsvLine(line: string): string[] {
  const parsed = Papa.parse<string[]>(line, { delimiter: ',' });
  return (parsed.data[0] ?? ['']).map((c) => c.trim());
}

const DELIMITERS: CsvDelimiter[] = [',', ';', '\t'];

/** The separator of a file, guessed by Papa Parse from its first rows (comments and blank lines left out). */
function findDelimiter(text: string): CsvDelimiter {
  const guess = Papa.parse<string[]>(text, { delimiter: '', delimitersToGuess: DELIMITERS, comments: '#', skipEmptyLines: 'greedy', preview: 10 });
  return (DELIMITERS as string[]).includes(guess.meta.delimiter) ? (guess.meta.delimiter as CsvDelimiter) : ',';
}

/** One parsed row of the file with the 1-based line it starts on, and what went wrong reading it. */
type RawRow = { line: number; cells: string[]; readProblem: string | null };

/**
 * Every row of the file, cells trimmed, with the line each starts on (a quoted cell may hold line
 * breaks, so a row can span several lines). Blank rows and rows starting with `#` are left out.
 */
function readRows(text: string, delimiter: CsvDelimiter, limit: number): { rows: RawRow[]; more: boolean } {
  const rows: RawRow[] = [];
  let start = 0;
  let line = 1;
  let more = false;
  Papa.parse<string[]>(text, {
    delimiter,
    step: (result, parser) => {
      const end = result.meta.cursor;
      const cells = result.data.map((c) => c.trim());
      const rowLine = line;
      line += (text.slice(start, end).match(/\r\n|\r|\n/g) ?? []).length;
      start = end;
      if (cells.every((c) => c === '') || cells[0].startsWith('#')) return;
      if (rows.length >= limit) {
        more = true;
        parser.abort();
        return;
      }
      const quotes = result.errors.find((e) => e.type === 'Quotes');
      rows.push({ line: rowLine, cells, readProblem: quotes ? 'A quoted cell is not closed; it runs on to the end of the file.' : null });
    },
  });
  return { rows, more };
}
function headerKey(cell: string): Column | null {
  const key = cell
    .toLowerCase()
    .replace(/\(.*\)/g, '')
    .trim()
    .replace(/[\s-]+/g, '_');
  return HEADER_ALIASES[key] ?? null;
}

/**
 * Strict decimal number: digits with an optional sign, point and exponent; no units, no thousands
 * separators. With `decimalComma` a comma may stand for the point ("250,12").
 */
function parseNumber(text: string, decimalComma = false): number | null {
  const t = decimalComma && /^[^.]*,[^,]*$/.test(text) ? text.replace(',', '.') : text;
  if (!/^[+-]?(\d+\.?\d*|\.\d+)([eE][+-]?\d+)?$/.test(t)) return null;
  const n = Number(t);
  return Number.isFinite(n) ? n : null;
}

/** What one data row is checked against, and the duplicates seen so far (key → first line). */
type RowContext = { framing: SurveyFraming; order: Column[]; decimalComma: boolean; byLowerName: Map<string, string>; firstLineOf: Map<string, number> };

/** Checks one data row: cell count, girder, span, point, elevation and duplicates. */
function checkRow(raw: RawRow, ctx: RowContext): SurveyCsvRow {
  const { cells } = raw;
  const { framing } = ctx;
  const problems: string[] = raw.readProblem ? [raw.readProblem] : [];
  const value = (c: Column) => cells[ctx.order.indexOf(c)] ?? '';
  if (cells.length !== COLUMNS.length) problems.push(`Has ${cells.length} cells; expected 4 (girder, span, point, elevation).`);

  let girder = value('girder');
  if (!girder) problems.push('The girder name is empty.');
  else if (!framing.girders.includes(girder)) {
    const matched = ctx.byLowerName.get(girder.toLowerCase());
    if (matched) girder = matched;
    else problems.push(`Unknown girder "${girder}"; this bridge has ${framing.girders.join(', ')}.`);
  }

  const spanText = value('span');
  let span = parseNumber(spanText);
  if (span === null || !Number.isInteger(span)) {
    problems.push(`Span "${spanText}" is not a whole number.`);
    span = null;
  } else if (span < 1 || span > framing.spanCount) {
    problems.push(`Span ${span} is out of range (spans 1 to ${framing.spanCount}).`);
  }

  const pointText = value('point');
  let point = parseNumber(pointText);
  if (point === null || !Number.isInteger(point)) {
    problems.push(`Point "${pointText}" is not a whole number.`);
    point = null;
  } else if (point < 0 || point > framing.pointsPerSpan) {
    problems.push(`Point ${point} is out of range (points 0 to ${framing.pointsPerSpan}).`);
  }

  const elevationText = value('elevation');
  const elevation = parseNumber(elevationText, ctx.decimalComma);
  if (elevation === null) problems.push(`Elevation "${elevationText}" is not a number.`);

  if (girder && span !== null && point !== null) {
    const key = `${girder}\u0000${span}\u0000${point}`;
    const first = ctx.firstLineOf.get(key);
    if (first !== undefined) problems.push(`Duplicate: ${girder} span ${span} point ${point} is already on line ${first}.`);
    else ctx.firstLineOf.set(key, raw.line);
  }
  return { line: raw.line, girder, span, point, elevation, problems };
}

/**
 * Reads a survey CSV and reports every row: unknown girder, span out of range, point out of range,
 * non-numeric span/point/elevation, wrong number of cells, and duplicates (a point listed again later in
 * the same file: the later rows are reported, naming the first). A first row of column names
 * (girder, span, point, elevation in any order) is recognised; without one the columns are read in that
 * order. Blank lines and lines starting with `#` are skipped. Cells may be separated by commas,
 * semicolons or tabs (found from the file); with semicolons or tabs an elevation may use a decimal comma.
 * @param text the file's text (UTF-8; a byte-order mark and CRLF line ends are accepted).
 * @param framing the girders, span count and points per span of the revision the rows are checked against.
 */
export function parseSurveyCsv(text: string, framing: SurveyFraming): SurveyCsvReport {
  const body = text.replace(/^\uFEFF/, '');
  const delimiter = findDelimiter(body);
  const decimalComma = delimiter !== ',';
  const read = readRows(body, delimiter, MAX_SURVEY_ROWS + 1);
  const fileProblems: string[] = [];
  const ctx: RowContext = { framing, order: [...COLUMNS], decimalComma, byLowerName: new Map(framing.girders.map((g) => [g.toLowerCase(), g])), firstLineOf: new Map() };
  let header = false;
  let data = read.rows;
  const first = data[0];
  if (first) {
    const keys = first.cells.map(headerKey);
    if (keys.every((k) => k !== null) && new Set(keys).size === COLUMNS.length && keys.length === COLUMNS.length) {
      ctx.order = keys as Column[];
      header = true;
      data = data.slice(1);
    } else if (keys.some((k) => k !== null) && first.cells.every((c) => parseNumber(c) === null)) {
      fileProblems.push(`Line ${first.line} looks like column names but they are not girder, span, point and elevation (found ${first.cells.join(', ')}).`);
      data = data.slice(1);
    }
  }
  if (data.length > MAX_SURVEY_ROWS || read.more) {
    fileProblems.push(`The file has more than ${MAX_SURVEY_ROWS} rows; split it into smaller files.`);
    data = data.slice(0, MAX_SURVEY_ROWS);
  }
  const rows = data.map((raw) => checkRow(raw, ctx));
  if (rows.length === 0 && fileProblems.length === 0) fileProblems.push('The file holds no survey rows; each line needs girder, span, point and elevation.');
  const bad = rows.filter((r) => r.problems.length > 0).length;
  return { header, delimiter, decimalComma, rows, fileProblems, good: rows.length - bad, bad };
}
