/**
 * LandXML 1.2 import: reads the horizontal geometry (Alignment / CoordGeom Line, Curve and clothoid
 * Spiral) and the design profile (Profile / ProfAlign PVI, ParaCurve, CircCurve) of each alignment and
 * turns them into bridge-format `alignment` and `profile` fragments (see the shared bridge-format
 * contract).
 *
 * LandXML gives plan coordinates NORTHING FIRST ("N E"); the bridge format uses x = easting,
 * y = northing. Curve and Spiral rot="cw" turn right (bearing grows), rot="ccw" left. Bearings here
 * are azimuths clockwise from north. Line and Curve lengths, radii and bearings are taken from the
 * element points (Start, Center, End) so the imported alignment passes through the points the file
 * gives; a Spiral's length and radii come from its attributes and are checked against its points.
 * Every problem is reported with its station; a profile that cannot be used is left out (with its
 * reasons) and the horizontal alignment is imported without it.
 */
import type { AlignmentElementInput, PviInput } from '@/lib/geometry';
import { AlignmentProblems, readHorizontal } from './landxml-alignment';
import { fail, LandXmlError, type LengthUnit } from './landxml-points';
import { readProfile } from './landxml-profile';
import { childNamed, childrenNamed, readXml, XmlReadError, type XmlNode } from './xml-tree';

export { LandXmlError, type LengthUnit } from './landxml-points';
export { ATTRIBUTE_TOLERANCE, JOIN_TOLERANCE, SNAP_TOLERANCE } from './landxml-elements';
export { TANGENCY_TOLERANCE } from './landxml-alignment';

/** One alignment of the file, ready to replace a bridge description's `alignment` and `profile`. */
export interface ImportedAlignment {
  name: string;
  alignment: {
    start_station: number;
    start_x: number;
    start_y: number;
    start_bearing_deg: number;
    elements: AlignmentElementInput[];
  };
  /** The first ProfAlign of the alignment; null when the file gives none or it cannot be used. */
  profile: { pvis: PviInput[] } | null;
  /** Name of the ProfAlign the profile came from. */
  profile_name: string | null;
  /** Why no profile came with the alignment (each problem with its station); null when one did. */
  profile_left_out: string[] | null;
  /** Things worth knowing that did not stop the import (sentences). */
  notes: string[];
}

/** An alignment of the file that could not be imported: every problem found, each with its station. */
export interface SkippedAlignment {
  name: string;
  /** One line: the first problem and how many more. */
  reason: string;
  problems: string[];
}

export interface LandXmlImport {
  /** The file's linear unit mapped to the bridge's ("ft" for foot and USSurveyFoot, "m" for meter). */
  units: LengthUnit;
  /** The linearUnit attribute as written in the file. */
  linear_unit: string;
  alignments: ImportedAlignment[];
  /** Alignments of the file that could not be imported, with every reason. */
  skipped: SkippedAlignment[];
}

/** The whole file refused because no alignment could be imported: a list of problems per alignment. */
export class LandXmlAlignmentsError extends LandXmlError {
  constructor(readonly failed: SkippedAlignment[]) {
    super(
      422,
      failed.length === 1
        ? `Alignment "${failed[0].name}" could not be imported: ${failed[0].problems.length === 1 ? failed[0].problems[0] : `${failed[0].problems.length} problems.`}`
        : `No alignment in the file could be imported: ${failed.map((f) => `"${f.name}" (${f.problems.length} ${f.problems.length === 1 ? 'problem' : 'problems'})`).join(', ')}.`,
    );
  }
}

const LINEAR_UNITS: Record<string, LengthUnit> = {
  foot: 'ft',
  ussurveyfoot: 'ft',
  internationalfoot: 'ft',
  meter: 'm',
  metre: 'm',
};

