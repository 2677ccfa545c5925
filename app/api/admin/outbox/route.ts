import { ok, withRole } from '@/lib/api/with-role';
import { listOutbox } from '@/lib/mail/outbox';

export const GET = withRole(['admin'], undefined, async () => ok(await listOutbox()));
