import { NextResponse } from 'next/server';
import type { z } from 'zod';

/** An error a person can act on, with the HTTP status it maps to. The message is shown as is. */
export class HttpError extends Error {
  constructor(
    readonly status: number,
    message: string,
    readonly fields?: Record<string, string[]>,
  ) {
    super(message);
  }
}

/** zod issues keyed by their dotted path ("girders.0.offsets"), the form the API and forms share. */
export function fieldErrors(error: z.ZodError): Record<string, string[]> {
  const fields: Record<string, string[]> = {};
  for (const issue of error.issues) {
    const key = issue.path.length ? issue.path.map(String).join('.') : '_';
    (fields[key] ??= []).push(issue.message);
  }
  return fields;
}

export function invalidInput(error: z.ZodError): HttpError {
  const fields = fieldErrors(error);
  const first = Object.entries(fields)[0];
  const where = first && first[0] !== '_' ? ` (${first[0]}: ${first[1][0]})` : first ? ` (${first[1][0]})` : '';
  return new HttpError(400, `Some fields are not valid${where}. Correct them and try again.`, fields);
}

export function jsonError(status: number, error: string, fields?: Record<string, string[]>): NextResponse {
  return NextResponse.json(fields ? { error, fields } : { error }, { status });
}

/** Maps anything thrown in a handler to a JSON answer that never carries a stack trace. */
export function errorResponse(err: unknown): NextResponse {
  if (err instanceof HttpError) return jsonError(err.status, err.message, err.fields);
  console.error('[chordline] unhandled error:', err);
  return jsonError(500, 'Something went wrong on the server. Try again; if it keeps happening, tell your administrator.');
}
