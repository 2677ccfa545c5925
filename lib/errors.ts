/**
 * Domain errors: what went wrong in words a person can act on, without any idea of HTTP. Services,
 * importers and uploads throw these; the HTTP edge maps them to a status (`errorResponse` in
 * lib/api/errors.ts, used by withRole) and pages map `NotFoundError` to the not-found page.
 */
import type { z } from 'zod';

/** Messages per input field, keyed by dotted path ("girders.0.offsets"), the form the API and forms share. */
export type FieldErrors = Record<string, string[]>;

/** Base of every domain error. The message is shown as is; `fields` name the inputs at fault. */
export class DomainError extends Error {
  constructor(
    message: string,
    readonly fields?: FieldErrors,
  ) {
    super(message);
    this.name = new.target.name;
  }
}

/** The input is not acceptable (HTTP 400). */
export class ValidationError extends DomainError {}

/** The thing asked for does not exist, or the id cannot name one (HTTP 404). */
export class NotFoundError extends DomainError {}

/** The request is stale or clashes with what is stored (HTTP 409). */
export class ConflictError extends DomainError {}

/** A file or body is larger than accepted (HTTP 413). */
export class TooLargeError extends DomainError {}

/** A file is of a kind that is not accepted (HTTP 415). */
export class UnsupportedTypeError extends DomainError {}

/** The input is well formed but its geometry cannot be built (HTTP 422). */
export class UnprocessableError extends DomainError {}

/** A service this one relies on (the mail server) refused or failed (HTTP 502). */
export class UpstreamError extends DomainError {}

/** zod issues keyed by their dotted path ("girders.0.offsets"); "_" for the whole input. */
export function fieldErrors(error: z.ZodError): FieldErrors {
  const fields: FieldErrors = {};
  for (const issue of error.issues) {
    const key = issue.path.length ? issue.path.map(String).join('.') : '_';
    (fields[key] ??= []).push(issue.message);
  }
  return fields;
}

/** A failed zod parse as a ValidationError naming the first field at fault in its message. */
export function invalidFields(error: z.ZodError): ValidationError {
  const fields = fieldErrors(error);
  const first = Object.entries(fields)[0];
  const where = first && first[0] !== '_' ? ` (${first[0]}: ${first[1][0]})` : first ? ` (${first[1][0]})` : '';
  return new ValidationError(`Some fields are not valid${where}. Correct them and try again.`, fields);
}
