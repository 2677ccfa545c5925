import { withRole } from '@/lib/api/with-role';
import { attachmentResponse } from '@/lib/services/attachments';

export const GET = withRole<{ id: string }>('signed-in', undefined, async ({ params }) => attachmentResponse(params.id));