function readAlignment(node: XmlNode, index: number, cg: Map<string, string>, units: LengthUnit): ImportedAlignment {
  const name = node.attrs.name?.trim() || `Alignment ${index + 1}`;
  const horizontal = readHorizontal(node, `Alignment "${name}"`, cg, units);
  const profile = readProfile(node, units, horizontal.alignment.start_station, horizontal.endStation);
  const notes = [...horizontal.notes, ...profile.notes];
  if (profile.leftOut) {
    const why = profile.leftOut.length === 1 ? profile.leftOut[0] : `${profile.leftOut.length} problems, listed with the profile.`;
    notes.push(`No profile came with this alignment: ${/^[A-Z][a-z]/.test(why) ? why.charAt(0).toLowerCase() + why.slice(1) : why} Enter the profile from the plans in the editor.`);
  }
  return {
    name,
    alignment: horizontal.alignment,
    profile: profile.profile,
    profile_name: profile.name,
    profile_left_out: profile.leftOut,
    notes,
  };
}

function cgPointsOf(root: XmlNode): Map<string, string> {
  const map = new Map<string, string>();
  for (const group of childrenNamed(root, 'CgPoints')) {
    for (const p of childrenNamed(group, 'CgPoint')) if (p.attrs.name) map.set(p.attrs.name, p.text);
  }
  return map;
}

/**
 * Reads a LandXML 1.2 document (text) into bridge-format alignment and profile fragments, one per
 * Alignment. Lengths, stations, coordinates and elevations stay in the file's linear unit; bearings
 * in degrees clockwise from north; arcs turn "right" for rot="cw", "left" for rot="ccw".
 * @param text the whole file as text.
 * @param expectUnits the bridge's unit; when given, a file in another unit is refused (422).
 * @throws LandXmlError 400 for a DOCTYPE/ENTITY declaration or text that is not XML; 422 for a file
 *   that is not LandXML, has no usable alignment, uses unsupported elements or another unit.
 */
export function parseLandXml(text: string, expectUnits?: LengthUnit): LandXmlImport {
  let root: XmlNode;
  try {
    root = readXml(text);
  } catch (err) {
    if (err instanceof XmlReadError) throw new LandXmlError(err.status, err.message);
    throw err;
  }
  if (root.name !== 'LandXML') fail(`The file's root element is <${root.name}>, not <LandXML>; choose a LandXML 1.2 file.`);
  const unitsNode = childNamed(root, 'Units');
  const system = unitsNode ? (childNamed(unitsNode, 'Imperial') ?? childNamed(unitsNode, 'Metric')) : undefined;
  const linearUnit = system?.attrs.linearUnit;
  if (!linearUnit) fail('The file does not state its linear unit (Units / Imperial or Metric, linearUnit).');
  const units = LINEAR_UNITS[(linearUnit as string).toLowerCase()];
  if (!units) fail(`The file's linear unit is "${linearUnit}"; Chordline imports feet (foot, USSurveyFoot) or metres (meter).`);
  if (expectUnits && units !== expectUnits) {
    const name = (u: LengthUnit) => (u === 'ft' ? 'feet' : 'metres');
    fail(`The file is in ${name(units)} (linearUnit "${linearUnit}") but this bridge is in ${name(expectUnits)}; export the file in ${name(expectUnits)}.`);
  }
  const cg = cgPointsOf(root);
  const nodes = childrenNamed(root, 'Alignments').flatMap((group) => childrenNamed(group, 'Alignment'));
  if (nodes.length === 0) fail('The file holds no Alignment, so there is nothing to import.');
  const alignments: ImportedAlignment[] = [];
  const skipped: SkippedAlignment[] = [];
  nodes.forEach((n, i) => {
    try {
      alignments.push(readAlignment(n, i, cg, units));
    } catch (err) {
      if (!(err instanceof LandXmlError)) throw err;
      const problems = err instanceof AlignmentProblems ? err.problems : [err.message];
      skipped.push({ name: n.attrs.name?.trim() || `Alignment ${i + 1}`, reason: err.message, problems });
    }
  });
  if (alignments.length === 0) throw new LandXmlAlignmentsError(skipped);
  return { units, linear_unit: linearUnit as string, alignments, skipped };
}
