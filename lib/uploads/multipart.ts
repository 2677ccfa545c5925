import { TooLargeError, ValidationError } from '@/lib/errors';
import { readBodyLimited } from '@/lib/api/body';

/** Largest file accepted, in bytes (10 MB). */
export const MAX_UPLOAD_BYTES = 10 * 1024 * 1024;
/** Room for the multipart framing and the small text fields around the file. */
const FRAMING_BYTES = 64 * 1024;

const tooLarge = () => new TooLargeError('The file is larger than 10 MB. Send a smaller photo or PDF.');

/**
 * Reads a multipart/form-data body with a hard size limit (413 before reading more than the limit),
 * then parses it. Anything that is not multipart is a 400.
 */
export async function readMultipart(req: Request, limit = MAX_UPLOAD_BYTES): Promise<FormData> {
  const type = req.headers.get('content-type') ?? '';
  if (!/^multipart\/form-data;/i.test(type)) throw new ValidationError('Send the file as multipart/form-data in a field named "file".', { file: ['Choose a file.'] });
  const cap = limit + FRAMING_BYTES;
  const body = await readBodyLimited(req, cap, tooLarge, () => new ValidationError('The request has no file.', { file: ['Choose a file.'] }));
  try {
    return await new Response(new Uint8Array(body), { headers: { 'content-type': type } }).formData();
  } catch {
    throw new ValidationError('The upload could not be read as multipart/form-data.', { file: ['Choose the file again and resend.'] });
  }
}

/** The file part named `name`; 400 when it is missing, 413 when it is over the limit. */
export function filePart(form: FormData, name = 'file', limit = MAX_UPLOAD_BYTES): File {
  const file = form.get(name);
  if (!file || typeof file === 'string') throw new ValidationError('Attach the file in a field named "file".', { file: ['Choose a file.'] });
  if (file.size > limit) throw tooLarge();
  if (file.size === 0) throw new ValidationError('The file is empty.', { file: ['Choose a file that is not empty.'] });
  return file;
}
