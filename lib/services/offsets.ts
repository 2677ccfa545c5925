import { z } from 'zod';
import { computeOffsetTable, GeometryError, offsetTableToCsv, type BridgeDescription, type OffsetTable } from '@/lib/geometry';
import { UnprocessableError, ValidationError } from '@/lib/errors';
import { requireBridge } from './require-bridge';
import { Bridge } from '@/models';
import { schemaCheckedDescription } from './description';
import { getRevisionDescription } from './bridges';
import { storedSurvey, withSurvey } from './survey';

/** Runs the engine, mapping geometry that cannot be built to 422 with the engine's own message. */
export function computeChecked(bridge: BridgeDescription): OffsetTable {
  try {
    return computeOffsetTable(bridge);
  } catch (err) {
    if (err instanceof GeometryError) throw new UnprocessableError(err.message);
    throw err;
  }
}

/** Query of POST /api/compute: `interior=1` (or true) adds the interior girders' rows. */
export const computeQuerySchema = z.object({
  interior: z
    .enum(['0', '1', 'false', 'true'], { error: 'interior must be 1 (include interior girders) or 0.' })
    .optional()
    .transform((v) => v === '1' || v === 'true'),
});

/**
 * Offset table for a description posted to the compute API (400 schema, 422 geometry). Interior
 * girders carry no overhang, so their rows (side "interior", overhang fields null) come only when
 * asked for; the exterior rows and chord offsets are always there.
 */
export function computeFromJson(json: unknown, options: { interior?: boolean } = {}): OffsetTable {
  const table = computeChecked(schemaCheckedDescription(json, '_'));
  return options.interior ? table : { ...table, points: table.points.filter((p) => p.side !== 'interior') };
}

const cache = new Map<string, OffsetTable>();
const CACHE_LIMIT = 200;

/**
 * Offset table of a stored bridge's latest revision, with the stored top-of-girder survey merged over
 * the description's own `top_of_girder` (the survey wins per point). Revisions never change once
 * written and every survey import bumps the survey stamp, so the table is cached by bridge, revision
 * and survey stamp.
 */
export async function offsetsForBridge(id: string): Promise<{ bridge: Bridge; table: OffsetTable }> {
  const bridge = await requireBridge(id);
  const survey = await storedSurvey(bridge.id);
  const key = `${bridge.id}:${bridge.createdAt.getTime()}:${bridge.currentRevision}:${survey.stamp}`;
  let table = cache.get(key);
  if (!table) {
    table = computeChecked(withSurvey(await getRevisionDescription(bridge.id, bridge.currentRevision), survey.entries));
    if (cache.size >= CACHE_LIMIT) cache.delete(cache.keys().next().value as string);
    cache.set(key, table);
  }
  return { bridge, table };
}

/**
 * Offset table of one stored revision of a bridge (with the stored survey merged as for the latest),
 * for a field check measured against a revision that has since been replaced. 400 when the bridge has
 * no such revision yet.
 */
export async function offsetsForRevision(bridge: Bridge, revision: number): Promise<OffsetTable> {
  if (revision === bridge.currentRevision) return (await offsetsForBridge(String(bridge.id))).table;
  if (revision > bridge.currentRevision) {
    throw new ValidationError(`This bridge is at revision ${bridge.currentRevision}; there is no revision ${revision} yet.`, {
      revision: [`Choose a revision from 1 to ${bridge.currentRevision}.`],
    });
  }
  const survey = await storedSurvey(bridge.id);
  const key = `${bridge.id}:${bridge.createdAt.getTime()}:${revision}:${survey.stamp}`;
  let table = cache.get(key);
  if (!table) {
    table = computeChecked(withSurvey(await getRevisionDescription(bridge.id, revision), survey.entries));
    if (cache.size >= CACHE_LIMIT) cache.delete(cache.keys().next().value as string);
    cache.set(key, table);
  }
  return table;
}

const STYLES = ['decimal-feet', 'feet-inches', 'metric'] as const;

/** Query of the offsets CSV: `style` of the display units, decimal-feet when absent. */
export const offsetsCsvQuerySchema = z.object({
  style: z
    .enum(STYLES, { error: `Use ${STYLES.join(', ')}.` })
    .optional()
    .default('decimal-feet'),
});

/** CSV of a stored bridge's offset table in display units (decimal feet, feet-inches or metric). */
export async function offsetsCsvForBridge(id: string, style: (typeof STYLES)[number]): Promise<{ filename: string; csv: string }> {
  const { bridge, table } = await offsetsForBridge(id);
  const safeName =
    bridge.name
      .replace(/[^A-Za-z0-9._-]+/g, '-')
      .replace(/^-+|-+$/g, '')
      .slice(0, 80) || 'bridge';
  return {
    filename: `${safeName}-rev${bridge.currentRevision}-offsets.csv`,
    csv: offsetTableToCsv(table, { style }),
  };
}
