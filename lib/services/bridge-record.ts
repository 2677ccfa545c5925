import { z } from 'zod';
import type { Bridge } from '@/models';

/** Where a bridge job stands: drawn, forms being set, overhangs checked, deck poured. */
export const STAGES = ['design', 'forming', 'checked', 'poured'] as const;
export type Stage = (typeof STAGES)[number];

/** Plain words for each stage, for lists and filters. */
export const STAGE_LABELS: Record<Stage, string> = {
  design: 'Design',
  forming: 'Forming',
  checked: 'Checked',
  poured: 'Poured',
};

const text = (what: string, max: number) =>
  z
    .string({ error: `${what} must be text.` })
    .trim()
    .max(max, `Keep the ${what.toLowerCase()} under ${max} characters.`)
    .regex(/^[^\u0000-\u001f\u007f]*$/, `${what} cannot hold control characters.`);

/**
 * The bridge record a district files a bridge by, as the API takes it (camelCase). Every field is
 * optional; an empty string clears it. Stored as '' when empty.
 */
export const bridgeRecordSchema = z.object({
  structureNumber: text('Structure number', 40).optional(),
  route: text('Route or road', 120).optional(),
  featureCrossed: text('Feature crossed', 200).optional(),
  district: text('County or district', 120).optional(),
  contractor: text('Contractor', 200).optional(),
  stage: z.enum(STAGES, { error: `Stage must be one of ${STAGES.join(', ')}.` }).optional(),
});
export type BridgeRecordInput = z.infer<typeof bridgeRecordSchema>;

/** The record as the API returns it: null where nothing is filed. */
export type BridgeRecord = {
  structureNumber: string | null;
  route: string | null;
  featureCrossed: string | null;
  district: string | null;
  contractor: string | null;
  stage: Stage;
};

export const RECORD_KEYS = ['structureNumber', 'route', 'featureCrossed', 'district', 'contractor', 'stage'] as const;

export function recordOf(b: Bridge): BridgeRecord {
  const orNull = (v: string | null | undefined) => (v ? v : null);
  return {
    structureNumber: orNull(b.structureNumber),
    route: orNull(b.route),
    featureCrossed: orNull(b.featureCrossed),
    district: orNull(b.district),
    contractor: orNull(b.contractor),
    stage: (STAGES as readonly string[]).includes(b.stage) ? (b.stage as Stage) : 'design',
  };
}

/** The model attributes to write for the fields present in `input` (absent fields stay as they are). */
export function recordAttributes(input: BridgeRecordInput): Partial<Pick<Bridge, (typeof RECORD_KEYS)[number]>> {
  const out: Partial<Record<(typeof RECORD_KEYS)[number], string>> = {};
  for (const key of RECORD_KEYS) {
    const v = input[key];
    if (v !== undefined) out[key] = v;
  }
  return out;
}
