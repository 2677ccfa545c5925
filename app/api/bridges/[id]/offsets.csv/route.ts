import { withRole } from '@/lib/api/with-role';
import { offsetsCsvForBridge } from '@/lib/services/offsets';

export const GET = withRole<{ id: string }>('signed-in', undefined, async ({ req, params }) => {
  const { filename, csv } = await offsetsCsvForBridge(params.id, req.nextUrl.searchParams.get('style'));
  return new Response(csv, {
    headers: { 'content-type': 'text/csv; charset=utf-8', 'content-disposition': `attachment; filename="${filename}"` },
  });
});
