/**
 * Offset table of a bridge description file.
 *
 *   tsx lib/cli/offsets.ts <bridge.json> [--format json|csv] [--style decimal-feet|feet-inches|metric]
 *
 * JSON (default) prints the table at full precision; CSV prints display units, one row per girder
 * point. Problems with the input print on stderr, one line each naming the field (the first 20, then
 * a count of the rest), and the command exits with code 1. Warnings (a spiral that kinks against its
 * arc) print on stderr as "warning:" lines and the table is still printed.
 */
import { readFileSync } from 'node:fs';
import { computeOffsetTable, GeometryError, offsetTableToCsv, parseBridge, type DisplayStyle } from '../geometry';

const USAGE = 'usage: offsets <bridge.json> [--format json|csv] [--style decimal-feet|feet-inches|metric]';
const STYLES: readonly DisplayStyle[] = ['decimal-feet', 'feet-inches', 'metric'];

function oneLine(message: string): string {
  return message.replace(/\s*\n\s*/g, ' ');
}

function fail(message: string): never {
  process.stderr.write(`${oneLine(message)}\n`);
  process.exit(1);
}

/** Most problems printed one per line; the rest are counted. */
const MAX_LINES = 20;

/** Every problem on its own line, named by its field path (unless the message already starts with it). */
function failAll(file: string, problems: Array<{ path: string; message: string }>): never {
  const lines = problems.slice(0, MAX_LINES).map(({ path, message }) => {
    const named = path && path !== '_' && !message.startsWith(`${path}:`) ? `${path}: ${message}` : message;
    return `${file}: ${oneLine(named)}`;
  });
  if (problems.length > MAX_LINES) lines.push(`${file}: and ${problems.length - MAX_LINES} more problem${problems.length - MAX_LINES > 1 ? 's' : ''}`);
  process.stderr.write(`${lines.join('\n')}\n`);
  process.exit(1);
}

function main(argv: string[]): void {
  let file: string | null = null;
  let format = 'json';
  let style: DisplayStyle = 'decimal-feet';
  for (let i = 0; i < argv.length; i++) {
    const a = argv[i];
    const value = (name: string) => {
      const eq = a.indexOf('=');
      if (eq >= 0) return a.slice(eq + 1);
      if (i + 1 >= argv.length) fail(`${name} needs a value; ${USAGE}`);
      return argv[++i];
    };
    if (a === '--format' || a.startsWith('--format=')) format = value('--format');
    else if (a === '--style' || a.startsWith('--style=')) style = value('--style') as DisplayStyle;
    else if (a === '--help' || a === '-h') {
      process.stdout.write(`${USAGE}\n`);
      return;
    } else if (a.startsWith('-')) fail(`unknown option ${a}; ${USAGE}`);
    else if (file === null) file = a;
    else fail(`only one bridge file is read, got also ${a}; ${USAGE}`);
  }
  if (file === null) fail(USAGE);
  if (format !== 'json' && format !== 'csv') fail(`unknown format "${format}"; use json or csv`);
  if (!STYLES.includes(style)) fail(`unknown style "${style}"; use ${STYLES.join(', ')}`);

  let text: string;
  try {
    text = readFileSync(file, 'utf8');
  } catch (err) {
    const code = (err as NodeJS.ErrnoException).code;
    fail(`${file}: cannot read the file${code === 'ENOENT' ? ' (no such file)' : code ? ` (${code})` : ''}`);
  }
  let json: unknown;
  try {
    json = JSON.parse(text);
  } catch (err) {
    fail(`${file}: not valid JSON (${(err as Error).message})`);
  }
  const parsed = parseBridge(json);
  if (!parsed.ok) {
    if (parsed.kind === 'geometry') failAll(file, parsed.issues);
    failAll(
      file,
      Object.entries(parsed.fields).flatMap(([path, messages]) => messages.map((message) => ({ path, message }))),
    );
  }
  let table;
  try {
    table = computeOffsetTable(parsed.bridge);
  } catch (err) {
    if (err instanceof GeometryError) failAll(file, err.issues);
    throw err;
  }
  for (const w of table.warnings ?? []) process.stderr.write(`${file}: warning: ${oneLine(`${w.path}: ${w.message}`)}\n`);
  process.stdout.write(format === 'csv' ? offsetTableToCsv(table, { style }) : `${JSON.stringify(table, null, 2)}\n`);
}

// A reader that stops early (`| head`) closes the pipe; that is not an error of the input.
process.stdout.on('error', (err: NodeJS.ErrnoException) => {
  if (err.code === 'EPIPE') process.exit(0);
  throw err;
});

main(process.argv.slice(2));
