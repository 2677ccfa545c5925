import { withRole, ok } from '@/lib/api/with-role';
import { getRevision } from '@/lib/services/bridges';

type P = { id: string; revision: string };

/** One stored revision with its description (signed in). */
export const GET = withRole<P>('signed-in', undefined, async ({ params }) => ok(await getRevision(params.id, params.revision)));
