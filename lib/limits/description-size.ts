/**
 * Sizes no bridge reaches, checked on the raw JSON before any schema or engine work (the data
 * contract's "Refused as impossible" list), and the nesting depth any request body may have.
 * Pure: no I/O, no next/*, usable inside the compute worker.
 */

/** The contract's limits (bridge-format.md, "Refused as impossible for a bridge deck"). */
export const DESCRIPTION_LIMITS = {
  points_per_span: 200,
  chord_spaces: 200,
  alignment_elements: 10_000,
  bents: 200,
  girders: 40,
  top_of_girder: 50_000,
  deflection_values: 201,
} as const;

/**
 * Longest girder name, characters: the one limit everywhere a girder is named (descriptions, field
 * checks, surveyed tops; the field_checks.girder column holds 60).
 */
export const GIRDER_NAME_MAX = 60;

/** Deepest nesting of arrays and objects a request body may have (a description needs 4). */
export const MAX_JSON_DEPTH = 32;

export type SizeProblem = { path: string; message: string };

const len = (v: unknown) => (Array.isArray(v) ? v.length : 0);

/** Every size over the contract's limits, each naming its limit. Empty when none is over. */
export function descriptionSizeProblems(json: unknown): SizeProblem[] {
  if (!json || typeof json !== 'object' || Array.isArray(json)) return [];
  const d = json as Record<string, unknown>;
  const L = DESCRIPTION_LIMITS;
  const out: SizeProblem[] = [];
  const over = (path: string, n: number, limit: number, what: string) => {
    if (n > limit) out.push({ path, message: `${what} is ${n}; the limit is ${limit} (no bridge needs more).` });
  };
  if (typeof d.points_per_span === 'number') over('points_per_span', d.points_per_span, L.points_per_span, 'points_per_span');
  if (typeof d.chord_spaces === 'number') over('chord_spaces', d.chord_spaces, L.chord_spaces, 'chord_spaces');
  const alignment = d.alignment as Record<string, unknown> | undefined;
  over('alignment.elements', len(alignment && typeof alignment === 'object' ? alignment.elements : undefined), L.alignment_elements, 'The number of alignment elements');
  over('bents', len(d.bents), L.bents, 'The number of bents');
  over('girders', len(d.girders), L.girders, 'The number of girders');
  over('top_of_girder', len(d.top_of_girder), L.top_of_girder, 'The number of surveyed girder tops');
  if (Array.isArray(d.girders)) {
    d.girders.forEach((g, i) => {
      const name = g && typeof g === 'object' ? (g as Record<string, unknown>).name : undefined;
      if (typeof name === 'string' && name.length > GIRDER_NAME_MAX) {
        out.push({ path: `girders.${i}.name`, message: `Girder ${i + 1}'s name is ${name.length} characters; the limit is ${GIRDER_NAME_MAX}.` });
      }
    });
  }
  if (Array.isArray(d.deflections)) {
    d.deflections.forEach((entry, i) => {
      const values = entry && typeof entry === 'object' ? (entry as Record<string, unknown>).values : undefined;
      over(`deflections.${i}.values`, len(values), L.deflection_values, `Deflection table ${i + 1}'s number of values`);
    });
  }
  return out;
}

/** True when arrays and objects in `value` nest deeper than `limit` (checked without recursion). */
export function nestedDeeperThan(value: unknown, limit = MAX_JSON_DEPTH): boolean {
  const stack: [unknown, number][] = [[value, 1]];
  while (stack.length) {
    const [node, depth] = stack.pop()!;
    if (!node || typeof node !== 'object') continue;
    if (depth > limit) return true;
    for (const child of Array.isArray(node) ? node : Object.values(node)) {
      if (child && typeof child === 'object') stack.push([child, depth + 1]);
    }
  }
  return false;
}
