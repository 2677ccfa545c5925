import type { NextRequest } from 'next/server';
import { withRole, ok } from '@/lib/api/with-role';
import { readQuery } from '@/lib/api/query';
import { bridgeListQuerySchema, listBridgePage } from '@/lib/services/bridge-list';
import { createBridge, createBridgeSchema } from '@/lib/services/bridges';

/** One page of the portfolio (an array); the next page's cursor in X-Next-Cursor. */
export const GET = withRole('signed-in', undefined, async ({ req }) => {
  const page = await listBridgePage(readQuery(req as NextRequest, bridgeListQuerySchema));
  const res = ok(page.rows);
  if (page.nextCursor) res.headers.set('X-Next-Cursor', page.nextCursor);
  return res;
});

export const POST = withRole(['engineer'], createBridgeSchema, async ({ user, body }) => ok(await createBridge(user, body), 201));
