import { withRole, ok } from '@/lib/api/with-role';
import { createRevision, createRevisionSchema, listRevisions } from '@/lib/services/bridges';

type P = { id: string };

export const GET = withRole<P>('signed-in', undefined, async ({ params }) => ok(await listRevisions(params.id)));

export const POST = withRole<P, typeof createRevisionSchema>(['engineer'], createRevisionSchema, async ({ user, params, body }) => ok(await createRevision(user, params.id, body), 201));
