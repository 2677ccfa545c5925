import { Op, QueryTypes, type Order, type WhereOptions } from 'sequelize';
import { z } from 'zod';
import { ValidationError } from '@/lib/errors';
import { requireBridge } from './require-bridge';
import { db } from '@/lib/db/connection';
import { Bridge } from '@/models';
import { recordOf, STAGES, type BridgeRecord } from './bridge-record';

export const SORTS = ['activity', 'name', 'structure'] as const;
export type Sort = (typeof SORTS)[number];
export const DEFAULT_LIMIT = 100;
export const MAX_LIMIT = 500;

/** Query of GET /api/bridges (and the portfolio page): search, filters, order and one page. */
export const bridgeListQuerySchema = z.object({
  q: z.string().trim().max(100, 'Keep the search under 100 characters.').optional(),
  stage: z.enum(STAGES, { error: `stage must be one of ${STAGES.join(', ')}.` }).optional(),
  district: z.string().trim().max(120, 'Keep the district under 120 characters.').optional(),
  attention: z.enum(['failures', 'signoff'], { error: 'attention must be failures or signoff.' }).optional(),
  sort: z
    .enum(SORTS, { error: `sort must be one of ${SORTS.join(', ')}.` })
    .optional()
    .default('activity'),
  limit: z
    .string()
    .regex(/^\d{1,4}$/, `limit must be a whole number from 1 to ${MAX_LIMIT}.`)
    .transform(Number)
    .refine((n) => n >= 1 && n <= MAX_LIMIT, `limit must be a whole number from 1 to ${MAX_LIMIT}.`)
    .optional()
    .default(DEFAULT_LIMIT),
  cursor: z.string().max(400, 'That cursor is not one this server gave out.').optional(),
});
export type BridgeListQuery = z.infer<typeof bridgeListQuerySchema>;

/** One row of the portfolio: the bridge, its record and its status counters. */
export type BridgeRow = BridgeRecord & {
  id: number;
  name: string;
  units: string;
  revision: number;
  updatedAt: string;
  bracketsPassing: number;
  bracketsTotal: number;
  openFailures: number;
  spansSignedOff: number;
  spansTotal: number;
  spansAwaitingSignoff: number;
  lastFieldAt: string | null;
  activityAt: string;
};

export function rowOf(b: Bridge): BridgeRow {
  return {
    id: b.id,
    name: b.name,
    units: b.units,
    revision: b.currentRevision,
    updatedAt: b.updatedAt.toISOString(),
    ...recordOf(b),
    bracketsPassing: b.bracketsPassing,
    bracketsTotal: b.bracketsTotal,
    openFailures: b.openFailures,
    spansSignedOff: b.spansSignedOff,
    spansTotal: b.spansTotal,
    spansAwaitingSignoff: b.spansAwaitingSignoff,
    lastFieldAt: b.lastFieldAt ? b.lastFieldAt.toISOString() : null,
    activityAt: (b.activityAt ?? b.updatedAt).toISOString(),
  };
}

type Cursor = { sort: Sort; key: string; id: number };

const cursorSchema = z.tuple([z.enum(SORTS), z.string().max(300), z.number().int().positive()]);

function encodeCursor(c: Cursor): string {
  return Buffer.from(JSON.stringify([c.sort, c.key, c.id])).toString('base64url');
}

function decodeCursor(text: string, sort: Sort): Cursor {
  const bad = () => new ValidationError('That cursor is not one this server gave out; start again from the first page.', { cursor: ['Use the X-Next-Cursor value of the previous page.'] });
  let parsed: z.infer<typeof cursorSchema>;
  try {
    parsed = cursorSchema.parse(JSON.parse(Buffer.from(text, 'base64url').toString('utf8')));
  } catch {
    throw bad();
  }
  if (parsed[0] !== sort) throw new ValidationError(`That cursor belongs to the ${parsed[0]} order; start again from the first page.`, { cursor: ['The order changed; drop the cursor.'] });
  if (parsed[0] === 'activity' && Number.isNaN(Date.parse(parsed[1]))) throw bad();
  return { sort: parsed[0], key: parsed[1], id: parsed[2] };
}

const COLUMN: Record<Sort, 'activityAt' | 'name' | 'structureNumber'> = { activity: 'activityAt', name: 'name', structure: 'structureNumber' };

