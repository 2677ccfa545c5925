import { withRole, ok } from '@/lib/api/with-role';
import { healthCheck } from '@/lib/services/health';

export const GET = withRole('anyone', undefined, async () => ok(await healthCheck()));
