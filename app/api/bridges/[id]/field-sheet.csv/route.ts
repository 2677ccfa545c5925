import { withRole } from '@/lib/api/with-role';
import { readQuery } from '@/lib/api/query';
import { fieldSheetCsvForBridge, fieldSheetQuerySchema } from '@/lib/services/field-sheet';

export const GET = withRole<{ id: string }>('signed-in', undefined, async ({ req, params }) => {
  const { filename, csv } = await fieldSheetCsvForBridge(params.id, readQuery(req, fieldSheetQuerySchema).span);
  return new Response(csv, {
    headers: { 'Content-Type': 'text/csv; charset=utf-8', 'Content-Disposition': `attachment; filename="${filename}"`, 'X-Content-Type-Options': 'nosniff' },
  });
});
