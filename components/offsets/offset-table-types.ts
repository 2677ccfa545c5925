/**
 * The offset table JSON the API returns (bridge-format "Output"), as the engine defines it; imported as
 * types only, so none of the engine's code is pulled in for them. Lengths are in the table's `units`.
 */
import type { ChordOffsetPoint, ChordOffsetSet, OffsetPoint, OffsetTable } from '@/lib/geometry';

export type OffsetPointRow = OffsetPoint;
export type ChordOffsetRow = ChordOffsetPoint;
export type ChordOffsetSetRow = ChordOffsetSet;
export type OffsetTableJson = OffsetTable;
