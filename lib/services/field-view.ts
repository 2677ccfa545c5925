import { UnprocessableError } from '@/lib/errors';
import { requireBridge } from './require-bridge';
import { buildSheetGroups, type SheetGroup } from './field-sheet';
import { offsetsForBridge } from './offsets';
import { fieldSettingsOf, type FieldSettings } from './tolerances';

export type FieldView =
  | { ok: true; bridge: { id: number; name: string; revision: number }; settings: FieldSettings; groups: SheetGroup[] }
  | { ok: false; bridge: { id: number; name: string; revision: number }; problem: string };

/**
 * What the field pages need: the bridge, its tolerances and the bracket rows of its latest revision.
 * A missing bridge throws NotFoundError (the page shows its not-found page); geometry that cannot be
 * built comes back as a problem text.
 */
export async function loadFieldView(id: string): Promise<FieldView> {
  try {
    const { bridge, table } = await offsetsForBridge(id);
    const settings = fieldSettingsOf(bridge);
    return {
      ok: true,
      bridge: { id: bridge.id, name: bridge.name, revision: bridge.currentRevision },
      settings,
      groups: buildSheetGroups(table, settings.base_rod_length, null),
    };
  } catch (err) {
    if (err instanceof UnprocessableError) {
      const bridge = await requireBridge(id);
      return { ok: false, bridge: { id: bridge.id, name: bridge.name, revision: bridge.currentRevision }, problem: err.message };
    }
    throw err;
  }
}
