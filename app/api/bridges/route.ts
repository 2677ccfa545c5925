import { withRole, ok } from '@/lib/api/with-role';
import { createBridge, createBridgeSchema, listBridges } from '@/lib/services/bridges';

export const GET = withRole('signed-in', undefined, async () => ok(await listBridges()));

export const POST = withRole(['engineer'], createBridgeSchema, async ({ user, body }) => ok(await createBridge(user, body), 201));
