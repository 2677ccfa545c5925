import { withRole, ok } from '@/lib/api/with-role';
import { clientAddress } from '@/lib/auth/client-address';
import { refuseWhenLimited } from '@/lib/auth/request-throttle';
import { setPasswordSchema, setPasswordWithLink } from '@/lib/services/password-links';

/** Chooses a password from an invite or reset link; the link works once. */
export const POST = withRole('anyone', setPasswordSchema, async ({ req, body }) => {
  await refuseWhenLimited('link-failure', clientAddress(req.headers));
  return ok(await setPasswordWithLink(body, clientAddress(req.headers)));
});
