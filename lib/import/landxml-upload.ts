/**
 * The LandXML upload behind POST /api/import/landxml: reads the multipart body (field `file`, 5 MB
 * limit, optional `units` field with the bridge's unit), decodes the text and hands it to the
 * importer. Nothing is stored: the answer is fragments for the editor to show and the user to save.
 */
import type { NextRequest } from 'next/server';
import { z } from 'zod';
import { HttpError } from '@/lib/api/errors';
import { filePart, readMultipart } from '@/lib/uploads/multipart';
import { LandXmlError, parseLandXml, type ImportedAlignment, type LengthUnit } from './landxml';

/** Largest LandXML file accepted, in bytes (5 MB). */
export const LANDXML_MAX_BYTES = 5 * 1024 * 1024;

const unitsField = z.enum(['ft', 'm'], { error: 'Units must be "ft" or "m" (the bridge\'s unit).' }).optional();

/** The answer of the import route: every usable alignment, and the first one's fragments at the top level. */
export interface LandXmlImportResponse {
  units: LengthUnit;
  linear_unit: string;
  alignments: ImportedAlignment[];
  skipped: { name: string; reason: string }[];
  alignment: ImportedAlignment['alignment'];
  profile: ImportedAlignment['profile'];
}

const tooLarge = () => new HttpError(413, 'The file is larger than 5 MB. Export only the alignments you need and try again.', { file: ['Choose a file of 5 MB or less.'] });

/** Decodes UTF-8 (with or without a byte-order mark) or UTF-16 with a byte-order mark; 415 for anything else. */
function decode(bytes: Uint8Array): string {
  const notText = () => new HttpError(415, 'The file is not a text XML file. Choose a LandXML (.xml) file.', { file: ['Choose a LandXML (.xml) file.'] });
  let text: string;
  try {
    if (bytes[0] === 0xff && bytes[1] === 0xfe) text = new TextDecoder('utf-16le', { fatal: true }).decode(bytes.subarray(2));
    else if (bytes[0] === 0xfe && bytes[1] === 0xff) text = new TextDecoder('utf-16be', { fatal: true }).decode(bytes.subarray(2));
    else text = new TextDecoder('utf-8', { fatal: true }).decode(bytes);
  } catch {
    throw notText();
  }
  if (!/^\uFEFF?\s*</.test(text) || text.includes('\u0000')) throw notText();
  return text;
}

function slim(a: ImportedAlignment): ImportedAlignment {
  return {
    name: a.name,
    alignment: {
      start_station: a.alignment.start_station,
      start_x: a.alignment.start_x,
      start_y: a.alignment.start_y,
      start_bearing_deg: a.alignment.start_bearing_deg,
      elements: a.alignment.elements.map((e) =>
        e.type === 'arc' ? { type: 'arc', length: e.length, radius: e.radius, direction: e.direction } : { type: 'line', length: e.length },
      ),
    },
    profile: a.profile ? { pvis: a.profile.pvis.map((p) => (p.curve_length ? { station: p.station, elevation: p.elevation, curve_length: p.curve_length } : { station: p.station, elevation: p.elevation })) } : null,
    profile_name: a.profile_name,
    notes: [...a.notes],
  };
}

/** Reads and imports an uploaded LandXML file; throws HttpError (400, 413, 415, 422) with a message a person can act on. */
export async function importLandXmlUpload(req: NextRequest): Promise<LandXmlImportResponse> {
  let form: FormData;
  let file: File;
  try {
    form = await readMultipart(req, LANDXML_MAX_BYTES);
    file = filePart(form, 'file', LANDXML_MAX_BYTES);
  } catch (err) {
    if (err instanceof HttpError && err.status === 413) throw tooLarge();
    throw err;
  }
  const unitsRaw = form.get('units');
  const units = unitsField.safeParse(typeof unitsRaw === 'string' && unitsRaw !== '' ? unitsRaw : undefined);
  if (!units.success) throw new HttpError(400, 'The units field must be "ft" or "m".', { units: [units.error.issues[0].message] });
  const text = decode(new Uint8Array(await file.arrayBuffer()));
  try {
    const result = parseLandXml(text, units.data);
    const alignments = result.alignments.map(slim);
    return {
      units: result.units,
      linear_unit: result.linear_unit,
      alignments,
      skipped: result.skipped.map((s) => ({ name: s.name, reason: s.reason })),
      alignment: alignments[0].alignment,
      profile: alignments[0].profile,
    };
  } catch (err) {
    if (err instanceof LandXmlError) throw new HttpError(err.status, err.message, { file: [err.message] });
    throw err;
  }
}
