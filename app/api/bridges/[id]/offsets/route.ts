import { withRole, ok } from '@/lib/api/with-role';
import { offsetsForBridge } from '@/lib/services/offsets';

export const GET = withRole<{ id: string }>('signed-in', undefined, async ({ params }) => ok((await offsetsForBridge(params.id)).table));
