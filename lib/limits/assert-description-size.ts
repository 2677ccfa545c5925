import { HttpError } from '@/lib/api/errors';
import { shortProblemBody } from '@/lib/api/problem-list';
import { descriptionSizeProblems } from './description-size';

/**
 * Refuses a description with a size no bridge reaches or a girder name over the one name limit:
 * 422 naming each limit (first 20), field keys under `fieldPrefix` as the storage routes report them.
 */
export function assertDescriptionSize(json: unknown, fieldPrefix = 'description'): void {
  const problems = descriptionSizeProblems(json);
  if (!problems.length) return;
  const body = shortProblemBody(
    `This description is larger than any bridge: ${problems[0].message}`,
    problems.map((p) => ({ ...p, path: fieldPrefix === '_' ? p.path : `${fieldPrefix}.${p.path}` })),
  );
  throw new HttpError(422, body.error, body.fields);
}
