import { parseBridge, parseBridgeSchema, type BridgeDescription } from '@/lib/geometry';
import { assertDescriptionSize } from '@/lib/limits/assert-description-size';
import { UnprocessableError, ValidationError } from '@/lib/errors';

function schemaError(result: { fields: Record<string, string[]>; message: string }, fieldPrefix: string): ValidationError {
  const fields: Record<string, string[]> = {};
  for (const [k, v] of Object.entries(result.fields)) {
    const key = fieldPrefix === '_' ? k : k === '_' ? fieldPrefix : `${fieldPrefix}.${k}`;
    fields[key] = v;
  }
  return new ValidationError(result.message, fields);
}

/**
 * Validates a bridge description for storage: schema problems are 400 with field errors, geometry
 * that cannot be built is 422 naming the span, girder or point. Stored revisions always compute.
 */
export function checkedDescription(json: unknown, fieldPrefix = 'description'): BridgeDescription {
  assertDescriptionSize(json, fieldPrefix);
  const result = parseBridge(json);
  if (result.ok) return result.bridge;
  if (result.kind === 'schema') throw schemaError(result, fieldPrefix);
  throw new UnprocessableError(result.message);
}

/** The schema check alone (400 with field errors); the caller computes, which checks the geometry. */
export function schemaCheckedDescription(json: unknown, fieldPrefix = 'description'): BridgeDescription {
  const result = parseBridgeSchema(json);
  if (result.ok) return result.bridge;
  throw schemaError(result, fieldPrefix);
}
