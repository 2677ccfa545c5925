import { withRole, ok } from '@/lib/api/with-role';
import { removeUser, updateUser, updateUserSchema } from '@/lib/services/users';

type P = { id: string };

export const PATCH = withRole<P, typeof updateUserSchema>(['admin'], updateUserSchema, async ({ user, params, body }) => ok(await updateUser(user, params.id, body)));

/** Removes the account (soft: its work keeps its author); every session of it ends. */
export const DELETE = withRole<P>(['admin'], undefined, async ({ user, params }) => ok(await removeUser(user, params.id)));
