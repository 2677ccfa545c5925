import { withRole, ok } from '@/lib/api/with-role';
import { resendInvite, withdrawInvite } from '@/lib/services/invites';

type P = { id: string };

/** Re-sends a pending invite with a new link (the old one stops working). */
export const POST = withRole<P>(['admin'], undefined, async ({ user, params }) => ok(await resendInvite(user, params.id)));

/** Withdraws a pending invite: the link stops working and the never-used account is deleted. */
export const DELETE = withRole<P>(['admin'], undefined, async ({ user, params }) => ok(await withdrawInvite(user, params.id)));
