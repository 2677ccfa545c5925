import { withRole, ok } from '@/lib/api/with-role';
import { updateUser, updateUserSchema } from '@/lib/services/users';

export const PATCH = withRole<{ id: string }, typeof updateUserSchema>(['admin'], updateUserSchema, async ({ user, params, body }) =>
  ok(await updateUser(user, params.id, body)),
);
