import { parseBridge, type BridgeDescription } from '@/lib/geometry';
import { HttpError } from '@/lib/api/errors';

/**
 * Validates a bridge description for storage: schema problems are 400 with field errors, geometry
 * that cannot be built is 422 naming the span, girder or point. Stored revisions always compute.
 */
export function checkedDescription(json: unknown, fieldPrefix = 'description'): BridgeDescription {
  const result = parseBridge(json);
  if (result.ok) return result.bridge;
  if (result.kind === 'schema') {
    const fields: Record<string, string[]> = {};
    for (const [k, v] of Object.entries(result.fields)) fields[k === '_' ? fieldPrefix : `${fieldPrefix}.${k}`] = v;
    throw new HttpError(400, result.message, fields);
  }
  throw new HttpError(422, result.message);
}
