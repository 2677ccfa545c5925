import { withRole, ok } from '@/lib/api/with-role';
import { importLandXmlUpload } from '@/lib/import/landxml-upload';

/** Multipart upload (field `file`, optional `units`) → alignment and profile fragments; nothing is stored. */
export const POST = withRole(['engineer'], undefined, async ({ req }) => ok(await importLandXmlUpload(req)));
