/**
 * The one "find the bridge or say there is none" of the code base. A bridge id arrives as a route
 * parameter (text) or a number; it is checked by a zod schema, and an id that cannot name a bridge is
 * the same NotFoundError as a bridge that does not exist.
 */
import type { Transaction } from 'sequelize';
import { z } from 'zod';
import { db } from '@/lib/db/connection';
import { NotFoundError } from '@/lib/errors';
import { Bridge } from '@/models';

/** A bridge id: a positive whole number, given as a number or as route-parameter digits ("12"). */
export const bridgeIdSchema = z
  .union([
    z.number(),
    z
      .string()
      .trim()
      .regex(/^\d{1,15}$/)
      .transform(Number),
  ])
  .pipe(z.number().int().positive().max(Number.MAX_SAFE_INTEGER));

/** Route parameters of the /bridges/:id routes and pages. */
export const bridgeParamsSchema = z.object({ id: bridgeIdSchema });

const NO_BRIDGE = 'There is no bridge with that id.';

/** The bridge id as a number; NotFoundError when the text cannot be a bridge id. */
export function parseBridgeId(id: string | number): number {
  const parsed = bridgeIdSchema.safeParse(id);
  if (!parsed.success) throw new NotFoundError(NO_BRIDGE);
  return parsed.data;
}

/** The stored bridge with this id; NotFoundError when there is none (or the id cannot be one). */
export async function requireBridge(id: string | number, options: { transaction?: Transaction } = {}): Promise<Bridge> {
  const n = parseBridgeId(id);
  await db();
  const bridge = await Bridge.findByPk(n, { transaction: options.transaction });
  if (!bridge) throw new NotFoundError(NO_BRIDGE);
  return bridge;
}
