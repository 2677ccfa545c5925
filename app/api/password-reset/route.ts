import { withRole, ok } from '@/lib/api/with-role';
import { clientAddress } from '@/lib/auth/client-address';
import { refuseWhenLimited } from '@/lib/auth/request-throttle';
import { requestPasswordReset, resetRequestSchema } from '@/lib/services/password-links';

/** Asks for a password-reset link; the answer is the same whether or not the address has an account. */
export const POST = withRole('anyone', resetRequestSchema, async ({ req, body }) => {
  await refuseWhenLimited('reset-request', clientAddress(req.headers));
  return ok(await requestPasswordReset(body, clientAddress(req.headers)), 202);
});
