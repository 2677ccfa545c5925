import { withRole } from '@/lib/api/with-role';
import { readQuery } from '@/lib/api/query';
import { offsetsCsvForBridge, offsetsCsvQuerySchema } from '@/lib/services/offsets';

export const GET = withRole<{ id: string }>('signed-in', undefined, async ({ req, params }) => {
  const { filename, csv } = await offsetsCsvForBridge(params.id, readQuery(req, offsetsCsvQuerySchema).style);
  return new Response(csv, {
    headers: { 'content-type': 'text/csv; charset=utf-8', 'content-disposition': `attachment; filename="${filename}"` },
  });
});
