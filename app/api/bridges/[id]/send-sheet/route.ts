import { ok, withRole } from '@/lib/api/with-role';
import { sendSheet, sendSheetSchema } from '@/lib/services/sheet-mail';

export const POST = withRole<{ id: string }, typeof sendSheetSchema>(['inspector'], sendSheetSchema, async ({ user, params, body }) => ok(await sendSheet(user, params.id, body), 202));
