import { withRole } from '@/lib/api/with-role';
import { fileResponse } from '@/lib/api/file-response';
import { readQuery } from '@/lib/api/query';
import { offsetsPdfForBridge, offsetsPdfQuerySchema } from '@/lib/services/exports';

export const GET = withRole<{ id: string }>('signed-in', undefined, async ({ req, params }) => fileResponse(await offsetsPdfForBridge(params.id, readQuery(req, offsetsPdfQuerySchema))));
