import { withRole, ok } from '@/lib/api/with-role';
import { inviteUser, inviteUserSchema } from '@/lib/services/invites';

/** Invites a person by e-mail: the account is made without a password and they get a one-time link. */
export const POST = withRole(['admin'], inviteUserSchema, async ({ user, body }) => ok(await inviteUser(user, body), 201));
