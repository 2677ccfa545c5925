import { ok, withRole } from '@/lib/api/with-role';
import { createCheckSchema, listChecksForBridge, recordCheck } from '@/lib/services/checks';

type P = { id: string };

export const GET = withRole<P>('signed-in', undefined, async ({ params }) => ok(await listChecksForBridge(params.id)));

// A resend of a measurement already recorded (same client_key) answers 200 with that check.
export const POST = withRole<P, typeof createCheckSchema>(['inspector'], createCheckSchema, async ({ user, params, body }) => {
  const check = await recordCheck(user, params.id, body);
  return ok(check, check.replayed ? 200 : 201);
});
