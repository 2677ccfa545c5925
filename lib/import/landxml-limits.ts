import { HttpError } from '@/lib/api/errors';

/** Most alignments one LandXML file may hold: a corridor export has a handful; no bridge needs more. */
export const MAX_LANDXML_ALIGNMENTS = 100;

/**
 * Refuses (422, naming the limit) a LandXML text holding more than {@link MAX_LANDXML_ALIGNMENTS}
 * Alignment elements, counted on the text before anything parses it.
 */
export function checkAlignmentCount(text: string): void {
  const count = text.match(/<(?:[A-Za-z_][\w.-]*:)?Alignment[\s>/]/g)?.length ?? 0;
  if (count <= MAX_LANDXML_ALIGNMENTS) return;
  const message = `The file holds ${count} alignments; the limit is ${MAX_LANDXML_ALIGNMENTS}. Export only the alignments you need and try again.`;
  throw new HttpError(422, message, { file: [message] });
}
