import type { NextRequest } from 'next/server';
import { HttpError } from './errors';
import { MAX_JSON_DEPTH, nestedDeeperThan } from '@/lib/limits/description-size';

/** Largest JSON body the API accepts, in bytes. */
export const MAX_JSON_BYTES = 1024 * 1024;

/**
 * Reads a request body into memory, stopping as soon as it passes `cap` bytes (declared or actual).
 * `tooLarge` and `missing` make the errors the caller wants to answer with.
 */
export async function readBodyLimited(req: Request, cap: number, tooLarge: () => Error, missing: () => Error): Promise<Buffer> {
  const declared = Number(req.headers.get('content-length') ?? '0');
  if (declared > cap) throw tooLarge();
  const reader = req.body?.getReader();
  if (!reader) throw missing();
  const chunks: Uint8Array[] = [];
  let size = 0;
  for (;;) {
    const { done, value } = await reader.read();
    if (done) break;
    size += value.byteLength;
    if (size > cap) {
      await reader.cancel();
      throw tooLarge();
    }
    chunks.push(value);
  }
  return Buffer.concat(chunks);
}

/**
 * The text of a JSON body, unparsed (for work done elsewhere, such as the compute worker): 415 unless
 * the Content-Type is application/json, 413 over the limit, 400 when missing or empty.
 */
export async function readJsonText(req: NextRequest, limit = MAX_JSON_BYTES): Promise<string> {
  if (req.body === null) throw new HttpError(400, 'The request has no body; send JSON.');
  if (!/^application\/json\s*(;|$)/i.test(req.headers.get('content-type') ?? '')) {
    throw new HttpError(415, 'Send the body as JSON with the header Content-Type: application/json.');
  }
  const text = (
    await readBodyLimited(
      req,
      limit,
      () => new HttpError(413, `The request body is larger than ${Math.round(limit / 1024)} KB.`),
      () => new HttpError(400, 'The request has no body; send JSON.'),
    )
  ).toString('utf8');
  if (!text.trim()) throw new HttpError(400, 'The request body is empty; send JSON.');
  return text;
}

/**
 * Reads a JSON body with a size limit; malformed, oversized or absurdly nested input becomes a
 * 400/413 HttpError (deep nesting would overflow the stack of the checks that walk it).
 */
export async function readJson(req: NextRequest, limit = MAX_JSON_BYTES): Promise<unknown> {
  const body = await readBodyLimited(
    req,
    limit,
    () => new HttpError(413, `The request body is larger than ${Math.round(limit / 1024)} KB.`),
    () => new HttpError(400, 'The request has no body; send JSON.'),
  );
  const text = body.toString('utf8');
  if (!text.trim()) throw new HttpError(400, 'The request body is empty; send JSON.');
  let value: unknown;
  try {
    value = JSON.parse(text);
  } catch {
    throw new HttpError(400, 'The request body is not valid JSON.');
  }
  if (nestedDeeperThan(value)) throw new HttpError(400, `The request body nests deeper than ${MAX_JSON_DEPTH} levels; nothing this app reads does.`);
  return value;
}
