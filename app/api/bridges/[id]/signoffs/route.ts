import { ok, withRole } from '@/lib/api/with-role';
import { createSignOffSchema, signOffOverview, signOffSpan } from '@/lib/services/signoff';

type P = { id: string };

export const GET = withRole<P>('signed-in', undefined, async ({ params }) => ok(await signOffOverview(params.id)));

export const POST = withRole<P, typeof createSignOffSchema>(['inspector'], createSignOffSchema, async ({ user, params, body }) => ok(await signOffSpan(user, params.id, body), 201));
