/**
 * The offset table JSON the API returns (bridge-format "Output"), as the engine defines it; imported as
 * types only, so none of the engine's code is pulled in for them. Lengths are in the table's `units`.
 */
import type { ChordOffsetPoint, ChordOffsetSet, OffsetPoint, OffsetTable } from '@/lib/geometry';

export type OffsetPointRow = OffsetPoint;
export type ChordOffsetRow = ChordOffsetPoint;
export type ChordOffsetSetRow = ChordOffsetSet;
export type OffsetTableJson = OffsetTable;

/**
 * True when the bridge's deflection table sets any girder point's deflection: only then do the tables
 * show the deflection and screed-grade columns (without deflections the screed grade is the top of deck).
 */
export function hasDeflections(points: readonly Pick<OffsetPoint, 'deflection'>[]): boolean {
  return points.some((p) => typeof p.deflection === 'number' && p.deflection !== 0);
}
