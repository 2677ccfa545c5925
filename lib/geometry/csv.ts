/**
 * CSV export of an offset table in display units (pure: table in, text out), one row per girder
 * point, header row with units in the column names.
 */
import { formatFeet, formatFeetInches, formatMetres, formatOffset, formatStation, type DisplayStyle } from './format';
import type { OffsetTable } from './types';

/**
 * CSV options. `style` chooses decimal feet or feet-inches for a feet bridge; metric follows the
 * units (a metric bridge always shows metres; 'metric' on a feet bridge gives decimal feet).
 */
export interface CsvOptions {
  style?: DisplayStyle;
}

/**
 * A text cell a spreadsheet would run as a formula (it begins, after any spaces, with `=`, `+`, `-`,
 * `@`, a tab or a carriage return: OWASP "CSV Injection") gets a leading apostrophe, which spreadsheets
 * read as "this is text" and do not show. Numbers and our own number formats (-0.125, feet-inches
 * -1'-2 3/8", stations -0+50.00) are left as they are: nothing in them can name a cell or call a function.
 */
export function neutraliseFormula(text: string): string {
  if (!/^[ ]*[=+\-@\t\r]/.test(text)) return text;
  if (/^[+-]?\d+(\.\d+)?$/.test(text) || /^-?\d+'-\d+( \d\/\d)?"$/.test(text) || /^-?\d+\+\d+(\.\d+)?$/.test(text)) return text;
  return `'${text}`;
}

/** One CSV cell (RFC 4180): formula-like text neutralised, quoted when it holds a comma, a quote or a line break. */
export function csvCell(text: string): string {
  const safe = neutraliseFormula(text);
  return /[",\n\r]/.test(safe) ? `"${safe.replace(/"/g, '""')}"` : safe;
}

/**
 * Offset table → CSV text ("\n" line ends, trailing newline). Columns: span, girder, side, point,
 * station (display text), offset (LT/RT), edge width, edge drop, form target, top of girder, buildup,
 * drop from girder top. Elevations (form target, top of girder) stay in decimal feet or metres in every
 * style because they are read against a level; widths and drops follow the style (feet-inches to the
 * nearest 1/8"). Empty cells where a value does not apply (interior girders, no survey). With
 * deflections, two more columns at the end: deflection (a length) and screed grade (an elevation).
 */
export function offsetTableToCsv(table: OffsetTable, options: CsvOptions = {}): string {
  const metric = table.units === 'm';
  const style: DisplayStyle = metric ? 'metric' : options.style === 'feet-inches' ? 'feet-inches' : 'decimal-feet';
  const elevationUnit = metric ? 'm' : 'ft';
  const lengthUnit = metric ? 'm' : style === 'feet-inches' ? 'ft_in' : 'ft';
  const length = (v: number | null) => (v === null ? '' : metric ? formatMetres(v) : style === 'feet-inches' ? formatFeetInches(v) : formatFeet(v));
  const elevation = (v: number | null) => (v === null ? '' : metric ? formatMetres(v) : formatFeet(v));
  const header = [
    'span',
    'girder',
    'side',
    'point',
    'station',
    'offset',
    `edge_width_${lengthUnit}`,
    `edge_drop_${lengthUnit}`,
    `form_target_${elevationUnit}`,
    `top_of_girder_${elevationUnit}`,
    `buildup_${lengthUnit}`,
    `drop_from_girder_top_${lengthUnit}`,
    `top_of_deck_${elevationUnit}`,
    `bottom_of_slab_${elevationUnit}`,
  ];
  // Deflection and screed grade only when the bridge's deflection table sets a deflection somewhere.
  const deflections = table.points.some((p) => typeof p.deflection === 'number' && p.deflection !== 0);
  if (deflections) header.push(`deflection_${lengthUnit}`, `screed_grade_${elevationUnit}`);
  const lines = [header.join(',')];
  for (const p of table.points) {
    lines.push(
      [
        String(p.span),
        p.girder,
        p.side,
        String(p.point),
        formatStation(p.station, table.units),
        formatOffset(p.offset, table.units, style),
        length(p.edge_width),
        length(p.edge_drop),
        elevation(p.form_target),
        elevation(p.top_of_girder),
        length(p.buildup),
        length(p.drop_from_girder_top),
        elevation(p.top_of_deck),
        elevation(p.bottom_of_slab),
        ...(deflections ? [length(p.deflection), elevation(p.screed_grade)] : []),
      ]
        .map(csvCell)
        .join(','),
    );
  }
  return lines.join('\n') + '\n';
}
