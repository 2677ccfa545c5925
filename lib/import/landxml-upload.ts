/**
 * The LandXML upload behind POST /api/import/landxml: reads the multipart body (field `file`, 5 MB
 * limit, optional `units` field with the bridge's unit), decodes the text and hands it to the
 * importer. Nothing is stored: the answer is fragments for the editor to show and the user to save.
 */
import { z } from 'zod';
import { HttpError } from '@/lib/api/errors';
import { shortList } from '@/lib/api/problem-list';
import { TooLargeError, ValidationError } from '@/lib/errors';
import { filePart, readMultipart } from '@/lib/uploads/multipart';
import { checkAlignmentCount } from './landxml-limits';
import type { AlignmentElementInput } from '@/lib/geometry';
import { LandXmlAlignmentsError, LandXmlError, parseLandXml, type ImportedAlignment, type LengthUnit, type SkippedAlignment } from './landxml';
import { decodeXmlBytes, XmlReadError } from './xml-tree';

/** Largest LandXML file accepted, in bytes (5 MB). */
export const LANDXML_MAX_BYTES = 5 * 1024 * 1024;

const unitsField = z.enum(['ft', 'm'], { error: 'Units must be "ft" or "m" (the bridge\'s unit).' }).optional();

/** The answer of the import route: every usable alignment, and the first one's fragments at the top level. */
export interface LandXmlImportResponse {
  units: LengthUnit;
  linear_unit: string;
  alignments: ImportedAlignment[];
  skipped: (SkippedAlignment & { problem_count: number })[];
  alignment: ImportedAlignment['alignment'];
  profile: ImportedAlignment['profile'];
}

const tooLarge = () => new TooLargeError('The file is larger than 5 MB. Export only the alignments you need and try again.', { file: ['Choose a file of 5 MB or less.'] });

/** Decodes the bytes by their byte-order mark or declared encoding; 415 when they are not text. */
function decode(bytes: Uint8Array): string {
  try {
    return decodeXmlBytes(bytes);
  } catch (err) {
    if (err instanceof XmlReadError) throw new HttpError(err.status, err.message, { file: ['Choose a LandXML (.xml) file.'] });
    throw err;
  }
}

const slimElement = (e: AlignmentElementInput): AlignmentElementInput =>
  e.type === 'arc'
    ? { type: 'arc', length: e.length, radius: e.radius, direction: e.direction }
    : e.type === 'spiral'
      ? { type: 'spiral', length: e.length, radius_start: e.radius_start, radius_end: e.radius_end, direction: e.direction }
      : { type: 'line', length: e.length };

function slim(a: ImportedAlignment): ImportedAlignment {
  return {
    name: a.name,
    alignment: {
      start_station: a.alignment.start_station,
      start_x: a.alignment.start_x,
      start_y: a.alignment.start_y,
      start_bearing_deg: a.alignment.start_bearing_deg,
      elements: a.alignment.elements.map(slimElement),
    },
    profile: a.profile
      ? { pvis: a.profile.pvis.map((p) => (p.curve_length ? { station: p.station, elevation: p.elevation, curve_length: p.curve_length } : { station: p.station, elevation: p.elevation })) }
      : null,
    profile_name: a.profile_name,
    profile_left_out: a.profile_left_out ? [...a.profile_left_out] : null,
    notes: [...a.notes],
  };
}

/**
 * Field errors of a file none of whose alignments could be imported, shaped like the successful
 * answer's `skipped` list: `alignments.<i>.name` and `alignments.<i>.problems` per alignment.
 */
function failedFields(failed: SkippedAlignment[]): Record<string, string[]> {
  const fields: Record<string, string[]> = { file: [failed.length === 1 ? 'The alignment in this file could not be imported.' : 'No alignment in this file could be imported.'] };
  failed.forEach((f, i) => {
    fields[`alignments.${i}.name`] = [f.name];
    fields[`alignments.${i}.problems`] = [...f.problems];
  });
  return fields;
}

/**
 * Reads and imports an uploaded LandXML file (the upload edge: the reader's own errors keep their HTTP
 * status); throws ValidationError, TooLargeError or HttpError (400, 415, 422) with a message a person can act on.
 */
export async function importLandXmlUpload(req: Request): Promise<LandXmlImportResponse> {
  let form: FormData;
  let file: File;
  try {
    form = await readMultipart(req, LANDXML_MAX_BYTES);
    file = filePart(form, 'file', LANDXML_MAX_BYTES);
  } catch (err) {
    if (err instanceof TooLargeError) throw tooLarge();
    throw err;
  }
  const unitsRaw = form.get('units');
  const units = unitsField.safeParse(typeof unitsRaw === 'string' && unitsRaw !== '' ? unitsRaw : undefined);
  if (!units.success) throw new ValidationError('The units field must be "ft" or "m".', { units: [units.error.issues[0].message] });
  const text = decode(new Uint8Array(await file.arrayBuffer()));
  checkAlignmentCount(text);
  try {
    const result = parseLandXml(text, units.data);
    const alignments = result.alignments.map(slim);
    return {
      units: result.units,
      linear_unit: result.linear_unit,
      alignments,
      // Each skipped alignment lists its first 20 problems and counts them all (lib/api/problem-list.ts).
      skipped: result.skipped.map((s) => ({ name: s.name, reason: s.reason, ...shortList(s.problems) })),
      alignment: alignments[0].alignment,
      profile: alignments[0].profile,
    };
  } catch (err) {
    if (err instanceof LandXmlAlignmentsError) throw new HttpError(err.status, err.message, failedFields(err.failed));
    if (err instanceof LandXmlError) throw new HttpError(err.status, err.message, { file: [err.message] });
    throw err;
  }
}