/** Rows after the cursor in the page's order: (key, id) beyond the last row's, newest first for activity. */
function after(c: Cursor): WhereOptions {
  const col = COLUMN[c.sort];
  const key: string | Date = c.sort === 'activity' ? new Date(c.key) : c.key;
  const beyond = c.sort === 'activity' ? Op.lt : Op.gt;
  const upTo = c.sort === 'activity' ? Op.lte : Op.gte;
  // The first condition bounds the index range, so a deep page does not walk the pages before it.
  return { [Op.and]: [{ [col]: { [upTo]: key } }, { [Op.or]: [{ [col]: { [beyond]: key } }, { [col]: key, id: { [beyond]: c.id } }] }] };
}

/** `%text%` for LIKE with %, _ and \ taken literally (matched with ESCAPE '\'). */
function containsPattern(q: string): string {
  return `%${q.toLowerCase().replace(/[\\%_]/g, (m) => `\\${m}`)}%`;
}

/**
 * One page of the portfolio: bridges matching the search and filters in the asked order, at most
 * `limit`, read through the bridges table's indexes (never the whole table into memory), with the
 * cursor of the next page when there is one. Search matches name, structure number or route,
 * ignoring case.
 */
export async function listBridgePage(query: BridgeListQuery): Promise<{ rows: BridgeRow[]; nextCursor: string | null }> {
  const sequelize = await db();
  const and: WhereOptions[] = [];
  if (query.q) {
    // search_text is name, structure number and route in lower case (models/Bridge.ts keeps it). The
    // match runs in a subquery over the narrow bridges_search index (it holds search_text and the id),
    // so the page's ordered scan never reads whole rows just to test them.
    const pattern = sequelize.escape(containsPattern(query.q));
    and.push(sequelize.literal(`id IN (SELECT id FROM bridges WHERE search_text LIKE ${pattern} ESCAPE '\\')`));
  }
  if (query.stage) and.push({ stage: query.stage });
  if (query.district) and.push({ district: query.district });
  if (query.attention === 'failures') and.push({ openFailures: { [Op.gt]: 0 } });
  if (query.attention === 'signoff') and.push({ spansAwaitingSignoff: { [Op.gt]: 0 } });
  if (query.cursor) and.push(after(decodeCursor(query.cursor, query.sort)));
  const col = COLUMN[query.sort];
  const dir = query.sort === 'activity' ? 'DESC' : 'ASC';
  const order: Order = [
    [col, dir],
    ['id', dir],
  ];
  const found = await Bridge.findAll({ where: { [Op.and]: and }, order, limit: query.limit + 1 });
  const page = found.slice(0, query.limit);
  const last = page[page.length - 1];
  const nextCursor =
    found.length > query.limit && last
      ? encodeCursor({
          sort: query.sort,
          key: query.sort === 'activity' ? (last.activityAt ?? last.updatedAt).toISOString() : query.sort === 'name' ? last.name : last.structureNumber,
          id: last.id,
        })
      : null;
  return { rows: page.map(rowOf), nextCursor };
}

/**
 * The districts in use (at most 500, in order), for the portfolio's filter. Read as a loose index
 * scan: each step seeks the district index for the next value above the last one, so the cost grows
 * with the number of districts, not of bridges (a GROUP BY reads every entry of the index). The same
 * SQL runs on SQLite and PostgreSQL.
 */
export async function listDistricts(): Promise<string[]> {
  const sequelize = await db();
  const rows = await sequelize.query<{ district: string }>(
    `WITH RECURSIVE d(district, n) AS (
       SELECT MIN(district), 1 FROM bridges WHERE district > ''
       UNION ALL
       SELECT (SELECT MIN(b.district) FROM bridges b WHERE b.district > d.district), d.n + 1 FROM d WHERE d.district IS NOT NULL AND d.n < 500
     )
     SELECT district FROM d WHERE district IS NOT NULL ORDER BY n`,
    { type: QueryTypes.SELECT },
  );
  return rows.map((r) => r.district);
}

/** One bridge as a portfolio row (record and status counters); 404 when there is no such bridge. */
export async function bridgeRow(id: string | number): Promise<BridgeRow> {
  const bridge = await requireBridge(id);
  return rowOf(bridge);
}
