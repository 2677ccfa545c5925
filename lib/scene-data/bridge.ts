/**
 * Server-side adapter for the 3D view: the stored bridge's latest description and its offset table
 * as plain data (the scene never fetches; it gets these as props).
 */
import type { BridgeDescription, OffsetTable } from '@/lib/geometry';
import { getBridge } from '@/lib/services/bridges';
import { offsetsForBridge } from '@/lib/services/offsets';

export interface BridgeSceneData {
  id: number;
  name: string;
  revision: number;
  description: BridgeDescription;
  table: OffsetTable;
}

/** @throws NotFoundError when there is no such bridge; UnprocessableError when its geometry cannot be computed. */
export async function sceneDataForBridge(id: string): Promise<BridgeSceneData> {
  const detail = await getBridge(id);
  const { table } = await offsetsForBridge(id);
  return { id: detail.id, name: detail.name, revision: detail.revision, description: detail.description, table };
}
