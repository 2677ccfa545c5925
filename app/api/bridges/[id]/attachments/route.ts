import { ok, withRole } from '@/lib/api/with-role';
import { listAttachments, uploadAttachment } from '@/lib/services/attachments';

type P = { id: string };

export const GET = withRole<P>('signed-in', undefined, async ({ params }) => ok(await listAttachments(params.id)));

// Multipart body: read by the service with its own 10 MB limit, so no JSON schema here. A resend of a
// photo already stored (same client_key) answers 200 with that attachment.
export const POST = withRole<P>(['inspector'], undefined, async ({ user, params, req }) => {
  const attachment = await uploadAttachment(user, params.id, req);
  return ok(attachment, attachment.replayed ? 200 : 201);
});
