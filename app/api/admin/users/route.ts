import { withRole, ok } from '@/lib/api/with-role';
import { createUser, createUserSchema, listUsers } from '@/lib/services/users';

export const GET = withRole(['admin'], undefined, async () => ok(await listUsers()));

export const POST = withRole(['admin'], createUserSchema, async ({ user, body }) => ok(await createUser(user, body), 201));
