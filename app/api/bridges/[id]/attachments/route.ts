import { ok, withRole } from '@/lib/api/with-role';
import { listAttachments, uploadAttachment } from '@/lib/services/attachments';

type P = { id: string };

export const GET = withRole<P>('signed-in', undefined, async ({ params }) => ok(await listAttachments(params.id)));

// Multipart body: read by the service with its own 10 MB limit, so no JSON schema here.
export const POST = withRole<P>(['inspector'], undefined, async ({ user, params, req }) => ok(await uploadAttachment(user, params.id, req), 201));
