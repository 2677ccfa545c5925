import { z } from 'zod';
import { requireBridge } from './require-bridge';
import type { SessionUser } from '@/lib/auth/session';
import { db } from '@/lib/db/connection';
import { Bridge } from '@/models';
import { audit } from './audit';
import type { Units } from '@/lib/units';

/**
 * Default field-check tolerances and base rod length per unit system, in that unit. Common practice:
 * ±1/4 inch on the edge width and ±0.01 ft on the level-bar reading; 6 mm and 3 mm in metric work.
 * Base rod length 0.50 ft / 150 mm (common practice: a short rod that clears the girder's top flange).
 */
export const FIELD_DEFAULTS: Record<Units, { width: number; reading: number; baseRod: number }> = {
  ft: { width: 0.25 / 12, reading: 0.01, baseRod: 0.5 },
  m: { width: 0.006, reading: 0.003, baseRod: 0.15 },
};

export type FieldSettings = {
  units: Units;
  /** Tolerance on the edge width (±, bridge units). */
  width_tolerance: number;
  /** Tolerance on the level-bar reading (±, bridge units). */
  reading_tolerance: number;
  /** Shortest rod of the level bar on the field sheet (bridge units). */
  base_rod_length: number;
  /** Which values are the defaults rather than set for this bridge. */
  is_default: { width_tolerance: boolean; reading_tolerance: boolean; base_rod_length: boolean };
  defaults: { width_tolerance: number; reading_tolerance: number; base_rod_length: number };
};

/** The bridge's tolerances and base rod length, defaults filled in where it has none of its own. */
export function fieldSettingsOf(bridge: Bridge): FieldSettings {
  const units: Units = bridge.units === 'm' ? 'm' : 'ft';
  const d = FIELD_DEFAULTS[units];
  const pick = (v: number | null | undefined, fallback: number) => (typeof v === 'number' && Number.isFinite(v) && v > 0 ? v : fallback);
  return {
    units,
    width_tolerance: pick(bridge.widthTolerance, d.width),
    reading_tolerance: pick(bridge.readingTolerance, d.reading),
    base_rod_length: pick(bridge.baseRodLength, d.baseRod),
    is_default: {
      width_tolerance: bridge.widthTolerance == null,
      reading_tolerance: bridge.readingTolerance == null,
      base_rod_length: bridge.baseRodLength == null,
    },
    defaults: { width_tolerance: d.width, reading_tolerance: d.reading, base_rod_length: d.baseRod },
  };
}

const positive = (what: string) =>
  z
    .number({ error: `${what} must be a number in the bridge's units, or null for the default.` })
    .positive(`${what} must be greater than zero.`)
    .max(10, `${what} looks far too large; give it in the bridge's units.`)
    .nullable()
    .optional();

/** PATCH body: any of the three; null puts a value back to its default. */
export const updateFieldSettingsSchema = z
  .object({
    width_tolerance: positive('The edge width tolerance'),
    reading_tolerance: positive('The level-bar reading tolerance'),
    base_rod_length: positive('The base rod length'),
  })
  .strict()
  .refine((v) => Object.keys(v).length > 0, { message: 'Send at least one of width_tolerance, reading_tolerance, base_rod_length.' });

export async function getFieldSettings(id: string): Promise<FieldSettings> {
  return fieldSettingsOf(await requireBridge(id));
}

/** An engineer sets the bridge's tolerances or base rod length; audited with before and after. */
export async function updateFieldSettings(user: SessionUser, id: string, input: z.infer<typeof updateFieldSettingsSchema>): Promise<FieldSettings> {
  const bridge = await requireBridge(id);
  const before = fieldSettingsOf(bridge);
  const sequelize = await db();
  await sequelize.transaction(async (transaction) => {
    if (input.width_tolerance !== undefined) bridge.widthTolerance = input.width_tolerance;
    if (input.reading_tolerance !== undefined) bridge.readingTolerance = input.reading_tolerance;
    if (input.base_rod_length !== undefined) bridge.baseRodLength = input.base_rod_length;
    await bridge.save({ transaction });
    const after = fieldSettingsOf(bridge);
    await audit(
      user.id,
      'tolerances.update',
      'bridge',
      bridge.id,
      {
        before: { width_tolerance: before.width_tolerance, reading_tolerance: before.reading_tolerance, base_rod_length: before.base_rod_length },
        after: { width_tolerance: after.width_tolerance, reading_tolerance: after.reading_tolerance, base_rod_length: after.base_rod_length },
      },
      transaction,
    );
  });
  return fieldSettingsOf(bridge);
}
