import { ok, withRole } from '@/lib/api/with-role';
import { getFieldSettings, updateFieldSettings, updateFieldSettingsSchema } from '@/lib/services/tolerances';

type P = { id: string };

export const GET = withRole<P>('signed-in', undefined, async ({ params }) => ok(await getFieldSettings(params.id)));

export const PATCH = withRole<P, typeof updateFieldSettingsSchema>(['engineer'], updateFieldSettingsSchema, async ({ user, params, body }) => ok(await updateFieldSettings(user, params.id, body)));
