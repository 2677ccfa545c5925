import type { BracketGroup } from '@/components/checks/check-types';

/**
 * True when any bracket of the bridge has a dead-load deflection: the bridge has a deflection table,
 * so field mode and the field sheet add the deflection and screed grade. Rows kept on a phone before
 * deflections existed carry none and count as 0.
 */
export function bracketsHaveDeflections(groups: readonly BracketGroup[]): boolean {
  return groups.some((g) => g.rows.some((r) => typeof r.deflection === 'number' && r.deflection !== 0));
}
