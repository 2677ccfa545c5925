/**
 * Offset table of a bridge description file.
 *
 *   tsx lib/cli/offsets.ts <bridge.json> [--format json|csv] [--style decimal-feet|feet-inches|metric]
 *
 * JSON (default) prints the table at full precision; CSV prints display units, one row per girder
 * point. Any problem with the input prints ONE line on stderr naming it and exits with code 1.
 */
import { readFileSync } from 'node:fs';
import { computeOffsetTable, GeometryError, offsetTableToCsv, parseBridge, type DisplayStyle } from '../geometry';

const USAGE = 'usage: offsets <bridge.json> [--format json|csv] [--style decimal-feet|feet-inches|metric]';
const STYLES: readonly DisplayStyle[] = ['decimal-feet', 'feet-inches', 'metric'];

function fail(message: string): never {
  process.stderr.write(`${message.replace(/\s*\n\s*/g, ' ')}\n`);
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
  if (!parsed.ok) fail(`${file}: ${parsed.message}`);
  let table;
  try {
    table = computeOffsetTable(parsed.bridge);
  } catch (err) {
    if (err instanceof GeometryError) fail(`${file}: ${err.message}`);
    throw err;
  }
  process.stdout.write(format === 'csv' ? offsetTableToCsv(table, { style }) : `${JSON.stringify(table, null, 2)}\n`);
}

// A reader that stops early (`| head`) closes the pipe; that is not an error of the input.
process.stdout.on('error', (err: NodeJS.ErrnoException) => {
  if (err.code === 'EPIPE') process.exit(0);
  throw err;
});

main(process.argv.slice(2));
