/**
 * Top-of-girder survey CSV: one surveyed elevation per line as `girder, span, point, elevation`.
 * Pure (text in, per-row report out): nothing here reads or writes the store. Every line is checked
 * against the bridge's girders, spans and girder points so that a person sees every problem of a file
 * before anything is stored.
 */

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

export interface SurveyCsvReport {
  /** True when the first non-blank line was read as column names. */
  header: boolean;
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
  const cells: string[] = [];
  let cell = '';
  let quoted = false;
  for (let i = 0; i < line.length; i++) {
    const c = line[i];
    if (quoted) {
      if (c === '"' && line[i + 1] === '"') {
        cell += '"';
        i++;
      } else if (c === '"') quoted = false;
      else cell += c;
    } else if (c === '"') quoted = true;
    else if (c === ',') {
      cells.push(cell.trim());
      cell = '';
    } else cell += c;
  }
  cells.push(cell.trim());
  return cells;
}

function headerKey(cell: string): Column | null {
  const key = cell
    .toLowerCase()
    .replace(/\(.*\)/g, '')
    .trim()
    .replace(/[\s-]+/g, '_');
  return HEADER_ALIASES[key] ?? null;
}

/** Strict decimal number: digits with an optional sign, point and exponent; no units, no thousands commas. */
function parseNumber(text: string): number | null {
  if (!/^[+-]?(\d+\.?\d*|\.\d+)([eE][+-]?\d+)?$/.test(text)) return null;
  const n = Number(text);
  return Number.isFinite(n) ? n : null;
}

/**
 * Reads a survey CSV and reports every line: unknown girder, span out of range, point out of range,
 * non-numeric span/point/elevation, wrong number of cells, and duplicates (a point listed again later in
 * the same file: the later lines are reported, naming the first). A first line of column names
 * (girder, span, point, elevation in any order) is recognised; without one the columns are read in that
 * order. Blank lines and lines starting with `#` are skipped.
 * @param text the file's text (UTF-8; a byte-order mark and CRLF line ends are accepted).
 * @param framing the girders, span count and points per span of the revision the rows are checked against.
 */
export function parseSurveyCsv(text: string, framing: SurveyFraming): SurveyCsvReport {
  const lines = text.replace(/^\uFEFF/, '').split(/\r\n|\r|\n/);
  const rows: SurveyCsvRow[] = [];
  const fileProblems: string[] = [];
  let order: Column[] = [...COLUMNS];
  let header = false;
  let seenContent = false;
  const girderNames = new Set(framing.girders);
  const byLowerName = new Map(framing.girders.map((g) => [g.toLowerCase(), g]));
  const firstLineOf = new Map<string, number>();

  for (let i = 0; i < lines.length; i++) {
    const raw = lines[i];
    if (!raw.trim() || raw.trimStart().startsWith('#')) continue;
    const cells = splitCsvLine(raw);
    if (!seenContent) {
      seenContent = true;
      const keys = cells.map(headerKey);
      if (keys.every((k) => k !== null) && new Set(keys).size === COLUMNS.length && keys.length === COLUMNS.length) {
        order = keys as Column[];
        header = true;
        continue;
      }
      if (keys.some((k) => k !== null) && cells.every((c) => parseNumber(c) === null)) {
        fileProblems.push(`Line ${i + 1} looks like column names but they are not girder, span, point and elevation (found ${cells.join(', ')}).`);
        continue;
      }
    }
    if (rows.length >= MAX_SURVEY_ROWS) {
      fileProblems.push(`The file has more than ${MAX_SURVEY_ROWS} rows; split it into smaller files.`);
      break;
    }
    const problems: string[] = [];
    const value = (c: Column) => cells[order.indexOf(c)] ?? '';
    if (cells.length !== COLUMNS.length) problems.push(`Has ${cells.length} cells; expected 4 (girder, span, point, elevation).`);

    let girder = value('girder');
    if (!girder) problems.push('The girder name is empty.');
    else if (!girderNames.has(girder)) {
      const matched = byLowerName.get(girder.toLowerCase());
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
    const elevation = parseNumber(elevationText);
    if (elevation === null) problems.push(`Elevation "${elevationText}" is not a number.`);

    if (girder && span !== null && point !== null) {
      const key = `${girder}\u0000${span}\u0000${point}`;
      const first = firstLineOf.get(key);
      if (first !== undefined) problems.push(`Duplicate: ${girder} span ${span} point ${point} is already on line ${first}.`);
      else firstLineOf.set(key, i + 1);
    }
    rows.push({ line: i + 1, girder, span, point, elevation, problems });
  }
  if (rows.length === 0 && fileProblems.length === 0) fileProblems.push('The file holds no survey rows; each line needs girder, span, point and elevation.');
  const bad = rows.filter((r) => r.problems.length > 0).length;
  return { header, rows, fileProblems, good: rows.length - bad, bad };
}
