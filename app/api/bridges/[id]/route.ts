import { withRole, ok } from '@/lib/api/with-role';
import { deleteBridge, getBridge, updateBridge, updateBridgeSchema } from '@/lib/services/bridges';

type P = { id: string };

export const GET = withRole<P>('signed-in', undefined, async ({ params }) => ok(await getBridge(params.id)));

export const PATCH = withRole<P, typeof updateBridgeSchema>(['engineer'], updateBridgeSchema, async ({ user, params, body }) => ok(await updateBridge(user, params.id, body)));

export const DELETE = withRole<P>(['admin'], undefined, async ({ user, params }) => {
  await deleteBridge(user, params.id);
  return ok({ deleted: true });
});
