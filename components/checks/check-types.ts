// The server's own types, imported as types only: nothing of the server code reaches the browser.
import type { CheckJson } from '@/lib/services/checks';
import type { SheetGroup, SheetRow } from '@/lib/services/field-sheet';

/** A check as GET/POST /api/bridges/[id]/checks return it (lengths in the bridge's units). */
export type CheckRow = CheckJson;

/** One bracket's targets as the field pages receive them from the server. */
export type BracketRow = SheetRow;

export type BracketGroup = SheetGroup;
