import { NextResponse } from 'next/server';
import { ConflictError, DomainError, fieldErrors, invalidFields, NotFoundError, TooLargeError, UnprocessableError, UnsupportedTypeError, UpstreamError, ValidationError } from '@/lib/errors';
import { shortProblemBody } from './problem-list';

export { fieldErrors };

/**
 * An error of the HTTP edge itself (body reading, origin and content-type checks), with its status.
 * Below the edge, code throws the domain errors of lib/errors.ts instead. The message is shown as is.
 */
export class HttpError extends Error {
  constructor(
    readonly status: number,
    message: string,
    readonly fields?: Record<string, string[]>,
  ) {
    super(message);
  }
}

/** A failed zod parse of a request: 400 with the field errors. */
export function invalidInput(error: Parameters<typeof invalidFields>[0]): ValidationError {
  return invalidFields(error);
}

/** The HTTP status of each domain error. */
const STATUS: [new (...args: never[]) => DomainError, number][] = [
  [ValidationError, 400],
  [NotFoundError, 404],
  [ConflictError, 409],
  [TooLargeError, 413],
  [UnsupportedTypeError, 415],
  [UnprocessableError, 422],
  [UpstreamError, 502],
];

/** The HTTP status a domain error maps to (400 for one of no known kind). */
export function statusOf(err: DomainError): number {
  return STATUS.find(([kind]) => err instanceof kind)?.[1] ?? 400;
}

/** Answers to bad input, whose problem lists a hostile input could make long: listed short. */
const INPUT_PROBLEM_STATUSES = new Set([400, 413, 415, 422]);

/**
 * A JSON error answer. The field errors of a refused input (400, 413, 415, 422) are listed short
 * (lib/api/problem-list.ts): the first 20 and `problem_count`, so no input can make an error body
 * large. Other answers keep their list whole: a sign-off's 409 lists the checks still missing, a work
 * list bounded by the stored bridge, not by what a request sends.
 */
export function jsonError(status: number, error: string, fields?: Record<string, string[]>): NextResponse {
  if (!fields) return NextResponse.json({ error }, { status });
  return NextResponse.json(INPUT_PROBLEM_STATUSES.has(status) ? shortProblemBody(error, fields) : { error, fields }, { status });
}

/** Maps anything thrown in a handler to a JSON answer that never carries a stack trace. */
export function errorResponse(err: unknown): NextResponse {
  if (err instanceof HttpError) return jsonError(err.status, err.message, err.fields);
  if (err instanceof DomainError) return jsonError(statusOf(err), err.message, err.fields);
  console.error('[chordline] unhandled error:', err);
  return jsonError(500, 'Something went wrong on the server. Try again; if it keeps happening, tell your administrator.');
}
