import { withRole, ok } from '@/lib/api/with-role';
import { sendResetLink } from '@/lib/services/invites';

type P = { id: string };

/** Mails the person a one-time password-reset link (1 hour). */
export const POST = withRole<P>(['admin'], undefined, async ({ user, params }) => ok(await sendResetLink(user, params.id), 202));
