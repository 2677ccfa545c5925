import type { NextRequest } from 'next/server';
import type { z } from 'zod';
import { invalidInput } from './errors';

/**
 * The request's query string checked against a zod schema of its parameters (each a string or
 * absent). Throws a 400 with field errors keyed by parameter name when it does not fit.
 */
export function readQuery<S extends z.ZodType>(req: NextRequest, schema: S): z.infer<S> {
  const parsed = schema.safeParse(Object.fromEntries(req.nextUrl.searchParams));
  if (!parsed.success) throw invalidInput(parsed.error);
  return parsed.data;
}
