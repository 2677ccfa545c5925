import { GeometryError } from './errors';
import type { BridgeDescription } from './schema';
import type { OffsetTable } from './types';
import { checkAndCompute } from './validate';

/**
 * The offset table of a bridge: every girder point of every span with the overhang numbers of the
 * exterior girders, chord offsets of both deck edges per span, and span summaries. All lengths and
 * elevations in the bridge's unit, full double precision; signs as in the data contract.
 * @throws GeometryError listing every problem when the description is not a buildable deck.
 */
export function computeOffsetTable(bridge: BridgeDescription): OffsetTable {
  const { issues, table } = checkAndCompute(bridge);
  if (issues.length > 0 || table === null) throw new GeometryError(issues);
  return table;
}
