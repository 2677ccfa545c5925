import { withRole } from '@/lib/api/with-role';
import { readJsonText } from '@/lib/api/body';
import { readQuery } from '@/lib/api/query';
import { computeQuerySchema } from '@/lib/services/offsets';
import { computeAnswer } from '@/lib/workers/compute-pool';

// The description is checked (sizes first, then the schema, then the geometry) and computed in a
// worker thread, so a heavy request never holds up the server. ?interior=1 adds interior girders' rows.
export const POST = withRole('signed-in', undefined, async ({ req }) => {
  const { interior } = readQuery(req, computeQuerySchema);
  return computeAnswer(await readJsonText(req), interior);
});
