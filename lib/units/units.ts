/**
 * The length unit of a bridge: every length, station, elevation and offset of one bridge is in its
 * unit ("ft" for US survey or international feet as the description gives them, "m" for metres).
 * Declared here once; everything else imports it.
 */
export type Units = 'ft' | 'm';

/** Length of one station block: 100 ft or 1000 m. */
export const stationBlock = (units: Units): number => (units === 'm' ? 1000 : 100);

/** Decimal places shown for a length in these units: 0.01 ft or 0.001 m. */
export function decimalsFor(units: Units): number {
  return units === 'm' ? 3 : 2;
}
