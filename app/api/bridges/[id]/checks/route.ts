import { ok, withRole } from '@/lib/api/with-role';
import { createCheckSchema, listChecksForBridge, recordCheck } from '@/lib/services/checks';

type P = { id: string };

export const GET = withRole<P>('signed-in', undefined, async ({ params }) => ok(await listChecksForBridge(params.id)));

export const POST = withRole<P, typeof createCheckSchema>(['inspector'], createCheckSchema, async ({ user, params, body }) =>
  ok(await recordCheck(user, params.id, body), 201),
);
