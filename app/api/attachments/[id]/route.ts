import { withRole } from '@/lib/api/with-role';
import { readQuery } from '@/lib/api/query';
import { attachmentQuerySchema, attachmentResponse } from '@/lib/services/attachments';

export const GET = withRole<{ id: string }>('signed-in', undefined, async ({ req, params }) => attachmentResponse(params.id, readQuery(req, attachmentQuerySchema).size));
