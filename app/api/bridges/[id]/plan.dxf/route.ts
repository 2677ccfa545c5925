import { withRole } from '@/lib/api/with-role';
import { fileResponse } from '@/lib/api/file-response';
import { planDxfForBridge } from '@/lib/services/exports';

export const GET = withRole<{ id: string }>('signed-in', undefined, async ({ params }) => fileResponse(await planDxfForBridge(params.id)));
