import { ok, withRole } from '@/lib/api/with-role';
import { bridgeAudit } from '@/lib/services/field-audit';

export const GET = withRole<{ id: string }>('signed-in', undefined, async ({ params, user }) => ok(await bridgeAudit(params.id, 300, user.role)));
